// Turns an AppError into an RFC 9457 problem+json answer.
import type { Response } from 'express';
import type { ErrorCode, ProblemDetails } from '@seamwright/shared';
import type { AppError } from '../errors.js';

/** The single code → HTTP status map. */
export const statusByCode: Record<ErrorCode, number> = {
  VALIDATION_FAILED: 400,
  BAD_REQUEST: 400,
  UNAUTHENTICATED: 401,
  INVALID_CREDENTIALS: 401,
  FORBIDDEN: 403,
  CSRF_INVALID: 403,
  COMPANY_ACCESS_ENDED: 403,
  NOT_FOUND: 404,
  CONFLICT: 409,
  EMAIL_TAKEN: 409,
  TOKEN_INVALID: 410,
  UNPROCESSABLE: 422,
  RATE_LIMITED: 429,
  PAYLOAD_TOO_LARGE: 413,
  UNSUPPORTED_MEDIA_TYPE: 415,
  HEADERS_TOO_LARGE: 431,
  REQUEST_TIMEOUT: 408,
  SERVICE_BUSY: 503,
  PROCESSOR_UNAVAILABLE: 503,
  DATABASE_UNAVAILABLE: 503,
  INTERNAL: 500,
};

const titles: Record<ErrorCode, string> = {
  VALIDATION_FAILED: 'Some fields need attention',
  BAD_REQUEST: 'The request is malformed',
  UNAUTHENTICATED: 'Sign in to continue',
  INVALID_CREDENTIALS: 'E-mail or password is wrong',
  FORBIDDEN: 'Your role cannot do this',
  CSRF_INVALID: 'The form expired; reload and try again',
  COMPANY_ACCESS_ENDED: 'Your access to this company has ended',
  NOT_FOUND: 'Not found',
  CONFLICT: 'This conflicts with the current state',
  EMAIL_TAKEN: 'That e-mail already has an account',
  TOKEN_INVALID: 'This link is no longer valid',
  UNPROCESSABLE: 'The request cannot be processed',
  RATE_LIMITED: 'Too many attempts',
  PAYLOAD_TOO_LARGE: 'The request is too large',
  UNSUPPORTED_MEDIA_TYPE: 'The request body is in a format the API does not read',
  HEADERS_TOO_LARGE: 'The request headers are too large',
  REQUEST_TIMEOUT: 'The request took too long',
  SERVICE_BUSY: 'The server is busy; try again shortly',
  PROCESSOR_UNAVAILABLE: 'The payment processor cannot be reached',
  DATABASE_UNAVAILABLE: 'The database is unavailable; try again shortly',
  INTERNAL: 'Something went wrong on our side',
};

export function problemFor(
  code: ErrorCode,
  detail: string | undefined,
  requestId: string | undefined,
): ProblemDetails {
  return {
    type: `https://seamwright.test/problems/${code.toLowerCase().replace(/_/g, '-')}`,
    title: titles[code],
    status: statusByCode[code],
    ...(detail ? { detail } : {}),
    code,
    ...(requestId ? { requestId } : {}),
  };
}

export function sendProblem(res: Response, error: AppError, requestId: string | undefined): void {
  const body: ProblemDetails = problemFor(error.code, error.message, requestId);
  if (error.errors?.length) body.errors = error.errors;
  for (const [name, value] of Object.entries(error.headers ?? {})) res.setHeader(name, value);
  res.status(body.status).type('application/problem+json').send(JSON.stringify(body));
}
