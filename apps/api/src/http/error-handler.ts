// The one place errors become HTTP answers.
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { AppError } from '../errors.js';
import { clientErrorFrom } from './client-errors.js';
import { databaseUnavailableFrom } from './database-errors.js';
import { sendProblem } from './problem.js';

/**
 * Translates anything thrown into problem+json. Library errors with a 4xx status are the
 * client's (see client-errors.ts); anything else is logged and answered with a generic 500.
 */
export const errorHandler: ErrorRequestHandler = (error: unknown, req, res, _next) => {
  const requestId = typeof req.id === 'string' ? req.id : undefined;
  let appError = error instanceof AppError ? error : clientErrorFrom(error);
  if (!appError) {
    appError = databaseUnavailableFrom(error);
    // An outage is logged once per request without a stack: it is not a bug in this code.
    if (appError) req.log.warn({ requestId, reason: String(error) }, 'database unavailable');
  }
  if (!appError) {
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
