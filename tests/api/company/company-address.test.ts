import { describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import type { Role } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { addMember, signUpCompany } from '../../fixtures/factories.js';

const address = '410 Quarry Road\nSuite 2\nLittleford, CO 80120';

describe('the company address', () => {
  it('starts empty, is saved by the owner, shown by GET and cleared by an empty value', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    expect((await owner.client.get('/api/company').expect(200)).body.data.address).toBeNull();

    const saved = await owner.client
      .patch('/api/company', { address: `  ${address}  ` })
      .expect(200);
    expect(saved.body.data.address).toBe(address);
    expect((await owner.client.get('/api/company').expect(200)).body.data.address).toBe(address);
    const [row] = await selectRows(sequelize, 'SELECT address FROM companies WHERE id = ?', [
      owner.me.company.id,
    ]);
    expect(row?.address).toBe(address);

    const cleared = await owner.client.patch('/api/company', { address: '' }).expect(200);
    expect(cleared.body.data.address).toBeNull();
  });

  it('changes only the address when only the address is sent', async () => {
    const owner = await signUpCompany(testApp().app);
    const before = (await owner.client.get('/api/company').expect(200)).body.data;
    const res = await owner.client.patch('/api/company', { address }).expect(200);
    expect(res.body.data).toEqual({ ...before, address });
  });

  it('refuses an address over 500 characters with 400 naming the field and saves nothing', async () => {
    const owner = await signUpCompany(testApp().app);
    const res = await owner.client
      .patch('/api/company', { address: 'x'.repeat(501), name: 'Renamed Turf' })
      .expect(400);
    expect(res.body.errors).toEqual([{ path: 'address', message: 'Keep it under 500 characters' }]);
    const after = (await owner.client.get('/api/company').expect(200)).body.data;
    expect(after.address).toBeNull();
    expect(after.name).toBe(owner.me.company.name);
  });

  it.each<Role>(['office', 'bookkeeper', 'crew_lead'])(
    'refuses the %s with 403 and leaves the address alone',
    async (role) => {
      const { app } = testApp();
      const owner = await signUpCompany(app);
      const member = await addMember(app, owner.client, role);
      const res = await member.client.patch('/api/company', { address }).expect(403);
      expect(res.body.code).toBe('FORBIDDEN');
      expect((await owner.client.get('/api/company').expect(200)).body.data.address).toBeNull();
    },
  );
});
