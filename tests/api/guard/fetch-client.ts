// A signed-in client over fetch against one listening server with keep-alive: thousands of
// fuzz requests cost a fraction of supertest's (which starts a server per request).
import type { Server } from 'node:http';
import type { App } from '../../fixtures/app.js';

export interface FetchAnswer {
  status: number;
  headers: Record<string, string>;
  body: { code?: string; errors?: { path: string }[] };
  bytes: number;
}

export interface FetchClient {
  send(method: string, path: string, body?: unknown): Promise<FetchAnswer>;
  close(): Promise<void>;
}

/** Listens on a free loopback port, signs `email` in and returns a client with their session. */
export async function signedInFetchClient(
  app: App,
  email: string,
  password: string,
): Promise<FetchClient> {
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const address = server.address();
  if (!address || typeof address === 'string') throw new Error('no port');
  const base = `http://127.0.0.1:${address.port}`;
  const jar = new Map<string, string>();
  let csrf = '';

  async function send(method: string, path: string, body?: unknown): Promise<FetchAnswer> {
    const headers: Record<string, string> = {
      cookie: [...jar].map(([k, v]) => `${k}=${v}`).join('; '),
      'x-csrf-token': csrf,
    };
    let payload: string | undefined;
    if (body !== undefined) {
      payload = JSON.stringify(body);
      headers['content-type'] = 'application/json';
    }
    const res = await fetch(`${base}${path}`, {
      method: method.toUpperCase(),
      headers,
      body: payload,
    });
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const at = pair!.indexOf('=');
      jar.set(pair!.slice(0, at), pair!.slice(at + 1));
    }
    const text = await res.text();
    const type = res.headers.get('content-type') ?? '';
    return {
      status: res.status,
      headers: { 'content-type': type },
      body: type.includes('json') && text ? (JSON.parse(text) as FetchAnswer['body']) : {},
      bytes: payload ? Buffer.byteLength(payload) : 0,
    };
  }

  const token = await send('get', '/api/auth/csrf');
  csrf = (token.body as unknown as { data: { token: string } }).data.token;
  const login = await send('post', '/api/auth/login', { email, password });
  if (login.status !== 200) throw new Error(`sign-in failed: ${login.status}`);
  return {
    send,
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
