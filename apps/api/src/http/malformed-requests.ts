// Requests Node's HTTP parser rejects before Express sees them (headers over 16 KB, a broken
// request line, a request that took too long to arrive) get the same problem+json as any other
// error instead of Node's bare status line.
import { STATUS_CODES } from 'node:http';
import type { Server } from 'node:http';
import type { Duplex } from 'node:stream';
import type { ErrorCode } from '@seamwright/shared';
import { problemFor } from './problem.js';

const answers: Record<string, { code: ErrorCode; detail: string }> = {
  HPE_HEADER_OVERFLOW: {
    code: 'HEADERS_TOO_LARGE',
    detail: 'The request headers are larger than the server accepts (16 KB in all)',
  },
  ERR_HTTP_REQUEST_TIMEOUT: {
    code: 'REQUEST_TIMEOUT',
    detail: 'The request did not arrive in time',
  },
};
const otherwise = { code: 'BAD_REQUEST' as const, detail: 'The request is not valid HTTP' };

/** Replaces Node's default `clientError` answer on `server`. */
export function answerMalformedRequests(server: Server): void {
  server.on('clientError', (error: NodeJS.ErrnoException, socket: Duplex) => {
    if (error.code === 'ECONNRESET' || !socket.writable) {
      socket.destroy();
      return;
    }
    const { code, detail } = answers[error.code ?? ''] ?? otherwise;
    const problem = problemFor(code, detail, undefined);
    const body = JSON.stringify(problem);
    socket.end(
      [
        `HTTP/1.1 ${problem.status} ${STATUS_CODES[problem.status] ?? ''}`,
        'Content-Type: application/problem+json',
        `Content-Length: ${Buffer.byteLength(body)}`,
        'Connection: close',
        '',
        body,
      ].join('\r\n'),
    );
  });
}
