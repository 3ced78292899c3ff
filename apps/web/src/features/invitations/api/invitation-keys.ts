export const invitationKeys = {
  all: ['invitation-preview'] as const,
  preview: (token: string) => [...invitationKeys.all, token] as const,
};
