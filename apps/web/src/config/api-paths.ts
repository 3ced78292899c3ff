/** Endpoints whose names are not obvious from their resource, kept in one place. */
export const authPaths = {
  signIn: '/auth/sign-in',
  signUp: '/auth/sign-up',
  signOut: '/auth/sign-out',
  passwordReset: '/auth/password-reset',
  passwordResetComplete: (token: string) => `/auth/password-reset/${encodeURIComponent(token)}`,
} as const;
