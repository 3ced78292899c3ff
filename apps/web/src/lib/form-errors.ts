import type { FieldPath, FieldValues, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api-error';

/**
 * Puts the server's field errors beside the fields they belong to and returns the message for
 * the top of the form (or null when every problem found its field). The typed values stay.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly FieldPath<T>[],
): string | null {
  if (!(error instanceof ApiError)) return 'Something went wrong. Please try again.';
  const known = new Set<string>(fields);
  let unplaced = false;
  for (const fieldError of error.fieldErrors) {
    if (known.has(fieldError.path)) {
      setError(fieldError.path as FieldPath<T>, { type: 'server', message: fieldError.message });
    } else {
      unplaced = true;
    }
  }
  if (error.fieldErrors.length > 0 && !unplaced) return null;
  // The detail names every field at fault, including any this form does not show.
  return error.detail;
}
