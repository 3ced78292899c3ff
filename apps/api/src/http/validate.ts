// Parses input at the edge with a shared zod schema; failures become VALIDATION_FAILED with
// one entry per field.
import type { z } from 'zod';
import { AppError } from '../errors.js';

export function parseInput<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const result = schema.safeParse(value ?? {});
  if (result.success) return result.data;
  const errors = result.error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }));
  throw new AppError('VALIDATION_FAILED', describeFieldErrors(errors), { errors });
}

/** One line naming every field at fault, e.g. `name: Name is required; email: Enter a valid…`. */
export function describeFieldErrors(errors: readonly { path: string; message: string }[]): string {
  return errors.map((e) => (e.path ? `${e.path}: ${e.message}` : e.message)).join('; ');
}

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A path id that is not a UUID cannot name any row: answer 404 rather than hit the database. */
export function parseId(value: unknown, what: string): string {
  if (typeof value !== 'string' || !uuidPattern.test(value))
    throw new AppError('NOT_FOUND', `${what} not found`);
  return value.toLowerCase();
}
