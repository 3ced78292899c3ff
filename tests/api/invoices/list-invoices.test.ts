// GET /api/invoices: paged like the other lists, filtered by status (overdue derived from the
// due day in the company's zone) and customer, each filter served by an index (EXPLAIN).
import { beforeAll, describe, expect, it } from 'vitest';
import { executeSql, selectRows } from '@seamwright/api';
import type { InvoiceSummaryView, ListResponse } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { errorPaths } from '../../fixtures/estimates.js';
import { createCustomer, createJob, createSite, signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { createInvoice, progressLine } from './invoice-fixtures.js';

describe('GET /api/invoices', () => {
  let team: Team;
  const ids: Record<string, string> = {};
  let customerA = '';

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    const client = team.owner.client;
    const a = await createCustomer(client, { name: 'Ada Quarrier', email: 'ada@example.test' });
    const b = await createCustomer(client, { name: 'Bo Tillman', email: 'bo@example.test' });
    customerA = a.id;
    const jobA = await createJob(client, a.id, (await createSite(client, a.id)).id);
    const jobB = await createJob(client, b.id, (await createSite(client, b.id)).id);
    const make = (jobId: string) =>
      createInvoice(client, { jobId, kind: 'progress', lines: [progressLine] });
    ids.draft = (await make(jobA.id)).id;
    ids.sent = (await make(jobA.id)).id;
    ids.overdue = (await make(jobB.id)).id;
    for (const id of [ids.sent, ids.overdue])
      await client.post(`/api/invoices/${id}/send`, {}).expect(200);
    // Due ten days ago: overdue as of today, whatever the zone.
    await executeSql(
      testApp().sequelize,
      'UPDATE invoices SET due_date = DATE_SUB(CURRENT_DATE, INTERVAL 10 DAY) WHERE id = ?',
      [ids.overdue],
    );
  });

  const list = async (query = '') => {
    const res = await team.office.client.get(`/api/invoices${query}`).expect(200);
    return res.body as ListResponse<InvoiceSummaryView>;
  };

  it('pages newest number first with a total', async () => {
    const page = await list('?pageSize=2');
    expect(page.meta).toEqual({ page: 1, pageSize: 2, total: 3 });
    expect(page.data.map((i) => i.id)).toEqual([ids.overdue, ids.sent]);
    expect(page.data[0]).toMatchObject({ customerName: 'Bo Tillman', status: 'overdue' });
    const past = await list('?page=9');
    expect(past).toEqual({ data: [], meta: { page: 9, pageSize: 25, total: 3 } });
  });

  it('filters by status (overdue apart from sent) and by customer', async () => {
    expect((await list('?status=overdue')).data.map((i) => i.id)).toEqual([ids.overdue]);
    expect((await list('?status=sent')).data.map((i) => i.id)).toEqual([ids.sent]);
    expect((await list('?status=draft,sent')).data.map((i) => i.id)).toEqual([ids.sent, ids.draft]);
    expect((await list(`?customerId=${customerA}`)).data.map((i) => i.id)).toEqual([
      ids.sent,
      ids.draft,
    ]);
    const bad = await team.office.client.get('/api/invoices?status=late').expect(400);
    expect(errorPaths(bad.body)).toEqual(['status.0']);
  });

  it('each filter is served by an index', async () => {
    const { sequelize } = testApp();
    const company = team.owner.me.company.id;
    const explain = async (where: string, values: unknown[]) =>
      (
        await selectRows<{ key: string | null; table: string }>(
          sequelize,
          `EXPLAIN SELECT id FROM invoices WHERE company_id = ? AND ${where} ORDER BY number DESC LIMIT 25`,
          [company, ...values],
        )
      ).find((row) => row.table === 'invoices')?.key;
    expect(await explain("status = 'draft'", [])).toBe('invoices_company_status_due');
    expect(await explain('customer_id = ?', [customerA])).toBe('invoices_company_customer');
  });
});
