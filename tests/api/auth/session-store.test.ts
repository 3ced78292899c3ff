// The session store's guarantees after the request-path work (docs/PERFORMANCE.md): sessions
// live only in MariaDB, so a second API process sees sign-in, sign-out and a removed member at
// once; a plain read rewrites nothing; the expiry still slides, once per refresh interval.
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import {
  createApp,
  createSequelize,
  createSessionStore,
  executeSql,
  loadEnv,
  PlannerPool,
  selectRows,
} from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { newClient } from '../../fixtures/client.js';
import { testPassword, uniqueEmail } from '../../fixtures/factories.js';

const otherEnv = loadEnv();
const otherSequelize = createSequelize(otherEnv.db);
const otherPlannerPool = new PlannerPool(otherEnv.planner);
const otherProcess = createApp({
  env: otherEnv,
  sequelize: otherSequelize,
  plannerPool: otherPlannerPool,
});

afterAll(async () => {
  await otherPlannerPool.close();
  await otherSequelize.close();
});

/** Signs up through the test app; returns the client, the session cookie and the user id. */
async function signUp() {
  const client = await newClient(testApp().app);
  const res = await client
    .post('/api/auth/signup', {
      companyName: 'Session Turf',
      name: 'Sid Owner',
      email: uniqueEmail('session'),
      password: testPassword,
    })
    .expect(201);
  const setCookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  const cookie = setCookie.map((c) => c.split(';')[0]).join('; ');
  return {
    client,
    cookie,
    userId: String(res.body.data.user.id),
    companyId: String(res.body.data.company.id),
  };
}

async function sessionRow(userId: string) {
  const [row] = await selectRows<{ sid: string; expires: Date; updated_at: Date }>(
    testApp().sequelize,
    'SELECT sid, expires, updated_at FROM sessions WHERE user_id = ?',
    [userId],
  );
  if (!row) throw new Error('no session row');
  return row;
}

describe('session store', () => {
  it('serves a session signed in on one process from another, and ends it there at sign-out', async () => {
    const { client, cookie } = await signUp();
    await request(otherProcess).get('/api/me').set('Cookie', cookie).expect(200);
    await client.post('/api/auth/logout').expect(204);
    await request(otherProcess).get('/api/me').set('Cookie', cookie).expect(401);
  });

  it('takes access away on every process on the next request after the membership goes', async () => {
    const { cookie, userId } = await signUp();
    await request(otherProcess).get('/api/customers').set('Cookie', cookie).expect(200);
    await executeSql(testApp().sequelize, 'DELETE FROM memberships WHERE user_id = ?', [userId]);
    // No company left: the session ends.
    await request(otherProcess).get('/api/customers').set('Cookie', cookie).expect(401);
  });

  it('answers COMPANY_ACCESS_ENDED on another process when a member with another company is removed', async () => {
    const { cookie, userId, companyId } = await signUp();
    const other = await signUp();
    await executeSql(
      testApp().sequelize,
      `INSERT INTO memberships (id, company_id, user_id, role, created_at, updated_at)
       VALUES (UUID(), ?, ?, 'office', NOW(3), NOW(3))`,
      [other.companyId, userId],
    );
    await request(otherProcess).get('/api/customers').set('Cookie', cookie).expect(200);
    await executeSql(
      testApp().sequelize,
      'DELETE FROM memberships WHERE user_id = ? AND company_id = ?',
      [userId, companyId],
    );
    const res = await request(otherProcess).get('/api/customers').set('Cookie', cookie);
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('COMPANY_ACCESS_ENDED');
  });

  it('rewrites nothing on a plain read, and slides the expiry once the refresh interval has passed', async () => {
    const { client, userId } = await signUp();
    const before = await sessionRow(userId);
    const plain = await client.get('/api/me').expect(200);
    expect(plain.headers['set-cookie']).toBeUndefined();
    const after = await sessionRow(userId);
    expect(after.updated_at).toEqual(before.updated_at);
    expect(after.expires).toEqual(before.expires);

    // As if the last refresh were long ago and the expiry a day nearer.
    await executeSql(
      testApp().sequelize,
      `UPDATE sessions SET data = JSON_SET(data, '$.refreshedAt', 0),
         expires = expires - INTERVAL 1 DAY WHERE sid = ?`,
      [before.sid],
    );
    const refreshed = await client.get('/api/me').expect(200);
    expect(String(refreshed.headers['set-cookie'])).toMatch(/sw\.sid=.*Expires=/);
    expect((await sessionRow(userId)).expires.getTime()).toBeGreaterThanOrEqual(
      before.expires.getTime() - 1000,
    );
  });

  it('refuses a session whose row has expired, even before the sweep deletes it', async () => {
    const { client, userId } = await signUp();
    await executeSql(testApp().sequelize, 'UPDATE sessions SET expires = ? WHERE user_id = ?', [
      new Date(Date.now() - 60_000),
      userId,
    ]);
    await client.get('/api/me').expect(401);
  });

  it('does not bring back a session deleted while a request held it', async () => {
    const { userId } = await signUp();
    const { sid } = await sessionRow(userId);
    const store = createSessionStore(testApp().sequelize, 0);
    const loaded = await new Promise<Parameters<typeof store.set>[1]>((resolve, reject) =>
      store.load(sid, (err, session) =>
        err || !session ? reject(new Error('session not loaded')) : resolve(session),
      ),
    );
    // A password reset or a sign-out elsewhere ends the session; then this request saves it.
    await executeSql(testApp().sequelize, 'DELETE FROM sessions WHERE sid = ?', [sid]);
    await new Promise<void>((resolve, reject) =>
      store.set(sid, loaded, (err) => (err ? reject(new Error('save failed')) : resolve())),
    );
    expect(
      await selectRows(testApp().sequelize, 'SELECT sid FROM sessions WHERE sid = ?', [sid]),
    ).toHaveLength(0);
  });
});
