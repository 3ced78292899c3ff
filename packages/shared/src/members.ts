import { z } from 'zod';
import type { Role } from './roles.js';
import { roleSchema } from './auth.js';
import { emailSchema, passwordSchema, requiredText } from './text.js';

export const createInvitationInputSchema = z.object({
  email: emailSchema,
  role: roleSchema,
});
export type CreateInvitationInput = z.infer<typeof createInvitationInputSchema>;

/** Accepting an invitation: a new user sets a name and password; an existing one proves theirs. */
export const acceptInvitationInputSchema = z.object({
  name: requiredText('Your name', 120).optional(),
  password: passwordSchema,
});
export type AcceptInvitationInput = z.infer<typeof acceptInvitationInputSchema>;

export const updateMemberInputSchema = z.object({ role: roleSchema });
export type UpdateMemberInput = z.infer<typeof updateMemberInputSchema>;

export interface InvitationView {
  id: string;
  email: string;
  role: Role;
  expiresAt: string;
  acceptedAt: string | null;
  createdAt: string;
}

/** What the public invitation page shows before the invitee sets a password. */
export interface InvitationPreview {
  companyName: string;
  email: string;
  role: Role;
  hasAccount: boolean;
}

export interface MemberView {
  id: string;
  userId: string;
  name: string;
  email: string;
  role: Role;
  createdAt: string;
}
