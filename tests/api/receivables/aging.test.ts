// GET /api/reports/aging: invoices built through the API with known due days, then aged on
// fixed `asOf` days around each bucket's edges. Buckets (current, 1–30, 31–60, 61–90, over 90
// days past due) as accountants read them (common practice, no published source).
import { addCalendarDays } from '@seamwright/domain';
import type { AgingReportView, InvoiceSummaryView } from '@seamwright/shared';
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

describe('GET /api/reports/aging', () => {
  let team: Team;
  let today: string;
  let ash: string;
  let bram: string;
  let dueToday: InvoiceSummaryView;

  const aging = async (asOf: string): Promise<AgingReportView> =>
    (await team.bookkeeper.client.get(`/api/reports/aging?asOf=${asOf}`).expect(200)).body
      .data as AgingReportView;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    const owner = team.owner.client;
    const companyId = team.owner.me.company.id;
    const a = await customerWithJob(owner, 'Ashgrove Lawns');
    const b = await customerWithJob(owner, 'Bramfield Yard');
    ash = a.customerId;
    bram = b.customerId;
    // Ashgrove: 100.00 due today; 250.00 due in 14 days with 50.00 paid (owes 200.00).
    dueToday = await sentInvoice(owner, companyId, a.jobId, 10_000, 0);
    today = dueToday.issuedOn;
    const later = await sentInvoice(owner, companyId, a.jobId, 25_000, 14);
    await pay(owner, later.id, 5_000, today);
    // Bramfield: 75.00 due today less a 25.00 credit (owes 50.00); one paid in full, one void
    // and one draft, none of which is owed.
    const credited = await sentInvoice(owner, companyId, b.jobId, 7_500, 0);
    await credit(owner, credited.id, 2_500);
    const paid = await sentInvoice(owner, companyId, b.jobId, 3_000, 0);
    await pay(owner, paid.id, 3_000, today);
    const voided = await sentInvoice(owner, companyId, b.jobId, 9_900, 0);
    await owner.post(`/api/invoices/${voided.id}/void`, { reason: 'Billed twice' }).expect(200);
    await owner
      .post('/api/invoices', {
        jobId: b.jobId,
        kind: 'progress',
        lines: [
          { label: 'Draft', quantity: 1, unit: 'each', unitPriceCents: 1_234, taxable: false },
        ],
      })
      .expect(201);
  });

  it('on the due day everything owed is current, and the total is the sum of the balances', async () => {
    const report = await aging(today);
    expect(report.asOf).toBe(today);
    expect(report.buckets).toEqual({
      current: 35_000,
      days1to30: 0,
      days31to60: 0,
      days61to90: 0,
      over90: 0,
    });
    expect(report.totalCents).toBe(35_000);
    // The API's own invoice balances (sent or partly paid) add up to the same total.
    const owed = (await listAllInvoices(team.owner.client))
      .filter((i) => i.status === 'sent' || i.status === 'partly_paid')
      .reduce((sum, i) => sum + i.balanceCents, 0);
    expect(owed).toBe(report.totalCents);
    expect(report.customers).toEqual([
      {
        customerId: ash,
        name: 'Ashgrove Lawns',
        buckets: { current: 30_000, days1to30: 0, days31to60: 0, days61to90: 0, over90: 0 },
        totalCents: 30_000,
      },
      {
        customerId: bram,
        name: 'Bramfield Yard',
        buckets: { current: 5_000, days1to30: 0, days31to60: 0, days61to90: 0, over90: 0 },
        totalCents: 5_000,
      },
    ]);
  });

  it.each([
    // [days after today, bucket of the invoices due today, bucket of the one due in 14 days]
    [1, 'days1to30', 'current'],
    [14, 'days1to30', 'current'],
    [15, 'days1to30', 'days1to30'],
    [30, 'days1to30', 'days1to30'],
    [31, 'days31to60', 'days1to30'],
    [60, 'days31to60', 'days31to60'],
    [61, 'days61to90', 'days31to60'],
    [90, 'days61to90', 'days61to90'],
    [91, 'over90', 'days61to90'],
    [105, 'over90', 'over90'],
  ] as const)('%i days on: due today → %s, due in 14 days → %s', async (days, first, second) => {
    const report = await aging(addCalendarDays(today, days));
    const expected = { current: 0, days1to30: 0, days31to60: 0, days61to90: 0, over90: 0 };
    expected[first] += 10_000 + 5_000;
    expected[second] += 20_000;
    expect(report.buckets).toEqual(expected);
    expect(report.totalCents).toBe(35_000);
  });

  it('leaves out invoices issued after asOf', async () => {
    const report = await aging(addCalendarDays(today, -1));
    expect(report.totalCents).toBe(0);
    expect(report.customers).toEqual([]);
  });

  it('defaults asOf to today in the company’s time zone', async () => {
    const res = await team.owner.client.get('/api/reports/aging').expect(200);
    expect(res.body.data.asOf).toBe(today);
    expect(dueToday.dueDate).toBe(today);
  });

  it('refuses a bad date with a 400 naming asOf', async () => {
    for (const bad of ['2026-02-30', 'yesterday', '2026-1-5']) {
      const res = await team.owner.client.get(`/api/reports/aging?asOf=${bad}`).expect(400);
      expect(res.headers['content-type']).toMatch(/problem\+json/);
      expect(errorPaths(res.body)).toEqual(['asOf']);
    }
  });

  it('is for the bookkeeper and the owner: office and crew lead get 403', async () => {
    for (const client of [team.office.client, team.crew.client]) {
      const res = await client.get('/api/reports/aging');
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('FORBIDDEN');
    }
  });
});
