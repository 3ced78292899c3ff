// Requests byte-for-byte as given (supertest would fix up Content-Length or re-serialize a
// Buffer as JSON), against one listening copy of the app per test file.
import { request as httpRequest } from 'node:http';
import type { OutgoingHttpHeaders, Server } from 'node:http';
import { connect } from 'node:net';
import type { AddressInfo } from 'node:net';
import { afterAll } from 'vitest';
import { answerMalformedRequests } from '@seamwright/api';
import type { App } from '../../fixtures/app.js';

export interface RawResponse {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  text: string;
}

export interface RawRequest {
  method: string;
  path: string;
  headers?: OutgoingHttpHeaders;
  body?: string | Buffer;
}

let server: Server | undefined;

async function baseUrlFor(app: App): Promise<AddressInfo> {
  server ??= await new Promise<Server>((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
    answerMalformedRequests(s);
  });
  return server.address() as AddressInfo;
}

afterAll(async () => {
  await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
  server = undefined;
});

export async function sendRaw(app: App, req: RawRequest): Promise<RawResponse> {
  const { port } = await baseUrlFor(app);
  return new Promise<RawResponse>((resolve, reject) => {
    const outgoing = httpRequest(
      { host: '127.0.0.1', port, method: req.method, path: req.path, headers: req.headers },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () =>
          resolve({
            status: res.statusCode ?? 0,
            headers: res.headers,
            text: Buffer.concat(chunks).toString('utf8'),
          }),
        );
      },
    );
    outgoing.on('error', reject);
    outgoing.end(req.body);
  });
}

/**
 * Writes `bytes` to a fresh connection and returns everything the server wrote until it
 * closed the connection (for requests whose bytes do not match their own headers, where more
 * than one answer, or an answer before the body was read, can come back).
 */
export async function sendBytes(app: App, bytes: string | Buffer): Promise<string> {
  const { port } = await baseUrlFor(app);
  return new Promise<string>((resolve, reject) => {
    const chunks: Buffer[] = [];
    const socket = connect(port, '127.0.0.1', () => socket.write(bytes));
    socket.setTimeout(5000, () => socket.destroy(new Error('the server kept the connection open')));
    socket.on('data', (chunk: Buffer) => chunks.push(chunk));
    socket.on('error', reject);
    socket.on('close', () => resolve(Buffer.concat(chunks).toString('utf8')));
  });
}

/** Each `HTTP/1.1 <status>` answer in a raw response stream, with its Content-Type. */
export function answersIn(raw: string): { status: number; contentType: string | undefined }[] {
  return raw
    .split(/(?=HTTP\/1\.1 \d{3} )/)
    .filter((part) => part.startsWith('HTTP/1.1 '))
    .map((part) => ({
      status: Number(part.slice(9, 12)),
      contentType: /\r\ncontent-type: ([^\r]+)/i.exec(part)?.[1],
    }));
}
