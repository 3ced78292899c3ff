import { describe, expect, it } from 'vitest';
import { executeSql, selectRows } from '@seamwright/api';
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
