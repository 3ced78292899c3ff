// POST /api/invoices: the three kinds, the deposit from the accepted estimate, the final from
// the accepted total less earlier invoices, gapless numbers under concurrency, refusals.
import { beforeAll, describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import type { InvoiceSummaryView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { errorPaths } from '../../fixtures/estimates.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { pricedJob } from '../estimate-sending/sending-fixtures.js';
import { acceptedJob, createInvoice, getInvoice, progressLine } from './invoice-fixtures.js';

describe('POST /api/invoices', () => {
  let team: Team;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    // 8.25 % tax so the progress and change lines are taxed (half-up once, as estimates).
    await team.owner.client
      .patch('/api/estimating-settings', { taxRateBasisPoints: 825 })
      .expect(200);
  });

  it('a deposit invoice bills the accepted estimate’s depositCents, due after the terms', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    expect(job.depositCents).toBeGreaterThan(0);
    const res = await team.bookkeeper.client
      .post('/api/invoices', { jobId: job.jobId, kind: 'deposit' })
      .expect(201);
    const data = res.body.data as InvoiceSummaryView;
    expect(data).toMatchObject({
      status: 'draft',
      kind: 'deposit',
      totalCents: job.depositCents,
      balanceCents: job.depositCents,
      taxCents: 0,
    });
    expect(typeof data.id).toBe('string');
    expect(Number.isInteger(data.number)).toBe(true);
    // Default terms: 14 days (common practice, no published source).
    const days = (Date.parse(data.dueDate) - Date.parse(data.issuedOn)) / 86_400_000;
    expect(days).toBe(14);
  });

  it('deposit and final need an accepted estimate (409 naming jobId)', async () => {
    const job = await pricedJob(team.owner.client);
    for (const kind of ['deposit', 'final']) {
      const res = await team.owner.client
        .post('/api/invoices', { jobId: job.jobId, kind })
        .expect(409);
      expect(res.headers['content-type']).toMatch(/problem\+json/);
      expect(errorPaths(res.body)).toEqual(['jobId']);
    }
    const [row] = await selectRows<{ n: number }>(
      testApp().sequelize,
      'SELECT COUNT(*) AS n FROM invoices WHERE job_id = ?',
      [job.jobId],
    );
    expect(Number(row?.n)).toBe(0);
  });

  it('a progress invoice needs lines (400 naming lines) and taxes them', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const bad = await team.owner.client
      .post('/api/invoices', { jobId: job.jobId, kind: 'progress' })
      .expect(400);
    expect(errorPaths(bad.body)).toEqual(['lines']);
    // $500.00 taxable at 8.25 % = $41.25 → $541.25 (worked by hand).
    const invoice = await createInvoice(team.owner.client, {
      jobId: job.jobId,
      kind: 'progress',
      lines: [progressLine],
    });
    expect(invoice).toMatchObject({ subtotalCents: 50_000, taxCents: 4125, totalCents: 54_125 });
  });

  it('the final invoice is the accepted total + changes − earlier invoices (void ones left out)', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const { client } = team.bookkeeper;
    const deposit = await createInvoice(client, { jobId: job.jobId, kind: 'deposit' });
    const progress = await createInvoice(client, {
      jobId: job.jobId,
      kind: 'progress',
      lines: [progressLine],
    });
    const voided = await createInvoice(client, {
      jobId: job.jobId,
      kind: 'progress',
      lines: [{ ...progressLine, unitPriceCents: 99_999 }],
    });
    await client.post(`/api/invoices/${voided.id}/void`, { reason: 'typed twice' }).expect(200);
    const change = { label: 'Extra 20 sq ft', quantity: 20, unit: 'sq ft', unitPriceCents: 410 };
    // Change: 20 × $4.10 = $82.00, taxed 8.25 % = $6.765 → $6.77 (half-up).
    const final = await createInvoice(client, {
      jobId: job.jobId,
      kind: 'final',
      lines: [change],
    });
    expect(final.totalCents).toBe(
      job.totalCents + 8200 + 677 - deposit.totalCents - progress.totalCents,
    );
    const detail = await getInvoice(client, final.id);
    expect(detail.lines.map((l) => l.amountCents)).toEqual([
      job.totalCents,
      8200,
      -deposit.totalCents,
      -progress.totalCents,
    ]);
    expect(detail.taxCents).toBe(677);
  });

  it('refuses bad input naming the field, and another company’s job is 404', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const kind = await team.owner.client
      .post('/api/invoices', { jobId: job.jobId, kind: 'weekly' })
      .expect(400);
    expect(errorPaths(kind.body)).toEqual(['kind']);
    const line = await team.owner.client
      .post('/api/invoices', {
        jobId: job.jobId,
        kind: 'progress',
        lines: [{ ...progressLine, unitPriceCents: 1.5 }],
      })
      .expect(400);
    expect(errorPaths(line.body)).toEqual(['lines.0.unitPriceCents']);
    const other = await signUpTeam(testApp().app);
    await other.owner.client
      .post('/api/invoices', { jobId: job.jobId, kind: 'deposit' })
      .expect(404);
  });

  it('50 concurrent creations get 50 distinct consecutive numbers', async () => {
    const fresh = await signUpTeam(testApp().app);
    const job = await acceptedJob(fresh.owner.client, fresh.office.client);
    const results = await Promise.all(
      Array.from({ length: 50 }, () =>
        fresh.owner.client
          .post('/api/invoices', { jobId: job.jobId, kind: 'progress', lines: [progressLine] })
          .then((res) => {
            expect(res.status).toBe(201);
            return (res.body.data as { number: number }).number;
          }),
      ),
    );
    const numbers = [...results].sort((a, b) => a - b);
    expect(numbers).toEqual(Array.from({ length: 50 }, (_, i) => i + 1));
  }, 60_000);
});
