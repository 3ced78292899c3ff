import { describe, expect, it } from 'vitest';
import { clientErrorFrom } from './client-errors.js';

function httpError(status: number, message: string, extra: Record<string, unknown> = {}) {
  return Object.assign(new Error(message), { status, statusCode: status, expose: true }, extra);
}

describe('clientErrorFrom', () => {
  it('names a body that ended early or did not match its Content-Length', () => {
    expect(
      clientErrorFrom(
        httpError(400, 'request size did not match content length', {
          type: 'request.size.invalid',
        }),
      ),
    ).toMatchObject({ code: 'BAD_REQUEST', message: expect.stringMatching(/Content-Length/) });
    expect(
      clientErrorFrom(httpError(400, 'request aborted', { type: 'request.aborted' })),
    ).toMatchObject({ code: 'BAD_REQUEST', message: expect.stringMatching(/ended before/) });
  });

  it('maps other exposed 4xx errors by status and keeps their message', () => {
    expect(clientErrorFrom(httpError(415, 'nope'))).toMatchObject({
      code: 'UNSUPPORTED_MEDIA_TYPE',
      message: 'The request could not be read: nope',
    });
    expect(clientErrorFrom(httpError(418, 'teapot'))).toMatchObject({ code: 'BAD_REQUEST' });
    expect(
      clientErrorFrom(Object.assign(new Error('internal detail'), { statusCode: 404 })),
    ).toMatchObject({ code: 'NOT_FOUND', message: 'The request could not be read (HTTP 404)' });
  });

  it('leaves server errors and plain errors to the 500 path', () => {
    expect(clientErrorFrom(httpError(500, 'stream not readable'))).toBeUndefined();
    expect(clientErrorFrom(new Error('boom'))).toBeUndefined();
    expect(clientErrorFrom(new URIError('URI malformed'))).toBeUndefined();
    expect(clientErrorFrom('a string')).toBeUndefined();
  });
});
