// Every sign-in flow is limited per IP and per account (e-mail, link token or user), and a
// company may send only so many invitation e-mails a day. The suite's own app lifts per-IP
// limits (all tests share 127.0.0.1), so each test here builds an app with the limit under
// test lowered, trusts X-Forwarded-For, and speaks from a fresh made-up IP.
import { randomInt, randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { createApp, loadEnv, selectRows } from '@seamwright/api';
import { csrfHeaderName } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import type { App } from '../../fixtures/app.js';
import { newClient } from '../../fixtures/client.js';
import type { Client } from '../../fixtures/client.js';
import { signUpCompany, testPassword, uniqueEmail } from '../../fixtures/factories.js';
import { tokenFromMail, waitForMail } from '../../fixtures/mail.js';

interface Answer {
  status: number;
  headers: Record<string, string>;
  body: { code?: string };
}

/** An app like the suite's, with the given limits lowered and client IPs taken from the proxy header. */
function appWith(overrides: Record<string, string>): App {
  const env = loadEnv({ ...process.env, TRUST_PROXY: '1', ...overrides });
  return createApp({ env, sequelize: testApp().sequelize, plannerPool: testApp().plannerPool });
}

function freshIp(): string {
  return `10.${randomInt(256)}.${randomInt(256)}.${randomInt(1, 255)}`;
}

/** POST as `client`, seen by the app as coming from `ip`. */
function postFrom(client: Client, ip: string, url: string, body: object = {}) {
  return client.agent
    .post(url)
    .set(csrfHeaderName, client.csrf)
    .set('x-forwarded-for', ip)
    .send(body);
}

function expectLimited(res: Answer): void {
  expect(res.status).toBe(429);
  expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
  expect(res.body.code).toBe('RATE_LIMITED');
  expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
}

const signupBody = (email: string) => ({
  companyName: `Limit Turf ${randomUUID().slice(0, 6)}`,
  name: 'Lim Owner',
  email,
  password: testPassword,
});

describe('sign-up limits', () => {
  it('limits sign-ups per IP, and another IP may still sign up', async () => {
    const app = appWith({ RATE_LIMIT_SIGNUP_PER_IP: '2' });
    const client = await newClient(app);
    const ip = freshIp();
    for (let i = 0; i < 2; i += 1)
      await postFrom(client, ip, '/api/auth/signup', signupBody(uniqueEmail('ip'))).expect(201);
    expectLimited(await postFrom(client, ip, '/api/auth/signup', signupBody(uniqueEmail('ip'))));
    await postFrom(client, freshIp(), '/api/auth/signup', signupBody(uniqueEmail('ip'))).expect(
      201,
    );
  });

  it('limits sign-up attempts per e-mail across IPs (default 3 per window)', async () => {
    const app = appWith({});
    const client = await newClient(app);
    const email = uniqueEmail('taken');
    await postFrom(client, freshIp(), '/api/auth/signup', signupBody(email)).expect(201);
    for (let i = 0; i < 2; i += 1)
      await postFrom(client, freshIp(), '/api/auth/signup', signupBody(email)).expect(409);
    expectLimited(await postFrom(client, freshIp(), '/api/auth/signup', signupBody(email)));
  });
});

describe('sign-in limits', () => {
  it('limits failed sign-ins per IP across many e-mails', async () => {
    const app = appWith({ RATE_LIMIT_LOGIN_FAILURES_PER_IP: '2' });
    const client = await newClient(app);
    const ip = freshIp();
    for (let i = 0; i < 2; i += 1)
      await postFrom(client, ip, '/api/auth/login', {
        email: uniqueEmail('guess'),
        password: 'wrong-password',
      }).expect(401);
    expectLimited(
      await postFrom(client, ip, '/api/auth/login', {
        email: uniqueEmail('guess'),
        password: 'wrong-password',
      }),
    );
  });
});

describe('password reset limits', () => {
  it('limits reset requests per IP and per e-mail (default 3 per window)', async () => {
    const perIp = appWith({ RATE_LIMIT_RESET_REQUEST_PER_IP: '2' });
    const client = await newClient(perIp);
    const ip = freshIp();
    for (let i = 0; i < 2; i += 1)
      await postFrom(client, ip, '/api/auth/password-reset', {
        email: uniqueEmail('forgot'),
      }).expect(202);
    expectLimited(
      await postFrom(client, ip, '/api/auth/password-reset', { email: uniqueEmail('forgot') }),
    );

    const email = uniqueEmail('forgot-one');
    for (let i = 0; i < 3; i += 1)
      await postFrom(client, freshIp(), '/api/auth/password-reset', { email }).expect(202);
    expectLimited(await postFrom(client, freshIp(), '/api/auth/password-reset', { email }));
  });

  it('limits attempts with reset links per IP and per token (default 5 per window)', async () => {
    const app = appWith({ RATE_LIMIT_RESET_PER_IP: '2' });
    const client = await newClient(app);
    const body = { password: 'a-brand-new-password-9' };
    const ip = freshIp();
    for (let i = 0; i < 2; i += 1)
      await postFrom(client, ip, `/api/auth/password-reset/made-up-${randomUUID()}`, body).expect(
        410,
      );
    expectLimited(
      await postFrom(client, ip, `/api/auth/password-reset/made-up-${randomUUID()}`, body),
    );

    const token = `made-up-${randomUUID()}`;
    for (let i = 0; i < 5; i += 1)
      await postFrom(client, freshIp(), `/api/auth/password-reset/${token}`, body).expect(410);
    expectLimited(await postFrom(client, freshIp(), `/api/auth/password-reset/${token}`, body));
  });
});

describe('invitation limits', () => {
  it('limits accepting per IP, and password guesses per invitation (default 5) even with the right one', async () => {
    const app = appWith({ RATE_LIMIT_ACCEPT_PER_IP: '2' });
    const visitor = await newClient(app);
    const ip = freshIp();
    const guess = { password: 'not-their-password' };
    for (let i = 0; i < 2; i += 1)
      await postFrom(visitor, ip, `/api/invitations/made-up-${randomUUID()}/accept`, guess).expect(
        410,
      );
    expectLimited(
      await postFrom(visitor, ip, `/api/invitations/made-up-${randomUUID()}/accept`, guess),
    );

    const member = await signUpCompany(app);
    const inviter = await signUpCompany(app);
    await inviter.client
      .post('/api/invitations', { email: member.email, role: 'office' })
      .expect(201);
    const token = tokenFromMail(await waitForMail(member.email), 'invitations');
    for (let i = 0; i < 5; i += 1)
      await postFrom(visitor, freshIp(), `/api/invitations/${token}/accept`, guess).expect(401);
    expectLimited(
      await postFrom(visitor, freshIp(), `/api/invitations/${token}/accept`, {
        password: testPassword,
      }),
    );
  });

  it('limits sending invitations per IP across users, and per user across IPs', async () => {
    const perIp = appWith({ RATE_LIMIT_INVITE_PER_IP: '2' });
    const first = await signUpCompany(perIp);
    const second = await signUpCompany(perIp);
    const ip = freshIp();
    const invite = (owner: Client, from: string) =>
      postFrom(owner, from, '/api/invitations', { email: uniqueEmail('inv'), role: 'office' });
    await invite(first.client, ip).expect(201);
    await invite(second.client, ip).expect(201);
    expectLimited(await invite(second.client, ip));

    const perUser = appWith({ RATE_LIMIT_INVITE_PER_USER: '2' });
    const owner = await signUpCompany(perUser);
    for (let i = 0; i < 2; i += 1) await invite(owner.client, freshIp()).expect(201);
    expectLimited(await invite(owner.client, freshIp()));
    await invite(first.client, freshIp()).expect(201);
  });

  it('caps the invitation e-mails of one company per day; refused invitations do not count', async () => {
    const { sequelize } = testApp();
    const app = appWith({ INVITATION_MAILS_PER_COMPANY_PER_DAY: '2' });
    const owner = await signUpCompany(app);
    // Already a member: 409, no e-mail, not counted.
    await owner.client.post('/api/invitations', { email: owner.email, role: 'office' }).expect(409);
    for (let i = 0; i < 2; i += 1)
      await owner.client
        .post('/api/invitations', { email: uniqueEmail('daily'), role: 'office' })
        .expect(201);
    const capped = await owner.client.post('/api/invitations', {
      email: uniqueEmail('daily'),
      role: 'office',
    });
    expectLimited(capped);
    // The window is a day: the wait is hours, not minutes.
    expect(Number(capped.headers['retry-after'])).toBeGreaterThan(23 * 3600);
    const rows = await selectRows(sequelize, 'SELECT id FROM invitations WHERE company_id = ?', [
      owner.me.company.id,
    ]);
    expect(rows).toHaveLength(2);
    // Another company is not affected.
    const other = await signUpCompany(app);
    await other.client
      .post('/api/invitations', { email: uniqueEmail('daily'), role: 'office' })
      .expect(201);
  });
});
