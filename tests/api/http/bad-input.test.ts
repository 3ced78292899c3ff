// Malformed requests are the client's fault: each answers the matching 4xx problem+json with a
// detail that says what is wrong, never a logged 500.
import { gzipSync } from 'node:zlib';
import request from 'supertest';
import type { Response } from 'supertest';
import { describe, expect, it } from 'vitest';
import { testApp } from '../../fixtures/app.js';
import { newClient } from '../../fixtures/client.js';
import { signUpCompany } from '../../fixtures/factories.js';
import { credentials } from './fuzz-inputs.js';
import { answersIn, sendBytes, sendRaw } from './raw-request.js';

function expectProblem(res: Response, status: number, code: string, detail: RegExp): void {
  expect(res.status).toBe(status);
  expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
  expect(res.body).toMatchObject({ status, code });
  expect((res.body as { detail?: string }).detail).toMatch(detail);
}

describe('malformed requests', () => {
  it('answers 400 for a path parameter with a malformed percent-escape', async () => {
    const { app } = testApp();
    const res = await request(app).get('/api/invitations/%E0%A4%A');
    expectProblem(res, 400, 'BAD_REQUEST', /malformed percent-escape/);
  });

  it('answers 415 naming an unsupported Content-Encoding', async () => {
    const { app } = testApp();
    const { client } = await signUpCompany(app);
    const res = await client.agent
      .post('/api/customers')
      .set('x-csrf-token', client.csrf)
      .set('Content-Type', 'application/json')
      .set('Content-Encoding', 'bogus')
      .send('{"name":"Encoded"}');
    expectProblem(res, 415, 'UNSUPPORTED_MEDIA_TYPE', /Content-Encoding "bogus"/);
  });

  it('still reads a gzip body, and answers 400 when the gzip is broken', async () => {
    const { app } = testApp();
    const { client } = await signUpCompany(app);
    const post = (body: Buffer) =>
      sendRaw(app, {
        method: 'POST',
        path: '/api/customers',
        headers: {
          ...credentials(client),
          'content-type': 'application/json',
          'content-encoding': 'gzip',
        },
        body,
      });
    expect((await post(gzipSync('{"name":"Zipped"}'))).status).toBe(201);
    const broken = await post(Buffer.from('not gzip at all'));
    expect(broken.status).toBe(400);
    expect(JSON.parse(broken.text)).toMatchObject({
      code: 'BAD_REQUEST',
      detail: expect.stringMatching(/could not be read: incorrect header check/),
    });
  });

  it('answers 415 naming an unsupported charset', async () => {
    const { app } = testApp();
    const { client } = await signUpCompany(app);
    const res = await client.agent
      .post('/api/customers')
      .set('x-csrf-token', client.csrf)
      .set('Content-Type', 'application/json; charset=latin1')
      .send('{"name":"Latin"}');
    expectProblem(res, 415, 'UNSUPPORTED_MEDIA_TYPE', /charset "latin1"/);
  });

  it('answers 415 for a body that is not JSON instead of reporting missing fields', async () => {
    const { app } = testApp();
    const { client } = await signUpCompany(app);
    const res = await client.agent
      .post('/api/customers')
      .set('x-csrf-token', client.csrf)
      .type('form')
      .send('name=Formed');
    expectProblem(
      res,
      415,
      'UNSUPPORTED_MEDIA_TYPE',
      /application\/x-www-form-urlencoded.*send the body as application\/json/,
    );
  });

  it('answers a body that does not match its Content-Length with 4xx problems only', async () => {
    const { app } = testApp();
    const { client } = await signUpCompany(app);
    const auth = credentials(client);
    const body = '{"name":"Cut"}';
    for (const declared of ['0', '5']) {
      const raw = await sendBytes(
        app,
        [
          'POST /api/customers HTTP/1.1',
          'Host: 127.0.0.1',
          `Cookie: ${auth.cookie}`,
          `x-csrf-token: ${auth['x-csrf-token']}`,
          'Content-Type: application/json',
          `Content-Length: ${declared}`,
          '',
          body,
        ].join('\r\n'),
      );
      const answers = answersIn(raw);
      expect(answers.length, raw).toBeGreaterThan(0);
      for (const answer of answers) {
        expect(answer.status, raw).toBeGreaterThanOrEqual(400);
        expect(answer.status, raw).toBeLessThan(500);
        expect(answer.contentType, raw).toMatch(/^application\/problem\+json/);
      }
    }
  });

  it('answers headers over 16 KB with 431 problem+json', async () => {
    const { app } = testApp();
    const res = await sendRaw(app, {
      method: 'GET',
      path: '/api/health',
      headers: { 'x-filler': 'f'.repeat(20_000) },
    });
    expect(res.status).toBe(431);
    expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(JSON.parse(res.text)).toMatchObject({ status: 431, code: 'HEADERS_TOO_LARGE' });
  });

  it('answers a request line that is not HTTP with 400 problem+json', async () => {
    const { app } = testApp();
    const answers = answersIn(await sendBytes(app, 'GET /api/health HTTP/9.9 nonsense\r\n\r\n'));
    expect(answers).toEqual([{ status: 400, contentType: 'application/problem+json' }]);
  });

  it('answers 413 with the limit for a body over 1 MB', async () => {
    const { app } = testApp();
    const { client } = await signUpCompany(app);
    const res = await client.post('/api/customers', { name: 'x'.repeat(1_100_000) });
    expectProblem(res, 413, 'PAYLOAD_TOO_LARGE', /limit is 1048576 bytes/);
  });

  it('treats a CSRF cookie that cannot be percent-decoded as no cookie (403, not 500)', async () => {
    const { app } = testApp();
    const client = await newClient(app);
    const res = await request(app)
      .post('/api/auth/login')
      .set('Cookie', 'sw.csrf=%E0')
      .set('x-csrf-token', client.csrf)
      .send({ email: 'nobody@tests.seamwright.test', password: 'whatever-it-is' });
    expectProblem(res, 403, 'CSRF_INVALID', /CSRF token/);
  });

  it('treats a malformed or forged session cookie as signed out', async () => {
    const { app } = testApp();
    for (const value of ['%E0', 's%3Aforged.signature', 's:', 'x'.repeat(4000), '%00%ZZ']) {
      const res = await request(app).get('/api/me').set('Cookie', `sw.sid=${value}`);
      expectProblem(res, 401, 'UNAUTHENTICATED', /Sign in/);
    }
  });
});
