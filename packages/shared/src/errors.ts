/**
 * Error codes shared by the API and its clients. The API maps each code to an HTTP status in
 * one place; clients switch on the code, never on the message.
 */
export const ErrorCode = {
  ValidationFailed: 'VALIDATION_FAILED',
  Unauthenticated: 'UNAUTHENTICATED',
  InvalidCredentials: 'INVALID_CREDENTIALS',
  Forbidden: 'FORBIDDEN',
  CsrfInvalid: 'CSRF_INVALID',
  NotFound: 'NOT_FOUND',
  Conflict: 'CONFLICT',
  EmailTaken: 'EMAIL_TAKEN',
  TokenInvalid: 'TOKEN_INVALID',
  Unprocessable: 'UNPROCESSABLE',
  RateLimited: 'RATE_LIMITED',
  PayloadTooLarge: 'PAYLOAD_TOO_LARGE',
  /** The server is busy (e.g. the layout planner's queue is full); try again after Retry-After. */
  ServiceBusy: 'SERVICE_BUSY',
  Internal: 'INTERNAL',
} as const;
export type ErrorCode = (typeof ErrorCode)[keyof typeof ErrorCode];

/** One field's problem, `path` in dotted form (`sites.0.address`). */
export interface FieldError {
  path: string;
  message: string;
}

/** The body of every error answer: RFC 9457 problem details plus our own members. */
export interface ProblemDetails {
  type: string;
  title: string;
  status: number;
  detail?: string;
  code: ErrorCode;
  requestId?: string;
  errors?: FieldError[];
}
