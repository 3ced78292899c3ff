// Structured logs (pino) with the request id on every line, and the request-id header.
// Secrets stay out: cookies and CSRF headers are redacted, URLs pass through redactUrl (one-time
// tokens, see log-redaction.ts), and bodies are never logged (also redacted should an error
// carry one).
import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { pino } from 'pino';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import { redactUrl } from './log-redaction.js';
import type { TokenRoutePattern } from './log-redaction.js';

/** Incoming ids are accepted only when short and plain, so logs cannot be polluted. */
const wellFormedRequestId = /^[A-Za-z0-9._-]{8,128}$/;

/** pino `redact` paths, for loggers made here and for callers that bring their own. */
export const redactPaths = [
  'req.headers.cookie',
  'req.headers["x-csrf-token"]',
  'res.headers["set-cookie"]',
  'req.body',
  'err.body',
  '*.password',
  '*.token',
];

export function createLogger(level: string, destination?: pino.DestinationStream): Logger {
  const options = { level, redact: redactPaths };
  return destination ? pino(options, destination) : pino(options);
}

/** pino-http middleware that also assigns and echoes `x-request-id`. */
export function createHttpLogger(logger: Logger, tokenRoutes: readonly TokenRoutePattern[]) {
  return pinoHttp({
    logger,
    genReqId(req: IncomingMessage, res: ServerResponse) {
      const incoming = req.headers['x-request-id'];
      const id =
        typeof incoming === 'string' && wellFormedRequestId.test(incoming)
          ? incoming
          : randomUUID();
      res.setHeader('x-request-id', id);
      return id;
    },
    customProps: (req) => ({ requestId: req.id }),
    serializers: {
      req: (req: { id: unknown; method: string; url: string }) => ({
        id: req.id,
        method: req.method,
        url: redactUrl(req.url, tokenRoutes),
      }),
      // Status only: response headers repeat on every line and carry nothing to search for.
      res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
    },
  });
}
