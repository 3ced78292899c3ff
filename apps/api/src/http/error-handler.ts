// The one place errors become HTTP answers.
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { AppError } from '../errors.js';
import { sendProblem } from './problem.js';

interface BodyParserError {
  type?: string;
  status?: number;
}

function isBodyParserError(error: unknown): error is BodyParserError {
  return typeof error === 'object' && error !== null && 'type' in error && 'status' in error;
}

/** Translates anything thrown into problem+json. Unknown errors: logged, generic 500. */
export const errorHandler: ErrorRequestHandler = (error: unknown, req, res, _next) => {
  const requestId = typeof req.id === 'string' ? req.id : undefined;
  let appError: AppError;
  if (error instanceof AppError) {
    appError = error;
  } else if (isBodyParserError(error) && error.type === 'entity.parse.failed') {
    appError = new AppError('VALIDATION_FAILED', 'The request body is not valid JSON');
  } else if (isBodyParserError(error) && error.type === 'entity.too.large') {
    appError = new AppError('PAYLOAD_TOO_LARGE', 'The request body is too large');
  } else {
    req.log.error({ err: error, requestId }, 'unhandled error');
    appError = new AppError(
      'INTERNAL',
      'An unexpected error occurred. Quote the request id if you report it.',
    );
  }
  if (res.headersSent) return;
  sendProblem(res, appError, requestId);
};

/** Any /api path no router answered. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError('NOT_FOUND', `No API route for ${req.method} ${req.path}`));
};
