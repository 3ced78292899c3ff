/** Endpoints whose names are not obvious from their resource, kept in one place. */
export const authPaths = {
  signIn: '/auth/login',
  signUp: '/auth/signup',
  signOut: '/auth/logout',
  passwordReset: '/auth/password-reset',
  passwordResetComplete: (token: string) => `/auth/password-reset/${encodeURIComponent(token)}`,
} as const;
