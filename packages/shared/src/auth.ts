import { z } from 'zod';
import { roles, type Role } from './roles.js';
import { emailSchema, passwordSchema, requiredText } from './text.js';

export const signupInputSchema = z.object({
  companyName: requiredText('Company name', 120),
  name: requiredText('Your name', 120),
  email: emailSchema,
  password: passwordSchema,
});
export type SignupInput = z.infer<typeof signupInputSchema>;

export const loginInputSchema = z.object({
  email: emailSchema,
  password: z.string({ error: 'Password is required' }).min(1, 'Password is required').max(200),
});
export type LoginInput = z.infer<typeof loginInputSchema>;

export const passwordResetRequestSchema = z.object({ email: emailSchema });
export type PasswordResetRequest = z.infer<typeof passwordResetRequestSchema>;

export const passwordResetCompleteSchema = z.object({ password: passwordSchema });
export type PasswordResetComplete = z.infer<typeof passwordResetCompleteSchema>;

export const switchCompanyInputSchema = z.object({ companyId: z.uuid('Choose a company') });
export type SwitchCompanyInput = z.infer<typeof switchCompanyInputSchema>;

export const roleSchema = z.enum(roles, { error: 'Choose a role' });

export interface UserView {
  id: string;
  name: string;
  email: string;
}

export interface CompanyView {
  id: string;
  name: string;
  slug: string;
  timeZone: string;
  region: string | null;
  currency: string;
  measurementSystem: 'imperial' | 'metric';
}

export interface MembershipView {
  companyId: string;
  companyName: string;
  role: Role;
}

/** `GET /api/me`. */
export interface MeView {
  user: UserView;
  company: CompanyView;
  role: Role;
  companies: MembershipView[];
}
