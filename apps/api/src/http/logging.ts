// Structured logs (pino) with the request id on every line, and the request-id header.
import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { pino } from 'pino';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';

/** Incoming ids are accepted only when short and plain, so logs cannot be polluted. */
const wellFormedRequestId = /^[A-Za-z0-9._-]{8,128}$/;

export function createLogger(level: string): Logger {
  return pino({
    level,
    redact: ['req.headers.cookie', 'req.headers["x-csrf-token"]', 'res.headers["set-cookie"]'],
  });
}

/** pino-http middleware that also assigns and echoes `x-request-id`. */
export function createHttpLogger(logger: Logger) {
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
        url: req.url,
      }),
      // Status only: response headers repeat on every line and carry nothing to search for.
      res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
    },
  });
}
