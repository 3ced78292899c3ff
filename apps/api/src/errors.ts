// The one error type services throw. The HTTP layer maps `code` to a status in one place.
import type { ErrorCode, FieldError } from '@seamwright/shared';

export class AppError extends Error {
  readonly code: ErrorCode;
  readonly errors: FieldError[] | undefined;
  /** Extra response headers (e.g. Retry-After). */
  readonly headers: Record<string, string> | undefined;

  constructor(
    code: ErrorCode,
    detail: string,
    options: { errors?: FieldError[]; headers?: Record<string, string> } = {},
  ) {
    super(detail);
    this.name = 'AppError';
    this.code = code;
    this.errors = options.errors;
    this.headers = options.headers;
  }
}

/** Shorthand for the answer to another company's row or a row that does not exist. */
export function notFound(what: string): AppError {
  return new AppError('NOT_FOUND', `${what} not found`);
}
