import { describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import {
  addMember,
  createCustomer,
  signUpCompany,
  testPassword,
} from '../../fixtures/factories.js';
import { tokenFromMail, waitForMail } from '../../fixtures/mail.js';

interface Member {
  id: string;
  userId: string;
  role: string;
}

describe('members', () => {
  it('never demotes or removes the last owner (409), and allows it once there is a second owner', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    const list = await owner.client.get('/api/members').expect(200);
    const self = (list.body.data as Member[])[0]!;
    expect(self.role).toBe('owner');

    const demote = await owner.client
      .patch(`/api/members/${self.id}`, { role: 'office' })
      .expect(409);
    expect(demote.body.code).toBe('CONFLICT');
    await owner.client.del(`/api/members/${self.id}`).expect(409);
    const [row] = await selectRows(sequelize, 'SELECT role FROM memberships WHERE id = ?', [
      self.id,
    ]);
    expect(row?.role).toBe('owner');

    const office = await addMember(app, owner.client, 'office');
    const officeRow = (
      (await owner.client.get('/api/members').expect(200)).body.data as Member[]
    ).find((m) => m.userId === office.me.user.id)!;
    const promoted = await owner.client
      .patch(`/api/members/${officeRow.id}`, { role: 'owner' })
      .expect(200);
    expect(promoted.body.data.role).toBe('owner');
    await owner.client.patch(`/api/members/${self.id}`, { role: 'office' }).expect(200);
  });

  it('takes away access at once when a member is removed', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const office = await addMember(app, owner.client, 'office');
    await office.client.get('/api/customers').expect(200);
    const member = (
      (await owner.client.get('/api/members').expect(200)).body.data as Member[]
    ).find((m) => m.userId === office.me.user.id)!;
    await owner.client.del(`/api/members/${member.id}`).expect(204);
    await office.client.get('/api/customers').expect(401);
    const audit = await owner.client.get('/api/audit-events').expect(200);
    expect(audit.body.data[0]).toMatchObject({
      action: 'member.removed',
      entityId: member.id,
      userName: 'Olive Owner',
    });
  });

  it('asks a removed member who still has another company to choose one, and never serves that company on its own', async () => {
    const { app } = testApp();
    const person = await signUpCompany(app, 'Home Turf Co');
    const homeCustomer = await createCustomer(person.client, { name: 'Home-only customer' });
    const other = await signUpCompany(app, 'Visited Yard Co');
    await other.client
      .post('/api/invitations', { email: person.email, role: 'office' })
      .expect(201);
    const token = tokenFromMail(await waitForMail(person.email), 'invitations');
    const joined = await person.client
      .post(`/api/invitations/${token}/accept`, { password: testPassword })
      .expect(200);
    expect(joined.body.data.company.id).toBe(other.me.company.id);

    const member = (
      (await other.client.get('/api/members').expect(200)).body.data as Member[]
    ).find((m) => m.userId === person.me.user.id)!;
    await other.client.del(`/api/members/${member.id}`).expect(204);

    // Not 200 with the home company's customers: the screen was opened for the other company.
    const ended = await person.client.get('/api/customers').expect(403);
    expect(ended.body.code).toBe('COMPANY_ACCESS_ENDED');
    expect(ended.headers['content-type']).toMatch(/problem\+json/);
    expect(JSON.stringify(ended.body)).not.toContain(homeCustomer.id);
    // Still signed in, but without an active company until they choose one.
    expect((await person.client.get('/api/me').expect(403)).body.code).toBe('COMPANY_ACCESS_ENDED');
    await person.client.post('/api/customers', { name: 'Nowhere' }).expect(403);
    const companies = await person.client.get('/api/me/companies').expect(200);
    expect(companies.body.data).toEqual([
      { companyId: person.me.company.id, companyName: 'Home Turf Co', role: 'owner' },
    ]);

    await person.client.post('/api/me/company', { companyId: other.me.company.id }).expect(404);
    const chosen = await person.client
      .post('/api/me/company', { companyId: person.me.company.id })
      .expect(200);
    expect(chosen.body.data).toMatchObject({ role: 'owner', company: { name: 'Home Turf Co' } });
    const list = await person.client.get('/api/customers').expect(200);
    expect(JSON.stringify(list.body)).toContain(homeCustomer.id);
  });

  it('ends the session of a removed member who has no company left', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const office = await addMember(app, owner.client, 'office');
    const member = (
      (await owner.client.get('/api/members').expect(200)).body.data as Member[]
    ).find((m) => m.userId === office.me.user.id)!;
    await owner.client.del(`/api/members/${member.id}`).expect(204);
    expect((await office.client.get('/api/me').expect(401)).body.code).toBe('UNAUTHENTICATED');
    // The session is gone, not merely without a company.
    await office.client.get('/api/me/companies').expect(401);
    await office.client.post('/api/me/company', { companyId: owner.me.company.id }).expect(401);
  });

  it("applies a role change on the member's next request", async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const office = await addMember(app, owner.client, 'office');
    await office.client.post('/api/customers', { name: 'Before demotion' }).expect(201);
    const member = (
      (await owner.client.get('/api/members').expect(200)).body.data as Member[]
    ).find((m) => m.userId === office.me.user.id)!;
    await owner.client.patch(`/api/members/${member.id}`, { role: 'bookkeeper' }).expect(200);
    await office.client.post('/api/customers', { name: 'After demotion' }).expect(403);
    const bad = await owner.client
      .patch(`/api/members/${member.id}`, { role: 'admiral' })
      .expect(400);
    expect(bad.body.errors[0].path).toBe('role');
  });
});
