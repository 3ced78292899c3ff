import { z } from 'zod';

/** Trimmed text with a maximum length; an empty string becomes `null` (cleared). */
export function optionalText(max: number) {
  return z
    .string()
    .trim()
    .max(max, `Keep it under ${max} characters`)
    .nullish()
    .transform((value) => (value ? value : null));
}

/** Required trimmed text. */
export function requiredText(label: string, max: number) {
  return z
    .string({ error: `${label} is required` })
    .trim()
    .min(1, `${label} is required`)
    .max(max, `${label} must be at most ${max} characters`);
}

export const emailSchema = z
  .string({ error: 'E-mail is required' })
  .trim()
  .toLowerCase()
  .pipe(z.email('Enter a valid e-mail address').max(254));

export const optionalEmailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .nullish()
  .transform((value) => (value ? value : null))
  .pipe(z.email('Enter a valid e-mail address').max(254).nullable());

/** Phone numbers as people type them: digits, spaces and + ( ) - . only. */
export const optionalPhoneSchema = optionalText(40).refine(
  (value) => value === null || /^[+()\-.\s\d]{5,40}$/.test(value),
  'Enter a phone number using digits, spaces and + ( ) - .',
);

export const passwordSchema = z
  .string({ error: 'Password is required' })
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 200 characters');
