// GET /api/exports/invoices.csv and payments.csv: parsed back with papaparse and summed against
// the API's own figures; amounts are decimal strings with exactly 2 places.
import Papa from 'papaparse';
import { addCalendarDays } from '@seamwright/domain';
import type { InvoiceSummaryView } from '@seamwright/shared';
import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../fixtures/app.js';
import { errorPaths } from '../../fixtures/estimates.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import {
  credit,
  customerWithJob,
  listAllInvoices,
  pay,
  sentInvoice,
} from './receivables-fixtures.js';

const centsOf = (decimal: string | undefined) => {
  expect(decimal).toMatch(/^-?\d+\.\d{2}$/);
  return Math.round(Number(decimal) * 100);
};
const parse = (text: string) =>
  Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });

describe('CSV exports', () => {
  let team: Team;
  let today: string;
  let invoices: InvoiceSummaryView[];

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    const owner = team.owner.client;
    const companyId = team.owner.me.company.id;
    const job = await customerWithJob(owner, '=Formula Meadows');
    const first = await sentInvoice(owner, companyId, job.jobId, 12_345, 14);
    today = first.issuedOn;
    const second = await sentInvoice(owner, companyId, job.jobId, 50_001, 0);
    await pay(owner, first.id, 2_345, today);
    await pay(owner, second.id, 1, addCalendarDays(today, -3));
    await credit(owner, second.id, 1_000);
    invoices = await listAllInvoices(owner);
  });

  it('invoices.csv: an attachment whose rows and sums are the API’s', async () => {
    const res = await team.bookkeeper.client.get('/api/exports/invoices.csv').expect(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe('attachment; filename=invoices.csv');
    const { data, errors, meta } = parse(res.text);
    expect(errors).toEqual([]);
    expect(meta.fields).toEqual([
      'invoice',
      'kind',
      'status',
      'issuedOn',
      'dueDate',
      'customer',
      'currency',
      'subtotal',
      'tax',
      'total',
      'paid',
      'refunded',
      'credited',
      'balance',
    ]);
    expect(data).toHaveLength(invoices.length);
    const sum = (column: string) => data.reduce((s, row) => s + centsOf(row[column]), 0);
    expect(sum('total')).toBe(invoices.reduce((s, i) => s + i.totalCents, 0));
    expect(sum('paid')).toBe(invoices.reduce((s, i) => s + i.paidCents, 0));
    expect(sum('credited')).toBe(invoices.reduce((s, i) => s + i.creditedCents, 0));
    expect(sum('balance')).toBe(invoices.reduce((s, i) => s + i.balanceCents, 0));
    const byRef = new Map(invoices.map((i) => [i.reference, i]));
    for (const row of data) expect(row.status).toBe(byRef.get(row.invoice ?? '')?.status);
    expect(data.map((r) => r.total)).toContain('123.45');
    // A name that looks like a formula is escaped so a spreadsheet shows it as text.
    expect(data[0]?.customer).toBe("'=Formula Meadows");
  });

  it('payments.csv: each payment once, net of refunds, within the date range', async () => {
    const res = await team.owner.client.get('/api/exports/payments.csv').expect(200);
    expect(res.headers['content-disposition']).toBe('attachment; filename=payments.csv');
    const { data } = parse(res.text);
    expect(data.map((r) => [r.receivedOn, r.amount, r.net])).toEqual([
      [addCalendarDays(today, -3), '0.01', '0.01'],
      [today, '23.45', '23.45'],
    ]);
    const paid = invoices.reduce((s, i) => s + i.paidCents - i.refundedCents, 0);
    expect(data.reduce((s, r) => s + centsOf(r.net), 0)).toBe(paid);
    const ranged = await team.owner.client
      .get(`/api/exports/payments.csv?from=${today}&to=${today}`)
      .expect(200);
    expect(parse(ranged.text).data.map((r) => r.amount)).toEqual(['23.45']);
    const none = await team.owner.client
      .get(`/api/exports/invoices.csv?to=${addCalendarDays(today, -1)}`)
      .expect(200);
    expect(parse(none.text).data).toEqual([]);
  });

  it('refuses a bad range with a 400 naming the field', async () => {
    const bad = await team.owner.client
      .get('/api/exports/invoices.csv?from=2026-13-01')
      .expect(400);
    expect(errorPaths(bad.body)).toEqual(['from']);
    const backwards = await team.owner.client
      .get('/api/exports/payments.csv?from=2026-05-02&to=2026-05-01')
      .expect(400);
    expect(errorPaths(backwards.body)).toEqual(['to']);
  });

  it('is for the bookkeeper and the owner: office and crew lead get 403', async () => {
    for (const client of [team.office.client, team.crew.client])
      for (const path of ['/api/exports/invoices.csv', '/api/exports/payments.csv'])
        expect((await client.get(path)).status).toBe(403);
  });
});
