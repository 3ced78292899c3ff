/* eslint-disable @typescript-eslint/no-unsafe-call, @typescript-eslint/no-unsafe-argument -- supertest response bodies are untyped JSON */
import { describe, expect, it } from 'vitest';
import { executeSql, selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { newClient } from '../../fixtures/client.js';
import { signUpCompany, testPassword, uniqueEmail } from '../../fixtures/factories.js';
import { tokenFromMail, waitForMail } from '../../fixtures/mail.js';

describe('invitations', () => {
  it('invites a new person by e-mail; they preview, accept, and land in the company with that role', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app, 'Fernhollow Lawns');
    const email = uniqueEmail('invitee');
    const created = await owner.client
      .post('/api/invitations', { email, role: 'office' })
      .expect(201);
    expect(created.body.data).toMatchObject({ email, role: 'office', acceptedAt: null });
    const days = (Date.parse(created.body.data.expiresAt) - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(6.9);
    expect(days).toBeLessThanOrEqual(7);

    const mail = await waitForMail(email);
    expect(mail.subject).toContain('Fernhollow Lawns');
    const token = tokenFromMail(mail, 'invitations');
    const [row] = await selectRows<{ token_hash: string }>(
      sequelize,
      'SELECT token_hash FROM invitations WHERE id = ?',
      [created.body.data.id],
    );
    expect(row?.token_hash).toMatch(/^[0-9a-f]{64}$/);

    const invitee = await newClient(app);
    const preview = await invitee.get(`/api/invitations/${token}`).expect(200);
    expect(preview.body.data).toEqual({
      companyName: 'Fernhollow Lawns',
      email,
      role: 'office',
      hasAccount: false,
    });

    const missingName = await invitee
      .post(`/api/invitations/${token}/accept`, { password: testPassword })
      .expect(400);
    expect(missingName.body.errors).toEqual([{ path: 'name', message: expect.any(String) }]);

    const accepted = await invitee
      .post(`/api/invitations/${token}/accept`, { name: 'Ivy Office', password: testPassword })
      .expect(200);
    expect(accepted.body.data).toMatchObject({
      role: 'office',
      company: { id: owner.me.company.id },
      user: { email },
    });
    await invitee.get('/api/customers').expect(200);

    const again = await invitee
      .post(`/api/invitations/${token}/accept`, { name: 'Ivy', password: testPassword })
      .expect(410);
    expect(again.body.code).toBe('TOKEN_INVALID');
    await invitee.get(`/api/invitations/${token}`).expect(410);

    const list = await owner.client.get('/api/invitations').expect(200);
    expect(
      list.body.data.find((i: { id: string }) => i.id === created.body.data.id).acceptedAt,
    ).not.toBeNull();
    const members = await owner.client.get('/api/members').expect(200);
    expect(members.body.data.map((m: { email: string }) => m.email)).toContain(email);
  });

  it('lets an existing user join a second company with their own password, then switch between companies', async () => {
    const { app } = testApp();
    const first = await signUpCompany(app, 'Alderbank Turf');
    const second = await signUpCompany(app, 'Brindle Yard Co');
    await second.client
      .post('/api/invitations', { email: first.email, role: 'bookkeeper' })
      .expect(201);
    const token = tokenFromMail(await waitForMail(first.email), 'invitations');

    const visitor = await newClient(app);
    expect((await visitor.get(`/api/invitations/${token}`).expect(200)).body.data.hasAccount).toBe(
      true,
    );
    const wrong = await visitor
      .post(`/api/invitations/${token}/accept`, { password: 'not-their-password' })
      .expect(401);
    expect(wrong.body.code).toBe('INVALID_CREDENTIALS');
    const accepted = await visitor
      .post(`/api/invitations/${token}/accept`, { password: testPassword })
      .expect(200);
    expect(accepted.body.data).toMatchObject({
      role: 'bookkeeper',
      company: { id: second.me.company.id },
    });
    expect(accepted.body.data.companies.map((c: { companyName: string }) => c.companyName)).toEqual(
      ['Alderbank Turf', 'Brindle Yard Co'],
    );

    const switched = await visitor
      .post('/api/me/company', { companyId: first.me.company.id })
      .expect(200);
    expect(switched.body.data).toMatchObject({
      role: 'owner',
      company: { id: first.me.company.id },
    });
    expect((await visitor.get('/api/me').expect(200)).body.data.company.id).toBe(
      first.me.company.id,
    );

    const outsider = await signUpCompany(app);
    const refused = await visitor
      .post('/api/me/company', { companyId: outsider.me.company.id })
      .expect(404);
    expect(refused.body.code).toBe('NOT_FOUND');
    await visitor.post('/api/me/company', { companyId: 'not-a-uuid' }).expect(400);
  });

  it('revokes a pending invitation so its link stops working', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    const email = uniqueEmail('revoked');
    const created = await owner.client
      .post('/api/invitations', { email, role: 'crew_lead' })
      .expect(201);
    const token = tokenFromMail(await waitForMail(email), 'invitations');
    await owner.client.del(`/api/invitations/${created.body.data.id}`).expect(204);
    await (await newClient(app)).get(`/api/invitations/${token}`).expect(410);
    expect(
      await selectRows(sequelize, 'SELECT id FROM invitations WHERE id = ?', [
        created.body.data.id,
      ]),
    ).toHaveLength(0);
    const audit = await owner.client.get('/api/audit-events').expect(200);
    expect(audit.body.data.map((e: { action: string }) => e.action)).toEqual(
      expect.arrayContaining(['invitation.created', 'invitation.revoked']),
    );
  });

  it('refuses an expired invitation with 410 and creates no user', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    const email = uniqueEmail('late');
    const created = await owner.client
      .post('/api/invitations', { email, role: 'office' })
      .expect(201);
    const token = tokenFromMail(await waitForMail(email), 'invitations');
    await executeSql(
      sequelize,
      'UPDATE invitations SET expires_at = NOW() - INTERVAL 1 SECOND WHERE id = ?',
      [created.body.data.id],
    );
    const res = await (
      await newClient(app)
    )
      .post(`/api/invitations/${token}/accept`, { name: 'Late', password: testPassword })
      .expect(410);
    expect(res.body.code).toBe('TOKEN_INVALID');
    expect(
      await selectRows(sequelize, 'SELECT id FROM users WHERE email = ?', [email]),
    ).toHaveLength(0);
  });

  it('refuses to invite someone who is already a member (409)', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const res = await owner.client
      .post('/api/invitations', { email: owner.email, role: 'office' })
      .expect(409);
    expect(res.body.code).toBe('CONFLICT');
  });
});
