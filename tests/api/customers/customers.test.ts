/* eslint-disable @typescript-eslint/no-unsafe-call -- supertest response bodies are untyped JSON */
import { describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import type { CustomerView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { createCustomer, createSite, signUpCompany } from '../../fixtures/factories.js';

describe('customers', () => {
  it('creates with only a name, reads, updates, archives, restores and deletes (with its sites)', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    const created = await owner.client
      .post('/api/customers', { name: '  Wren Halloway  ' })
      .expect(201);
    const customer = created.body.data as CustomerView;
    expect(customer).toMatchObject({
      name: 'Wren Halloway',
      email: null,
      phone: null,
      siteCount: 0,
      archivedAt: null,
    });
    expect(customer.id).toMatch(/^[0-9a-f-]{36}$/);

    const updated = await owner.client
      .patch(`/api/customers/${customer.id}`, {
        email: 'WREN@example.test',
        phone: '555 014 0000',
        notes: 'Gate on the left',
      })
      .expect(200);
    expect(updated.body.data).toMatchObject({
      email: 'wren@example.test',
      phone: '555 014 0000',
      notes: 'Gate on the left',
    });

    const archived = await owner.client
      .patch(`/api/customers/${customer.id}`, { archived: true })
      .expect(200);
    expect(archived.body.data.archivedAt).not.toBeNull();
    const restored = await owner.client
      .patch(`/api/customers/${customer.id}`, { archived: false })
      .expect(200);
    expect(restored.body.data.archivedAt).toBeNull();

    await createSite(owner.client, customer.id);
    expect(
      (await owner.client.get(`/api/customers/${customer.id}`).expect(200)).body.data.siteCount,
    ).toBe(1);
    await owner.client.del(`/api/customers/${customer.id}`).expect(204);
    await owner.client.get(`/api/customers/${customer.id}`).expect(404);
    expect(
      await selectRows(sequelize, 'SELECT id FROM sites WHERE customer_id = ?', [customer.id]),
    ).toHaveLength(0);

    const audit = await owner.client.get('/api/audit-events?pageSize=10').expect(200);
    expect(audit.body.data.map((e: { action: string }) => e.action)).toEqual(
      expect.arrayContaining([
        'customer.created',
        'customer.updated',
        'customer.archived',
        'customer.restored',
        'customer.deleted',
        'site.created',
      ]),
    );
  });

  it('answers 400 with field paths and saves nothing for bad input', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    const res = await owner.client
      .post('/api/customers', { name: '', email: 'not-an-email', phone: 'call me' })
      .expect(400);
    expect(res.body.code).toBe('VALIDATION_FAILED');
    expect((res.body.errors as { path: string }[]).map((e) => e.path).sort()).toEqual([
      'email',
      'name',
      'phone',
    ]);
    // The one-line detail names every field at fault, for clients that show only the detail.
    expect(res.body.detail).toMatch(/name: Name is required/);
    expect(res.body.detail).toMatch(/email: /);
    expect(
      await selectRows(sequelize, 'SELECT id FROM customers WHERE company_id = ?', [
        owner.me.company.id,
      ]),
    ).toHaveLength(0);

    const customer = await createCustomer(owner.client, { name: 'Stays the same' });
    await owner.client
      .patch(`/api/customers/${customer.id}`, { name: 'New name', email: 'bad' })
      .expect(400);
    await owner.client.patch(`/api/customers/${customer.id}`, {}).expect(400);
    const [row] = await selectRows(sequelize, 'SELECT name FROM customers WHERE id = ?', [
      customer.id,
    ]);
    expect(row?.name).toBe('Stays the same');
  });

  it('answers 404 for a malformed or unknown id', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    await owner.client.get('/api/customers/12345').expect(404);
    await owner.client.patch('/api/customers/zzz', { name: 'x' }).expect(404);
    await owner.client.del('/api/customers/00000000-0000-4000-8000-000000000000').expect(404);
  });

  it('lists with paging, search on name/e-mail/phone, sort and status', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const names = [
      'Aster Quill',
      'Birch Mallory',
      'Cedar Ostrander',
      'Dahlia Pruitt',
      'Elm Rasmussen',
    ];
    for (const name of names)
      await createCustomer(owner.client, {
        name,
        email: `${name.split(' ')[0]!.toLowerCase()}@example.test`,
      });
    await createCustomer(owner.client, { name: 'Fern Sallow', phone: '555-014-7777' });
    const archived = await createCustomer(owner.client, { name: 'Gorse 100% Tidy_Co' });
    await owner.client.patch(`/api/customers/${archived.id}`, { archived: true }).expect(200);

    const page1 = await owner.client.get('/api/customers?page=1&pageSize=2').expect(200);
    expect(page1.body.meta).toEqual({ page: 1, pageSize: 2, total: 6 });
    expect(page1.body.data.map((c: CustomerView) => c.name)).toEqual([
      'Aster Quill',
      'Birch Mallory',
    ]);
    const page3 = await owner.client.get('/api/customers?page=3&pageSize=2').expect(200);
    expect(page3.body.data.map((c: CustomerView) => c.name)).toEqual([
      'Elm Rasmussen',
      'Fern Sallow',
    ]);

    const desc = await owner.client.get('/api/customers?sort=-name&pageSize=1').expect(200);
    expect(desc.body.data[0].name).toBe('Fern Sallow');
    const newest = await owner.client
      .get('/api/customers?sort=-createdAt&status=all&pageSize=100')
      .expect(200);
    expect(newest.body.meta.total).toBe(7);

    expect(
      (await owner.client.get('/api/customers?q=cedar').expect(200)).body.data.map(
        (c: CustomerView) => c.name,
      ),
    ).toEqual(['Cedar Ostrander']);
    expect((await owner.client.get('/api/customers?q=dahlia@').expect(200)).body.meta.total).toBe(
      1,
    );
    expect(
      (await owner.client.get('/api/customers?q=014-7777').expect(200)).body.data[0].name,
    ).toBe('Fern Sallow');
    // % and _ are literal characters in a search, not wildcards: a search matches the
    // beginnings of words (DEVELOPERS.md, "Customer search"), so a lone % finds no one.
    expect(
      (await owner.client.get('/api/customers?q=100%25&status=all').expect(200)).body.data.map(
        (c: CustomerView) => c.name,
      ),
    ).toEqual(['Gorse 100% Tidy_Co']);
    expect(
      (await owner.client.get('/api/customers?q=tidy_&status=all').expect(200)).body.data.map(
        (c: CustomerView) => c.name,
      ),
    ).toEqual(['Gorse 100% Tidy_Co']);
    expect(
      (await owner.client.get('/api/customers?q=%25&status=all').expect(200)).body.meta.total,
    ).toBe(0);

    const onlyArchived = await owner.client.get('/api/customers?status=archived').expect(200);
    expect(onlyArchived.body.data.map((c: CustomerView) => c.name)).toEqual(['Gorse 100% Tidy_Co']);
    const bad = await owner.client.get('/api/customers?sort=email&pageSize=500').expect(400);
    expect((bad.body.errors as { path: string }[]).map((e) => e.path).sort()).toEqual([
      'pageSize',
      'sort',
    ]);
  });
});
