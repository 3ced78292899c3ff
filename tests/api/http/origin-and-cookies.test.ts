// The CSRF check also refuses writes a browser says came from another site, and in production
// the cookies are Secure, `__Host-`-named on https, and scoped to the host.
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createApp, createSequelize, loadEnv } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { newClient } from '../../fixtures/client.js';
import { signUpCompany, uniqueEmail } from '../../fixtures/factories.js';
import { testAppUrl, testEnvVars } from '../../fixtures/test-env.js';

describe('origin check on state-changing requests', () => {
  it('refuses a cross-origin write even with a valid token, naming the origin', async () => {
    const { app } = testApp();
    const { client } = await signUpCompany(app);
    for (const origin of ['https://elsewhere.example', 'null', `${testAppUrl}.elsewhere.example`]) {
      const res = await client.agent
        .post('/api/customers')
        .set('x-csrf-token', client.csrf)
        .set('Origin', origin)
        .send({ name: 'From elsewhere' })
        .expect(403);
      expect(res.body).toMatchObject({ code: 'CSRF_INVALID' });
      expect(res.body.detail).toContain(`Origin "${origin}" is not this site's`);
    }
    const list = await client.get('/api/customers').expect(200);
    expect(JSON.stringify(list.body)).not.toContain('From elsewhere');
  });

  it('refuses Sec-Fetch-Site: cross-site when there is no Origin', async () => {
    const { app } = testApp();
    const { client } = await signUpCompany(app);
    const res = await client.agent
      .post('/api/customers')
      .set('x-csrf-token', client.csrf)
      .set('Sec-Fetch-Site', 'cross-site')
      .send({ name: 'Cross site' })
      .expect(403);
    expect(res.body.detail).toMatch(/Sec-Fetch-Site: cross-site/);
  });

  it('accepts same-origin writes, same-origin/none fetch metadata, and writes with neither', async () => {
    const { app } = testApp();
    const { client } = await signUpCompany(app);
    const post = (name: string) =>
      client.agent.post('/api/customers').set('x-csrf-token', client.csrf).send({ name });
    await post('Same origin').set('Origin', testAppUrl).expect(201);
    await post('Fetch same-origin').set('Sec-Fetch-Site', 'same-origin').expect(201);
    await post('Typed address').set('Sec-Fetch-Site', 'none').expect(201);
    await post('No headers').expect(201);
  });

  it('still needs the token from a same-origin page', async () => {
    const { app } = testApp();
    const { client } = await signUpCompany(app);
    const res = await client.agent
      .post('/api/customers')
      .set('Origin', testAppUrl)
      .send({ name: 'No token' })
      .expect(403);
    expect(res.body.detail).toMatch(/CSRF token/);
  });

  it('lets reads through from any origin', async () => {
    const { app } = testApp();
    const { client } = await signUpCompany(app);
    await client.agent.get('/api/me').set('Origin', 'https://elsewhere.example').expect(200);
  });
});

describe('cookies in production', () => {
  const appUrl = 'https://turf.example.test';
  const env = loadEnv({
    ...testEnvVars,
    NODE_ENV: 'production',
    APP_URL: appUrl,
    TRUST_PROXY: '1',
    UPLOADS_DIR: join(tmpdir(), `seamwright-uploads-${process.pid}`),
  });
  const sequelize = createSequelize(env.db);
  const app = createApp({ env, sequelize, plannerPool: testApp().plannerPool });

  afterAll(async () => {
    await sequelize.close();
  });

  function setCookies(res: { headers: Record<string, unknown> }): string[] {
    const header = res.headers['set-cookie'];
    return Array.isArray(header) ? header.map(String) : [];
  }

  function cookieNamed(res: { headers: Record<string, unknown> }, name: string): string {
    const found = setCookies(res).find((c) => c.startsWith(`${name}=`));
    if (!found) throw new Error(`no ${name} cookie in ${JSON.stringify(setCookies(res))}`);
    return found;
  }

  /** The attributes of a Set-Cookie line, lower-cased, without the name=value pair. */
  function attributes(setCookie: string): string[] {
    return setCookie
      .split(';')
      .slice(1)
      .map((a) => a.trim().toLowerCase().split('=')[0] ?? '');
  }

  it('sets __Host-sw.csrf and __Host-sw.sid: Secure, HttpOnly, SameSite=Lax, Path=/, no Domain', async () => {
    // Behind the trusted proxy that terminates https.
    const csrf = await request(app)
      .get('/api/auth/csrf')
      .set('X-Forwarded-Proto', 'https')
      .expect(200);
    const csrfCookie = cookieNamed(csrf, '__Host-sw.csrf');
    expect(attributes(csrfCookie)).toEqual(
      expect.arrayContaining(['path', 'httponly', 'secure', 'samesite']),
    );
    expect(csrfCookie).toMatch(/; Path=\/(;|$)/);
    expect(attributes(csrfCookie)).not.toContain('domain');
    const token = (csrf.body as { data: { token: string } }).data.token;
    const csrfPair = csrfCookie.split(';')[0] ?? '';

    const signup = await request(app)
      .post('/api/auth/signup')
      .set('X-Forwarded-Proto', 'https')
      .set('Origin', appUrl)
      .set('Cookie', csrfPair)
      .set('x-csrf-token', token)
      .send({
        companyName: 'Secure Turf Co',
        name: 'Pat Production',
        email: uniqueEmail('prod-owner'),
        password: 'a-production-password-1',
      })
      .expect(201);
    const sessionCookie = cookieNamed(signup, '__Host-sw.sid');
    expect(attributes(sessionCookie)).toEqual(
      expect.arrayContaining(['path', 'httponly', 'secure', 'samesite']),
    );
    expect(attributes(sessionCookie)).not.toContain('domain');
    expect(setCookies(signup).some((c) => c.startsWith('sw.sid='))).toBe(false);

    const sessionPair = sessionCookie.split(';')[0] ?? '';
    await request(app).get('/api/me').set('Cookie', sessionPair).expect(200);
    // The unprefixed name means nothing here.
    await request(app)
      .get('/api/me')
      .set('Cookie', sessionPair.replace('__Host-sw.sid', 'sw.sid'))
      .expect(401);

    const logout = await request(app)
      .post('/api/auth/logout')
      .set('X-Forwarded-Proto', 'https')
      .set('Origin', appUrl)
      .set('Cookie', `${csrfPair}; ${sessionPair}`)
      .set('x-csrf-token', token)
      .expect(204);
    expect(cookieNamed(logout, '__Host-sw.sid')).toMatch(/Expires=Thu, 01 Jan 1970/);
  });

  it('refuses writes from the plain-http test origin', async () => {
    const client = await newClient(app);
    const res = await client.agent
      .post('/api/auth/login')
      .set('Origin', testAppUrl)
      .set('x-csrf-token', client.csrf)
      .send({})
      .expect(403);
    expect(res.body.detail).toContain(`changes are accepted only from ${appUrl}`);
  });
});
