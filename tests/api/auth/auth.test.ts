import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp, decoyPasswordFor, loadEnv, selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { newClient } from '../../fixtures/client.js';
import { signUpCompany, testPassword, uniqueEmail } from '../../fixtures/factories.js';

describe('sign-up', () => {
  it('creates the company, an owner membership and a session, and answers the MeView', async () => {
    const { app, sequelize } = testApp();
    const client = await newClient(app);
    const email = uniqueEmail('signup');
    const res = await client
      .post('/api/auth/signup', {
        companyName: 'Marrowgate Greens',
        name: 'Ada Owner',
        email: email.toUpperCase(),
        password: testPassword,
      })
      .expect(201);
    expect(res.body.data).toMatchObject({
      user: { name: 'Ada Owner', email },
      role: 'owner',
      company: { name: 'Marrowgate Greens', currency: 'USD' },
    });
    expect(res.body.data.companies).toHaveLength(1);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/sw\.sid=.*HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    await client.get('/api/me').expect(200);
    const rows = await selectRows(sequelize, 'SELECT password_hash FROM users WHERE email = ?', [
      email,
    ]);
    expect(String(rows[0]?.password_hash)).toMatch(/^\$2[aby]\$04\$/);
    const audit = await selectRows(
      sequelize,
      'SELECT action FROM audit_events WHERE company_id = ?',
      [res.body.data.company.id],
    );
    expect(audit.map((a) => a.action)).toContain('company.created');
  });

  it('refuses a second account with the same e-mail with 409 EMAIL_TAKEN and creates no company', async () => {
    const { app, sequelize } = testApp();
    const first = await signUpCompany(app);
    const client = await newClient(app);
    const res = await client
      .post('/api/auth/signup', {
        companyName: 'Duplicate Turf',
        name: 'Someone',
        email: first.email,
        password: testPassword,
      })
      .expect(409);
    expect(res.body.code).toBe('EMAIL_TAKEN');
    expect(
      await selectRows(sequelize, "SELECT id FROM companies WHERE name = 'Duplicate Turf'"),
    ).toHaveLength(0);
  });

  it('answers 400 with field paths for bad input and saves nothing', async () => {
    const { app, sequelize } = testApp();
    const client = await newClient(app);
    const email = uniqueEmail('bad');
    const res = await client
      .post('/api/auth/signup', { companyName: '', name: 'X', email, password: 'short' })
      .expect(400);
    expect(res.body.code).toBe('VALIDATION_FAILED');
    const paths = (res.body.errors as { path: string }[]).map((e) => e.path);
    expect(paths).toEqual(expect.arrayContaining(['companyName', 'password']));
    expect(
      await selectRows(sequelize, 'SELECT id FROM users WHERE email = ?', [email]),
    ).toHaveLength(0);
  });
});

describe('CSRF', () => {
  it('rejects a state-changing request without the token with 403 CSRF_INVALID', async () => {
    const { app } = testApp();
    const client = await newClient(app);
    const res = await client.agent
      .post('/api/auth/login')
      .send({ email: 'x@y.test', password: 'whatever-long' })
      .expect(403);
    expect(res.body.code).toBe('CSRF_INVALID');
    expect(res.headers['content-type']).toMatch(/problem\+json/);
  });

  it('rejects a token that does not match the cookie secret', async () => {
    const { app } = testApp();
    const a = await newClient(app);
    const b = await newClient(app);
    const res = await a.agent.post('/api/auth/logout').set('x-csrf-token', b.csrf).expect(403);
    expect(res.body.code).toBe('CSRF_INVALID');
  });

  it('keeps the same token valid after sign-in regenerates the session', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    await owner.client.post('/api/auth/logout').expect(204);
    await owner.client
      .post('/api/auth/login', { email: owner.email, password: testPassword })
      .expect(200);
    await owner.client.post('/api/customers', { name: 'After login' }).expect(201);
  });
});

describe('sign-in, me and sign-out', () => {
  it('signs in with a new session id, reports me, and signs out clearing the session', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    const before = String(
      owner.client.agent.jar.getCookie('sw.sid', {
        path: '/',
        domain: '127.0.0.1',
        secure: false,
        script: false,
      })?.value,
    );
    const login = await owner.client
      .post('/api/auth/login', { email: owner.email, password: testPassword })
      .expect(200);
    expect(login.body.data.user.email).toBe(owner.email);
    const after = String(
      owner.client.agent.jar.getCookie('sw.sid', {
        path: '/',
        domain: '127.0.0.1',
        secure: false,
        script: false,
      })?.value,
    );
    expect(after).not.toBe(before);
    const me = await owner.client.get('/api/me').expect(200);
    expect(me.body.data).toMatchObject({ role: 'owner', company: { id: owner.me.company.id } });

    const sessionsBefore = await selectRows(
      sequelize,
      'SELECT sid FROM sessions WHERE user_id = ?',
      [owner.me.user.id],
    );
    expect(sessionsBefore.length).toBeGreaterThan(0);
    const out = await owner.client.post('/api/auth/logout').expect(204);
    expect(String(out.headers['set-cookie'])).toMatch(/sw\.sid=;/);
    await owner.client.get('/api/me').expect(401);
  });

  it('gives the same 401 INVALID_CREDENTIALS for a wrong password and an unknown e-mail', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const client = await newClient(app);
    const wrong = await client
      .post('/api/auth/login', { email: owner.email, password: 'not-the-password' })
      .expect(401);
    const unknown = await client
      .post('/api/auth/login', { email: uniqueEmail('nobody'), password: 'not-the-password' })
      .expect(401);
    expect(wrong.body.code).toBe('INVALID_CREDENTIALS');
    expect(unknown.body.code).toBe('INVALID_CREDENTIALS');
    expect(unknown.body.detail).toBe(wrong.body.detail);
  });

  it('checks an unknown e-mail against a decoy of the same bcrypt cost as real passwords', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    const [row] = await selectRows<{ password_hash: string }>(
      sequelize,
      'SELECT password_hash FROM users WHERE id = ?',
      [owner.me.user.id],
    );
    const cost = String(loadEnv().bcryptCost).padStart(2, '0');
    // `$2b$04$…`: the cost is the second field; a cheaper decoy would answer unknown e-mails faster.
    const decoyPrefix = decoyPasswordFor(loadEnv().bcryptCost).hash.slice(0, 7);
    expect(decoyPrefix).toBe(`$2b$${cost}$`);
    expect(decoyPrefix).toBe(String(row?.password_hash).slice(0, 7));
  });

  it('answers 401 UNAUTHENTICATED on /api/me when signed out', async () => {
    const res = await request(testApp().app).get('/api/me').expect(401);
    expect(res.body.code).toBe('UNAUTHENTICATED');
  });

  it('answers 429 with Retry-After after 5 failed sign-ins, and a success resets the count', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const client = await newClient(app);
    for (let i = 0; i < 4; i += 1)
      await client
        .post('/api/auth/login', { email: owner.email, password: 'wrong-password' })
        .expect(401);
    await client
      .post('/api/auth/login', { email: owner.email, password: testPassword })
      .expect(200);
    // The success cleared the failures: five more wrong answers are allowed before the limit.
    for (let i = 0; i < 5; i += 1)
      await client
        .post('/api/auth/login', { email: owner.email, password: 'wrong-password' })
        .expect(401);
    const limited = await client
      .post('/api/auth/login', { email: owner.email, password: testPassword })
      .expect(429);
    expect(limited.body.code).toBe('RATE_LIMITED');
    expect(Number(limited.headers['retry-after'])).toBeGreaterThan(0);
    // Another e-mail from the same address is counted separately.
    await client
      .post('/api/auth/login', { email: uniqueEmail('other'), password: 'wrong-password' })
      .expect(401);
  });

  it('counts failed sign-ins in the database, so a second API process sees the same limit', async () => {
    const { app, sequelize, plannerPool } = testApp();
    const secondProcess = createApp({ env: loadEnv(), sequelize, plannerPool });
    const owner = await signUpCompany(app);
    const first = await newClient(app);
    for (let i = 0; i < 5; i += 1)
      await first
        .post('/api/auth/login', { email: owner.email, password: 'wrong-password' })
        .expect(401);
    const second = await newClient(secondProcess);
    const limited = await second
      .post('/api/auth/login', { email: owner.email, password: testPassword })
      .expect(429);
    expect(limited.body.code).toBe('RATE_LIMITED');
    const rows = await selectRows<{ key_hash: string; hits: number }>(
      sequelize,
      'SELECT key_hash, hits FROM rate_limit_hits WHERE hits >= 5',
    );
    // Keys are hashes: no e-mail address is stored in the table.
    expect(rows.length).toBeGreaterThan(0);
    expect(rows.every((row) => /^[0-9a-f]{64}$/.test(row.key_hash))).toBe(true);
  });

  it('answers 400 for a malformed JSON body', async () => {
    const { app } = testApp();
    const client = await newClient(app);
    const res = await client.agent
      .post('/api/auth/login')
      .set('x-csrf-token', client.csrf)
      .set('content-type', 'application/json')
      .send('{"email": ')
      .expect(400);
    expect(res.body.code).toBe('VALIDATION_FAILED');
  });
});
