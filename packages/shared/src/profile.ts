import { z } from 'zod';
import { passwordSchema, requiredText } from './text.js';

/** `PATCH /api/me`: the signed-in person's own name. */
export const updateProfileInputSchema = z.object({ name: requiredText('Your name', 120) });
export type UpdateProfileInput = z.infer<typeof updateProfileInputSchema>;

/**
 * `POST /api/me/password`: the current password proves it is really them (a session left open
 * on a shared computer is not enough); the new one follows the sign-up rules.
 */
export const changePasswordInputSchema = z
  .object({
    currentPassword: z
      .string({ error: 'Enter your current password' })
      .min(1, 'Enter your current password')
      .max(200, 'Use at most 200 characters'),
    newPassword: passwordSchema,
  })
  .refine((input) => input.newPassword !== input.currentPassword, {
    path: ['newPassword'],
    message: 'Choose a password different from the current one',
  });
export type ChangePasswordInput = z.infer<typeof changePasswordInputSchema>;
