// The list's total comes from `customer_counts` (migration 0006), kept in the same transaction
// as each change; it must always equal a count of the rows.
import { describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { createCustomer, signUpCompany } from '../../fixtures/factories.js';
import type { Client } from '../../fixtures/client.js';

async function totals(client: Client) {
  const total = async (status: string) =>
    Number((await client.get(`/api/customers?status=${status}`).expect(200)).body.meta.total);
  return {
    active: await total('active'),
    archived: await total('archived'),
    all: await total('all'),
  };
}

async function counted(companyId: string) {
  const [row] = await selectRows<{ active: number; archived: number }>(
    testApp().sequelize,
    `SELECT SUM(archived_at IS NULL) AS active, SUM(archived_at IS NOT NULL) AS archived
     FROM customers WHERE company_id = ?`,
    [companyId],
  );
  const active = Number(row?.active ?? 0);
  const archived = Number(row?.archived ?? 0);
  return { active, archived, all: active + archived };
}

describe('customer totals', () => {
  it('match a count of the rows through create, archive, restore and delete', async () => {
    const { client, me } = await signUpCompany(testApp().app);
    expect(await totals(client)).toEqual({ active: 0, archived: 0, all: 0 });
    const first = await createCustomer(client);
    const second = await createCustomer(client);
    await createCustomer(client);
    expect(await totals(client)).toEqual({ active: 3, archived: 0, all: 3 });

    await client.patch(`/api/customers/${first.id}`, { archived: true }).expect(200);
    // Archiving twice changes nothing.
    await client.patch(`/api/customers/${first.id}`, { archived: true }).expect(200);
    expect(await totals(client)).toEqual({ active: 2, archived: 1, all: 3 });
    await client.del(`/api/customers/${first.id}`).expect(204);
    await client.patch(`/api/customers/${second.id}`, { archived: true }).expect(200);
    await client.patch(`/api/customers/${second.id}`, { archived: false }).expect(200);
    await client.del(`/api/customers/${second.id}`).expect(204);
    expect(await totals(client)).toEqual({ active: 1, archived: 0, all: 1 });
    expect(await totals(client)).toEqual(await counted(me.company.id));
  });

  it('counts a search by its matches, and answers the total on a page past the end', async () => {
    const { client } = await signUpCompany(testApp().app);
    await createCustomer(client, { name: 'Quillon Sedgefield' });
    await createCustomer(client, { name: 'Marlow Thornbury' });
    const search = await client.get('/api/customers?q=sedge').expect(200);
    expect(search.body.meta.total).toBe(1);
    const past = await client.get('/api/customers?page=9&pageSize=1').expect(200);
    expect(past.body).toMatchObject({ data: [], meta: { page: 9, total: 2 } });
  });
});
