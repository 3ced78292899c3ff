// Reads one file from a multipart/form-data request into memory (multer), with the size and
// count limits, and turns multer's and busboy's errors into 4xx problem+json naming the field.
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import multer from 'multer';
import { maxUploadBytes } from '@seamwright/shared';
import { AppError } from '../../errors.js';

const megabytes = (bytes: number) => `${Math.round(bytes / (1024 * 1024))} MB`;

function multerErrorFor(error: multer.MulterError, field: string): AppError {
  const errors = [{ path: field, message: '' }];
  const fail = (code: 'PAYLOAD_TOO_LARGE' | 'VALIDATION_FAILED', message: string) =>
    new AppError(code, `${field}: ${message}`, {
      errors: errors.map((e) => ({ ...e, message })),
    });
  switch (error.code) {
    case 'LIMIT_FILE_SIZE':
      return fail('PAYLOAD_TOO_LARGE', `The file is larger than ${megabytes(maxUploadBytes)}`);
    case 'LIMIT_FILE_COUNT':
      return fail('VALIDATION_FAILED', 'Send one file only');
    case 'LIMIT_UNEXPECTED_FILE':
      return fail(
        'VALIDATION_FAILED',
        `Send the file in the form field "${field}", not "${String(error.field ?? '').slice(0, 60)}"`,
      );
    default:
      return fail('VALIDATION_FAILED', 'The upload could not be read');
  }
}

/**
 * One file in `field`, at most `maxUploadBytes`, kept in memory so its content can be checked
 * before anything is stored. A body that is not multipart reaches the handler without a file.
 */
export function singleFileUpload(field: string): RequestHandler {
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxUploadBytes, files: 1, fields: 20, parts: 21, fieldSize: 64 * 1024 },
  }).single(field);
  return (req: Request, res: Response, next: NextFunction) => {
    parse(req, res, (error: unknown) => {
      if (!error) return next();
      if (error instanceof multer.MulterError) return next(multerErrorFor(error, field));
      // busboy's own errors (no boundary, a form that ends early) are the client's.
      const detail = error instanceof Error ? error.message.slice(0, 120) : 'unreadable';
      next(
        new AppError('VALIDATION_FAILED', `${field}: The form could not be read (${detail})`, {
          errors: [{ path: field, message: 'The form could not be read' }],
        }),
      );
    });
  };
}
