import { useState } from 'react';
import type { FieldPath, FieldValues, UseFormHandleSubmit, UseFormSetError } from 'react-hook-form';
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

/**
 * The submit handler every form shares: clears the last error, runs `action` with the parsed
 * values, and on failure puts the server's messages beside the fields (see applyServerErrors).
 */
export function useServerSubmit<TFieldValues extends FieldValues, TTransformed>(
  form: {
    handleSubmit: UseFormHandleSubmit<TFieldValues, TTransformed>;
    setError: UseFormSetError<TFieldValues>;
  },
  fields: readonly FieldPath<TFieldValues>[] | (() => readonly string[]),
  action: (values: TTransformed) => Promise<unknown>,
) {
  const [formError, setFormError] = useState<string | null>(null);
  const submit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await action(values);
    } catch (error) {
      const names = typeof fields === 'function' ? fields() : fields;
      // The names are this form's own fields (or those it shows), so they are paths of TFieldValues.
      setFormError(
        applyServerErrors(error, form.setError, names as readonly FieldPath<TFieldValues>[]),
      );
    }
  });
  return { submit, formError };
}
