import { describe, expect, it } from 'vitest';
import type { ListResponse, MemberView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { bulkInsertMembers, signUpCompany } from '../../fixtures/factories.js';

describe('paging the members list', () => {
  it('pages past 100 members with the total in meta', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    await bulkInsertMembers(sequelize, owner.me.company.id, 120);

    const first = await owner.client.get('/api/members?page=1&pageSize=100').expect(200);
    const firstBody = first.body as ListResponse<MemberView>;
    expect(firstBody.meta).toEqual({ page: 1, pageSize: 100, total: 121 });
    expect(firstBody.data).toHaveLength(100);
    expect(firstBody.data[0]).toMatchObject({ role: 'owner', name: 'Olive Owner' });

    const second = await owner.client.get('/api/members?page=2&pageSize=100').expect(200);
    const secondBody = second.body as ListResponse<MemberView>;
    expect(secondBody.meta).toEqual({ page: 2, pageSize: 100, total: 121 });
    expect(secondBody.data).toHaveLength(21);
    expect(secondBody.data.at(-1)).toMatchObject({ name: 'Bulk Person 120', role: 'crew_lead' });
    const ids = new Set([...firstBody.data, ...secondBody.data].map((m) => m.id));
    expect(ids.size).toBe(121);
  });

  it('defaults to the first 25 and refuses a bad page with the field named', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    await bulkInsertMembers(sequelize, owner.me.company.id, 30, 'office');
    const res = await owner.client.get('/api/members').expect(200);
    expect((res.body as ListResponse<MemberView>).meta).toEqual({
      page: 1,
      pageSize: 25,
      total: 31,
    });
    const bad = await owner.client.get('/api/members?page=0').expect(400);
    expect((bad.body.errors as { path: string }[]).map((e) => e.path)).toEqual(['page']);
  });

  it('answers a role change with the changed member even when they are past the first page', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    await bulkInsertMembers(sequelize, owner.me.company.id, 105);
    const page = await owner.client.get('/api/members?page=2&pageSize=100').expect(200);
    const last = (page.body as ListResponse<MemberView>).data.at(-1)!;
    const res = await owner.client.patch(`/api/members/${last.id}`, { role: 'office' }).expect(200);
    expect(res.body.data).toMatchObject({ id: last.id, role: 'office', name: last.name });
  });
});
