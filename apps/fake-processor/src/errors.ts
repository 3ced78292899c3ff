// Errors in the processor's shape: `{ error: { type, message, param?, code? } }` with the
// status the SDK maps to its error classes (400 invalid request, 401 authentication, 404
// missing resource, 503 api error).
import type { Response } from 'express';

export type ProcessorErrorType =
  | 'invalid_request_error'
  | 'authentication_error'
  | 'api_error'
  | 'card_error'
  | 'idempotency_error';

export class FakeApiError extends Error {
  constructor(
    readonly status: number,
    readonly type: ProcessorErrorType,
    message: string,
    readonly param?: string,
    readonly code?: string,
  ) {
    super(message);
  }
}

export const invalid = (message: string, param?: string, code = 'parameter_invalid') =>
  new FakeApiError(400, 'invalid_request_error', message, param, code);

export const missing = (kind: string, id: string, param: string) =>
  new FakeApiError(
    404,
    'invalid_request_error',
    `No such ${kind}: '${id}'`,
    param,
    'resource_missing',
  );

export function sendApiError(res: Response, error: FakeApiError): void {
  res.status(error.status).json({
    error: {
      type: error.type,
      message: error.message,
      ...(error.param ? { param: error.param } : {}),
      ...(error.code ? { code: error.code } : {}),
    },
  });
}
