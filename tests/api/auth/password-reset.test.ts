import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { createApp, executeSql, loadEnv, selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { newClient } from '../../fixtures/client.js';
import { signUpCompany, testPassword, uniqueEmail } from '../../fixtures/factories.js';
import { countMailsTo, tokenFromMail, waitForMail } from '../../fixtures/mail.js';

const newPassword = 'a-brand-new-password-9';

describe('password reset', () => {
  it('e-mails a one-hour link, sets the new password, ends other sessions and refuses reuse', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    const anonymous = await newClient(app);
    await anonymous.post('/api/auth/password-reset', { email: owner.email }).expect(202);

    const mail = await waitForMail(owner.email);
    const token = tokenFromMail(mail, 'reset-password');
    const [reset] = await selectRows<{ token_hash: string; seconds: number }>(
      sequelize,
      'SELECT token_hash, TIMESTAMPDIFF(SECOND, pr.created_at, pr.expires_at) AS seconds FROM password_resets pr JOIN users u ON u.id = pr.user_id WHERE u.email = ?',
      [owner.email],
    );
    expect(reset?.token_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(reset?.token_hash).not.toContain(token);
    // One hour, give or take the second the row took to write.
    expect(Math.abs(Number(reset?.seconds) - 3600)).toBeLessThanOrEqual(2);

    await anonymous
      .post(`/api/auth/password-reset/${token}`, { password: newPassword })
      .expect(204);
    // The owner's earlier session is gone.
    await owner.client.get('/api/me').expect(401);
    await anonymous
      .post('/api/auth/login', { email: owner.email, password: testPassword })
      .expect(401);
    await anonymous
      .post('/api/auth/login', { email: owner.email, password: newPassword })
      .expect(200);

    const reused = await anonymous
      .post(`/api/auth/password-reset/${token}`, { password: 'yet-another-password' })
      .expect(410);
    expect(reused.body.code).toBe('TOKEN_INVALID');
  });

  it('answers 202 for an unknown e-mail without sending anything', async () => {
    const { app } = testApp();
    const client = await newClient(app);
    const email = uniqueEmail('ghost');
    const res = await client.post('/api/auth/password-reset', { email }).expect(202);
    expect(res.body).toEqual({ data: { accepted: true } });
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect(await countMailsTo(email)).toBe(0);
  });

  it('refuses an expired link with 410 and leaves the password unchanged', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    const client = await newClient(app);
    await client.post('/api/auth/password-reset', { email: owner.email }).expect(202);
    const token = tokenFromMail(await waitForMail(owner.email), 'reset-password');
    await executeSql(
      sequelize,
      'UPDATE password_resets SET expires_at = NOW() - INTERVAL 1 MINUTE WHERE user_id = ?',
      [owner.me.user.id],
    );
    await client.post(`/api/auth/password-reset/${token}`, { password: newPassword }).expect(410);
    await client
      .post('/api/auth/login', { email: owner.email, password: testPassword })
      .expect(200);
  });

  it('answers 410 for a made-up token and 400 for a too-short password', async () => {
    const { app } = testApp();
    const client = await newClient(app);
    await client
      .post('/api/auth/password-reset/not-a-real-token', { password: newPassword })
      .expect(410);
    const short = await client
      .post('/api/auth/password-reset/whatever', { password: 'short' })
      .expect(400);
    expect(short.body.errors[0].path).toBe('password');
  });
});

describe('password reset links and sessions', () => {
  it('a new request retires the earlier link, so only the newest one works', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const client = await newClient(app);
    await client.post('/api/auth/password-reset', { email: owner.email }).expect(202);
    const first = tokenFromMail(await waitForMail(owner.email), 'reset-password');
    await client.post('/api/auth/password-reset', { email: owner.email }).expect(202);
    const second = await waitForNewToken(owner.email, first);

    const stale = await client
      .post(`/api/auth/password-reset/${first}`, { password: newPassword })
      .expect(410);
    expect(stale.body.code).toBe('TOKEN_INVALID');
    await client.post(`/api/auth/password-reset/${second}`, { password: newPassword }).expect(204);
    await client.post('/api/auth/login', { email: owner.email, password: newPassword }).expect(200);
  });

  it('a completed reset retires every other outstanding link and ends every session of the user', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    const elsewhere = await newClient(app);
    await elsewhere
      .post('/api/auth/login', { email: owner.email, password: testPassword })
      .expect(200);
    // A second link still open (e.g. asked for on another device just as the first was used).
    const other = `other-link-${randomUUID()}`;
    await executeSql(
      sequelize,
      `INSERT INTO password_resets (id, user_id, token_hash, expires_at, used_at, created_at)
       VALUES (UUID(), ?, SHA2(?, 256), NOW() + INTERVAL 1 HOUR, NULL, NOW(3))`,
      [owner.me.user.id, other],
    );
    const anonymous = await newClient(app);
    await anonymous.post('/api/auth/password-reset', { email: owner.email }).expect(202);
    const token = tokenFromMail(await waitForMail(owner.email), 'reset-password');
    // Asking alone ends no session.
    await owner.client.get('/api/me').expect(200);

    await anonymous
      .post(`/api/auth/password-reset/${token}`, { password: newPassword })
      .expect(204);
    const open = await selectRows(
      sequelize,
      'SELECT id FROM password_resets WHERE user_id = ? AND used_at IS NULL',
      [owner.me.user.id],
    );
    expect(open).toHaveLength(0);
    await anonymous
      .post(`/api/auth/password-reset/${other}`, { password: 'yet-another-password' })
      .expect(410);
    await owner.client.get('/api/me').expect(401);
    await elsewhere.get('/api/me').expect(401);
    expect(
      await selectRows(sequelize, 'SELECT sid FROM sessions WHERE user_id = ?', [owner.me.user.id]),
    ).toHaveLength(0);
  });
});

describe('password reset timing', () => {
  it('answers before the e-mail is delivered, the same for known and unknown addresses', async () => {
    const { sequelize } = testApp();
    const delivered: string[] = [];
    // A mail server that accepts the connection and never answers.
    const stuckMailer = {
      send: (mail: { to: string }) => {
        delivered.push(mail.to);
        return new Promise<void>(() => undefined);
      },
      close: () => undefined,
    };
    const app = createApp({
      env: loadEnv(),
      sequelize,
      mailer: stuckMailer,
      plannerPool: testApp().plannerPool,
    });
    const owner = await signUpCompany(app);
    const client = await newClient(app);
    const known = await client
      .post('/api/auth/password-reset', { email: owner.email })
      .timeout(3000)
      .expect(202);
    const unknown = await client
      .post('/api/auth/password-reset', { email: uniqueEmail('nobody') })
      .timeout(3000)
      .expect(202);
    expect(known.body).toEqual(unknown.body);
    // The link was still made and handed to the mailer, after the answer.
    await expect.poll(() => delivered, { timeout: 3000 }).toEqual([owner.email]);
    const links = await selectRows(sequelize, 'SELECT id FROM password_resets WHERE user_id = ?', [
      owner.me.user.id,
    ]);
    expect(links).toHaveLength(1);
  });
});

/** Waits for a reset e-mail whose token differs from `previous`. */
async function waitForNewToken(email: string, previous: string): Promise<string> {
  const deadline = Date.now() + 3000;
  while (Date.now() < deadline) {
    const token = tokenFromMail(await waitForMail(email), 'reset-password');
    if (token !== previous) return token;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  throw new Error(`no second reset e-mail to ${email}`);
}
