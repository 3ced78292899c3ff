import { describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import type { Role } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { newClient } from '../../fixtures/client.js';
import { addMember, signUpCompany, testPassword } from '../../fixtures/factories.js';
import type { SignedIn } from '../../fixtures/factories.js';

const newPassword = 'a-fresh-password-for-turf-7';
const everyRole: Role[] = ['owner', 'office', 'bookkeeper', 'crew_lead'];

async function personIn(role: Role): Promise<SignedIn> {
  const { app } = testApp();
  const owner = await signUpCompany(app);
  return role === 'owner' ? owner : addMember(app, owner.client, role);
}

/** A second device: the same person signed in again with a fresh client. */
async function signInAgain(email: string, password: string) {
  const client = await newClient(testApp().app);
  await client.post('/api/auth/login', { email, password }).expect(200);
  return client;
}

async function passwordHashOf(userId: string): Promise<string> {
  const [row] = await selectRows<{ password_hash: string }>(
    testApp().sequelize,
    'SELECT password_hash FROM users WHERE id = ?',
    [userId],
  );
  return String(row?.password_hash);
}

describe('POST /api/me/password', () => {
  it.each(everyRole)(
    'lets the %s change their password, keeps this session and ends the others',
    async (role) => {
      const person = await personIn(role);
      const otherDevice = await signInAgain(person.email, testPassword);
      await person.client
        .post('/api/me/password', { currentPassword: testPassword, newPassword })
        .expect(204);

      await person.client.get('/api/me').expect(200);
      const ended = await otherDevice.get('/api/me').expect(401);
      expect(ended.body.code).toBe('UNAUTHENTICATED');

      const anonymous = await newClient(testApp().app);
      await anonymous
        .post('/api/auth/login', { email: person.email, password: testPassword })
        .expect(401);
      await signInAgain(person.email, newPassword);

      const [sessions] = await selectRows<{ n: number }>(
        testApp().sequelize,
        'SELECT COUNT(*) AS n FROM sessions WHERE user_id = ?',
        [person.me.user.id],
      );
      // The session that made the change, and the one just signed in with the new password.
      expect(Number(sessions?.n)).toBe(2);
    },
  );

  it('refuses a wrong current password beside the field and changes nothing', async () => {
    const person = await personIn('office');
    const otherDevice = await signInAgain(person.email, testPassword);
    const before = await passwordHashOf(person.me.user.id);
    const res = await person.client
      .post('/api/me/password', { currentPassword: 'not-my-password-at-all', newPassword })
      .expect(400);
    expect(res.body.code).toBe('VALIDATION_FAILED');
    expect(res.body.errors).toEqual([
      { path: 'currentPassword', message: 'That is not your current password' },
    ]);
    expect(await passwordHashOf(person.me.user.id)).toBe(before);
    await otherDevice.get('/api/me').expect(200);
    await person.client.get('/api/me').expect(200);
  });

  it('refuses a weak new password with 400 naming the field and changes nothing', async () => {
    const person = await personIn('crew_lead');
    const otherDevice = await signInAgain(person.email, testPassword);
    const before = await passwordHashOf(person.me.user.id);
    const res = await person.client
      .post('/api/me/password', { currentPassword: testPassword, newPassword: 'short' })
      .expect(400);
    expect(res.body.errors).toEqual([
      { path: 'newPassword', message: 'Use at least 10 characters' },
    ]);
    expect(await passwordHashOf(person.me.user.id)).toBe(before);
    await otherDevice.get('/api/me').expect(200);
  });

  it('refuses the current password as the new one, and a missing current password', async () => {
    const person = await personIn('bookkeeper');
    const same = await person.client
      .post('/api/me/password', { currentPassword: testPassword, newPassword: testPassword })
      .expect(400);
    expect(same.body.errors).toEqual([
      { path: 'newPassword', message: 'Choose a password different from the current one' },
    ]);
    const missing = await person.client.post('/api/me/password', { newPassword }).expect(400);
    expect(missing.body.errors).toEqual([
      { path: 'currentPassword', message: 'Enter your current password' },
    ]);
  });

  it('answers 429 with Retry-After after too many wrong current passwords, even with the right one', async () => {
    // The test environment allows 5 failures per 15 minutes (tests/fixtures/test-env.ts).
    const person = await personIn('owner');
    for (let attempt = 0; attempt < 5; attempt += 1)
      await person.client
        .post('/api/me/password', { currentPassword: `wrong-guess-${attempt}`, newPassword })
        .expect(400);
    const limited = await person.client
      .post('/api/me/password', { currentPassword: testPassword, newPassword })
      .expect(429);
    expect(limited.body.code).toBe('RATE_LIMITED');
    expect(Number(limited.headers['retry-after'])).toBeGreaterThan(0);
    await person.client.get('/api/me').expect(200);
  });

  it('does not count weak new passwords against the limit', async () => {
    const person = await personIn('office');
    for (let attempt = 0; attempt < 6; attempt += 1)
      await person.client
        .post('/api/me/password', { currentPassword: testPassword, newPassword: 'short' })
        .expect(400);
    await person.client
      .post('/api/me/password', { currentPassword: testPassword, newPassword })
      .expect(204);
  });

  it('answers 401 when nobody is signed in', async () => {
    const anonymous = await newClient(testApp().app);
    await anonymous
      .post('/api/me/password', { currentPassword: testPassword, newPassword })
      .expect(401);
  });
});
