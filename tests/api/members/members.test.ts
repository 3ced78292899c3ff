import { describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { addMember, signUpCompany } from '../../fixtures/factories.js';

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
