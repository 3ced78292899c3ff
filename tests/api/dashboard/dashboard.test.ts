// GET /api/reports/dashboard: figures checked against what the test built through the API
// (invoices, payments, an accepted estimate, a job moved to installed), the stated rules, the
// water rule by region (TRADE.md §8.7) and the roles.
import { beforeAll, describe, expect, it } from 'vitest';
import type { DashboardView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { errorPaths } from '../../fixtures/estimates.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { pricedJob } from '../estimate-sending/sending-fixtures.js';
import { pay, sentInvoice } from '../receivables/receivables-fixtures.js';

describe('GET /api/reports/dashboard', () => {
  let team: Team;
  let today: string;
  let areaSqFt: number;
  let subtotalCents: number;
  let leadEstimateTotal: number;

  const dashboard = async (query = ''): Promise<DashboardView> =>
    (await team.owner.client.get(`/api/reports/dashboard${query}`).expect(200)).body
      .data as DashboardView;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    const owner = team.owner.client;
    const companyId = team.owner.me.company.id;
    // One job won and installed: estimate sent, signed at the office, then moved along.
    const won = await pricedJob(owner);
    await owner.post(`/api/estimates/${won.estimate.id}/send`, {}).expect(200);
    await owner
      .post(`/api/estimates/${won.estimate.id}/acceptances`, {
        name: 'Wren Halloway',
        signedAt: new Date().toISOString(),
        place: 'office',
      })
      .expect(201);
    for (const status of ['scheduled', 'in_progress', 'installed'])
      await owner.patch(`/api/jobs/${won.jobId}`, { status }).expect(200);
    const areas = await owner.get(`/api/jobs/${won.jobId}/areas`).expect(200);
    areaSqFt = (areas.body.data as { areaSqFt: number }[]).reduce((s, a) => s + a.areaSqFt, 0);
    subtotalCents = (await owner.get(`/api/estimates/${won.estimate.id}`).expect(200)).body.data
      .subtotalCents;
    // One lead with a draft estimate (pipeline), and money: 600.00 invoiced, 250.00 paid.
    const lead = await pricedJob(owner);
    leadEstimateTotal = lead.estimate.totalCents;
    const invoice = await sentInvoice(owner, companyId, lead.jobId, 60_000, 14);
    today = invoice.issuedOn;
    await pay(owner, invoice.id, 25_000, today);
  });

  it('adds up invoiced and collected by month, the pipeline and the win rate', async () => {
    const data = await dashboard();
    const month = today.slice(0, 7);
    expect(data.to).toBe(today);
    expect(data.from).toMatch(/^\d{4}-\d{2}-01$/);
    expect(data.invoicedByMonth).toEqual([{ month, cents: 60_000 }]);
    expect(data.collectedByMonth).toEqual([{ month, cents: 25_000 }]);
    const lead = data.pipeline.find((p) => p.status === 'lead');
    expect(lead).toEqual({ status: 'lead', jobs: 1, valueCents: leadEstimateTotal });
    expect(data.pipeline.find((p) => p.status === 'installed')?.jobs).toBe(1);
    expect(data.winRate).toMatchObject({ accepted: 1, declined: 0, expired: 0, rate: 1 });
    expect(data.winRate.rule).toMatch(/accepted ÷ \(accepted \+ declined \+ expired\)/);
  });

  it('counts the job installed in the period, its area and its price per sq ft', async () => {
    const data = await dashboard();
    expect(data.installed.jobs).toBe(1);
    expect(data.installed.sqFt).toBe(Math.round(areaSqFt));
    expect(data.installed.valueCents).toBe(subtotalCents);
    expect(data.installed.averageCentsPerSqFt).toBe(Math.floor(subtotalCents / areaSqFt + 0.5));
    // No turf was cut from stock for it, so there is nothing to compare yet.
    expect(data.material).toMatchObject({ jobs: 0, estimatedSqFt: 0, actualSqFt: 0 });
    expect(data.crewUtilisation).toBeNull();
  });

  it('shows water saved only where a published figure exists (TRADE.md §8.7)', async () => {
    const none = await dashboard();
    expect(none.waterSaved).toMatchObject({ region: null, gallonsPerYear: null, rule: null });
    expect(none.waterSaved.note).toMatch(/No published water figure/);
    await team.owner.client.patch('/api/company', { region: 'US-NV' }).expect(200);
    const nevada = await dashboard();
    // Southern Nevada: 73 − 18 = 55 gal per sq ft per year (TRADE.md §8.7).
    expect(nevada.waterSaved.gallonsPerYear).toBe(Math.round(areaSqFt * 55));
    expect(nevada.waterSaved.rule).toMatchObject({
      label: 'Southern Nevada',
      lawnGallonsPerSqFtYear: 73,
      replacementGallonsPerSqFtYear: 18,
    });
  });

  it('a period without activity shows zeros, and a bad range is a 400 naming the field', async () => {
    const empty = await dashboard('?from=2001-01-01&to=2001-12-31');
    expect(empty.invoicedByMonth).toEqual([]);
    expect(empty.installed.jobs).toBe(0);
    expect(empty.winRate.rate).toBeNull();
    const bad = await team.owner.client.get('/api/reports/dashboard?to=2026-02-31').expect(400);
    expect(errorPaths(bad.body)).toEqual(['to']);
    const crew = await team.owner.client.get('/api/reports/dashboard?crewId=nope').expect(400);
    expect(errorPaths(crew.body)).toEqual(['crewId']);
  });

  it('is the owner’s alone: bookkeeper, office and crew lead get 403', async () => {
    for (const client of [team.bookkeeper.client, team.office.client, team.crew.client]) {
      const res = await client.get('/api/reports/dashboard');
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('FORBIDDEN');
    }
  });
});
