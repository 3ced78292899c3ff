// Errors raised by the libraries under us (body-parser/raw-body, the router, http-errors style
// errors anywhere) that carry a 4xx status are the client's fault: they become the matching
// AppError with a detail that says what was wrong, instead of a logged 500.
import type { RequestHandler } from 'express';
import type { ErrorCode } from '@seamwright/shared';
import { AppError } from '../errors.js';

/** The fields http-errors, body-parser and the router put on their errors. */
interface HttpishError {
  status?: unknown;
  statusCode?: unknown;
  expose?: unknown;
  type?: unknown;
  message?: unknown;
  charset?: unknown;
  encoding?: unknown;
  limit?: unknown;
  length?: unknown;
}

/** A status without a code of its own answers 400 BAD_REQUEST. */
const codeByStatus: Partial<Record<number, ErrorCode>> = {
  401: 'UNAUTHENTICATED',
  403: 'FORBIDDEN',
  404: 'NOT_FOUND',
  409: 'CONFLICT',
  413: 'PAYLOAD_TOO_LARGE',
  415: 'UNSUPPORTED_MEDIA_TYPE',
  429: 'RATE_LIMITED',
};

function clientStatusOf(error: HttpishError): number | undefined {
  const status = error.status ?? error.statusCode;
  return typeof status === 'number' && Number.isInteger(status) && status >= 400 && status < 500
    ? status
    : undefined;
}

function text(value: unknown): string {
  return typeof value === 'string' || typeof value === 'number' ? String(value) : '';
}

/** The detail for the error types body-parser and raw-body raise, by `type`. */
function bodyErrorFor(error: HttpishError): AppError | undefined {
  switch (error.type) {
    case 'entity.parse.failed':
      return new AppError('VALIDATION_FAILED', 'The request body is not valid JSON');
    case 'entity.too.large':
      return new AppError(
        'PAYLOAD_TOO_LARGE',
        `The request body is too large; the limit is ${text(error.limit) || 'exceeded'} bytes`,
      );
    case 'encoding.unsupported':
      return new AppError(
        'UNSUPPORTED_MEDIA_TYPE',
        `Content-Encoding "${text(error.encoding)}" is not supported; send the body uncompressed or as gzip, deflate or br`,
      );
    case 'charset.unsupported':
      return new AppError(
        'UNSUPPORTED_MEDIA_TYPE',
        `Content-Type charset "${text(error.charset)}" is not supported; send JSON as UTF-8`,
      );
    case 'request.size.invalid':
      return new AppError(
        'BAD_REQUEST',
        'The request body does not match its Content-Length header',
      );
    case 'request.aborted':
      return new AppError('BAD_REQUEST', 'The request body ended before it was complete');
    default:
      return undefined;
  }
}

/** The AppError for a client error, or undefined when `error` is not one (a real 500). */
export function clientErrorFrom(error: unknown): AppError | undefined {
  if (typeof error !== 'object' || error === null) return undefined;
  const e = error as HttpishError;
  const status = clientStatusOf(e);
  if (status === undefined) return undefined;
  const fromBody = bodyErrorFor(e);
  if (fromBody) return fromBody;
  // The router marks a path parameter it cannot percent-decode with status 400.
  if (error instanceof URIError)
    return new AppError('BAD_REQUEST', 'The URL path contains a malformed percent-escape');
  const code = codeByStatus[status] ?? 'BAD_REQUEST';
  // http-errors sets `expose` on messages written for the client; others stay generic.
  const detail =
    e.expose === true && typeof e.message === 'string' && e.message
      ? `The request could not be read: ${e.message}`
      : `The request could not be read (HTTP ${status})`;
  return new AppError(code, detail);
}

const methodsWithBody = new Set(['POST', 'PATCH', 'PUT', 'DELETE']);

/**
 * After express.json(): a body in any other format would reach the handlers as "no body" and
 * be misreported as missing fields, so it is refused with 415 naming the type that was sent.
 * The upload routes (router-relative `multipartPaths`, `:param` segments match any one
 * segment) take multipart/form-data instead, read by their own multer step.
 */
export function createRequireJsonBody(multipartPaths: readonly string[]): RequestHandler {
  const patterns = multipartPaths.map((path) => path.split('/'));
  const isUploadRoute = (path: string) => {
    const segments = path.replace(/\/$/, '').split('/');
    return patterns.some(
      (pattern) =>
        pattern.length === segments.length &&
        pattern.every(
          (p, i) => p.startsWith(':') || p.toLowerCase() === segments[i]?.toLowerCase(),
        ),
    );
  };
  return (req, _res, next) => {
    if (!methodsWithBody.has(req.method) || !hasBody(req.headers)) return next();
    if (req.is('application/json')) return next();
    if (req.is('multipart/form-data') && isUploadRoute(req.path)) return next();
    const expected = isUploadRoute(req.path) ? 'multipart/form-data' : 'application/json';
    next(
      new AppError(
        'UNSUPPORTED_MEDIA_TYPE',
        `Content-Type "${(req.get('content-type') ?? '(none)').slice(0, 100)}" is not supported; send the body as ${expected}`,
      ),
    );
  };
}

/** Same test as type-is: a body is announced by Transfer-Encoding or a non-zero Content-Length. */
function hasBody(headers: { 'transfer-encoding'?: string; 'content-length'?: string }): boolean {
  if (headers['transfer-encoding'] !== undefined) return true;
  const length = headers['content-length'];
  return length !== undefined && length !== '0' && length !== '';
}
