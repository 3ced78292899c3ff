/**
 * Error codes shared by the API and its clients. The API maps each code to an HTTP status in
 * one place; clients switch on the code, never on the message.
 */
export const ErrorCode = {
  ValidationFailed: 'VALIDATION_FAILED',
  /** The request itself is malformed (a bad percent-escape, a body that does not match its length). */
  BadRequest: 'BAD_REQUEST',
  Unauthenticated: 'UNAUTHENTICATED',
  InvalidCredentials: 'INVALID_CREDENTIALS',
  Forbidden: 'FORBIDDEN',
  CsrfInvalid: 'CSRF_INVALID',
  /** The active company removed the person; they still belong to another and must choose one. */
  CompanyAccessEnded: 'COMPANY_ACCESS_ENDED',
  NotFound: 'NOT_FOUND',
  Conflict: 'CONFLICT',
  EmailTaken: 'EMAIL_TAKEN',
  TokenInvalid: 'TOKEN_INVALID',
  Unprocessable: 'UNPROCESSABLE',
  RateLimited: 'RATE_LIMITED',
  PayloadTooLarge: 'PAYLOAD_TOO_LARGE',
  /** A Content-Type, charset or Content-Encoding the API does not read. */
  UnsupportedMediaType: 'UNSUPPORTED_MEDIA_TYPE',
  /** Request headers over the server's limit. */
  HeadersTooLarge: 'HEADERS_TOO_LARGE',
  /** The request did not arrive in time. */
  RequestTimeout: 'REQUEST_TIMEOUT',
  /** The server is busy (e.g. the layout planner's queue is full); try again after Retry-After. */
  ServiceBusy: 'SERVICE_BUSY',
  /** The payment processor could not be reached or answered with an error; nothing was recorded. */
  ProcessorUnavailable: 'PROCESSOR_UNAVAILABLE',
  /** The database cannot be reached; nothing was changed. Try again after Retry-After. */
  DatabaseUnavailable: 'DATABASE_UNAVAILABLE',
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
