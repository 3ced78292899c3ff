// Making estimates from a job's takeoff: prices, totals and rounding, tiers, and the 409s.
// Money figures are worked by hand from the starter price book (invented demo prices) with the
// rounding rule in packages/domain/src/estimates/money.ts (half-up per line, tax once).
import { beforeAll, describe, expect, it } from 'vitest';
import type { EstimateView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { areaBody, createArea, turfProducts } from '../../fixtures/areas.js';
import {
  activityActions,
  createEstimate,
  errorPaths,
  estimateRows,
  expectConsistentTier,
  listOf,
} from '../../fixtures/estimates.js';
import {
  createCustomer,
  createJob,
  createSite,
  moveJob,
  signUpCompany,
} from '../../fixtures/factories.js';
import type { SignedIn } from '../../fixtures/factories.js';

const percent30 = { kind: 'percent', basisPoints: 3000 } as const;

describe('POST /api/jobs/:id/estimates', () => {
  let owner: SignedIn;
  let customerId: string;
  let siteId: string;
  let landscape: string;
  let pet: string;

  const newJob = async () => (await createJob(owner.client, customerId, siteId)).id;

  beforeAll(async () => {
    owner = await signUpCompany(testApp().app);
    customerId = (await createCustomer(owner.client)).id;
    siteId = (await createSite(owner.client, customerId)).id;
    const products = await turfProducts(owner.client);
    landscape = products.find((p) => p.key === 'turf-landscape-175')!.id;
    pet = products.find((p) => p.key === 'turf-pet-125')!.id;
    // 10 % markup and 8.25 % tax (invented test rates); the starter deposit rule is 30 %.
    await owner.client
      .patch('/api/estimating-settings', { markupBasisPoints: 1000, taxRateBasisPoints: 825 })
      .expect(200);
  });

  it('prices the takeoff from the price book and answers the contract shape', async () => {
    const jobId = await newJob();
    const area = await createArea(owner.client, jobId, areaBody({ turfProductId: landscape }));
    const res = await owner.client.post(`/api/jobs/${jobId}/estimates`, {}).expect(201);
    const estimate = res.body.data as EstimateView;
    expect(estimate).toMatchObject({ version: 1, status: 'draft', jobId, notes: null });
    expect(estimate.tiers).toHaveLength(1);
    expect(estimate.lines).toEqual(estimate.tiers[0]!.lines);
    expect(estimate.totalCents).toBe(estimate.tiers[0]!.totalCents);

    // Turf: the plan's ordered sq ft at $2.40 × 1.10 = $2.64 (worked by hand).
    const turf = estimate.lines.find((l) => l.key === 'turf:turf-landscape-175')!;
    expect(turf).toMatchObject({
      quantity: area.orderedSqFt,
      unit: 'sq ft',
      unitPriceCents: 264,
      amountCents: Math.round(area.orderedSqFt * 264),
      source: 'takeoff',
      taxable: true,
    });
    expect(turf.rule).toMatch(/priced as Landscape turf/);
    // Install labour is per sq ft of area in the starter book: 600 sq ft × $1.25 × 1.1
    // = 137.5 ¢ → 138 ¢ a sq ft, 600 × 138 ¢ = $828.00.
    const install = estimate.lines.find((l) => l.key === 'labour-install')!;
    expect(install).toMatchObject({
      quantity: 600,
      unit: 'sq ft',
      unitPriceCents: 138,
      amountCents: 82_800,
    });
    // Notes and measures priced elsewhere are not lines.
    expect(estimate.lines.map((l) => l.key)).not.toContain('compaction');
    expect(estimate.lines.map((l) => l.key)).not.toContain('base-stone-volume');
    // The starter book has no power broom: the line stays at 0 with a warning naming it.
    const broom = estimate.lines.find((l) => l.key === 'equipment:power-broom')!;
    expect(broom).toMatchObject({ unitPriceCents: 0, amountCents: 0 });
    expect(estimate.warnings.some((w) => w.includes('equipment:power-broom'))).toBe(true);

    expectConsistentTier(estimate, 825, percent30);
    expect(estimate.depositCents).toBeLessThanOrEqual(estimate.totalCents);
    expect(estimate.totalCents).toBe(estimate.subtotalCents + estimate.taxCents);

    const rows = await estimateRows(jobId);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ id: estimate.id, version: 1, status: 'draft' });
    expect(Number(rows[0]!.total_cents)).toBe(estimate.totalCents);
    const job = await owner.client.get(`/api/jobs/${jobId}`).expect(200);
    expect(activityActions(job.body)).toContain('job.estimate_created');
    await owner.client.get(`/api/estimates/${estimate.id}`).expect(200);
  });

  it('prices one tier per turf product, each with its own totals', async () => {
    const jobId = await newJob();
    const area = await createArea(owner.client, jobId, areaBody({ turfProductId: landscape }));
    const estimate = await createEstimate(owner.client, jobId, {
      tiers: [
        { name: 'Landscape', turfProductId: landscape },
        { name: 'Pet', turfProductId: pet },
      ],
    });
    expect(estimate.tiers.map((t) => t.name)).toEqual(['Landscape', 'Pet']);
    const turfOf = (i: number) => estimate.tiers[i]!.lines.find((l) => l.kind === 'turf')!;
    // $2.40 × 1.1 = $2.64; $2.85 × 1.1 = 313.5 ¢ → 314 ¢ (worked by hand).
    expect(turfOf(0)).toMatchObject({ unitPriceCents: 264, quantity: area.orderedSqFt });
    expect(turfOf(1)).toMatchObject({ unitPriceCents: 314, quantity: area.orderedSqFt });
    for (const tier of estimate.tiers) expectConsistentTier(tier, 825, percent30);
    // Everything but the turf is the same, so the difference is the turf's (50 ¢ a sq ft)
    // plus its tax.
    const diff = estimate.tiers[1]!.subtotalCents - estimate.tiers[0]!.subtotalCents;
    expect(diff).toBe(turfOf(1).amountCents - turfOf(0).amountCents);
    expect(estimate.lines).toEqual(estimate.tiers[0]!.lines);
  });

  it('answers 409 for a job without areas and for a second draft, saving nothing', async () => {
    const empty = await newJob();
    const res = await owner.client.post(`/api/jobs/${empty}/estimates`, {}).expect(409);
    expect(res.body.code).toBe('CONFLICT');
    expect(res.body.detail).toMatch(/no areas/);
    expect(await estimateRows(empty)).toEqual([]);

    const jobId = await newJob();
    await createArea(owner.client, jobId);
    await createEstimate(owner.client, jobId);
    const second = await owner.client.post(`/api/jobs/${jobId}/estimates`, {}).expect(409);
    expect(second.body.detail).toMatch(/Version 1 .* still a draft/);
    expect(await estimateRows(jobId)).toHaveLength(1);
  });

  it('answers 409 once the job is past estimated', async () => {
    const jobId = await newJob();
    await createArea(owner.client, jobId);
    await moveJob(owner.client, jobId, ['estimated', 'accepted']);
    const res = await owner.client.post(`/api/jobs/${jobId}/estimates`, {}).expect(409);
    expect(res.body.detail).toMatch(/accepted/i);
    expect(await estimateRows(jobId)).toEqual([]);
  });

  it('refuses bad input naming the field, and saves nothing', async () => {
    const jobId = await newJob();
    await createArea(owner.client, jobId);
    for (const [body, path] of [
      [{ tiers: [{ name: '' }] }, 'tiers.0.name'],
      [{ tiers: [] }, 'tiers'],
      [{ validUntil: '2026-02-30' }, 'validUntil'],
      [{ total: 5 }, ''],
    ] as const) {
      const res = await owner.client.post(`/api/jobs/${jobId}/estimates`, body).expect(400);
      expect(res.body.code).toBe('VALIDATION_FAILED');
      expect(errorPaths(res.body)).toContain(path);
    }
    const material = (await owner.client.get('/api/price-book?kind=material').expect(200)).body
      .data[0].id as string;
    const notTurf = await owner.client
      .post(`/api/jobs/${jobId}/estimates`, { tiers: [{ name: 'X', turfProductId: material }] })
      .expect(400);
    expect(notTurf.body.errors[0].path).toBe('tiers.0.turfProductId');
    await owner.client
      .post(`/api/jobs/${jobId}/estimates`, {
        tiers: [{ name: 'X', turfProductId: '0b5f1c1e-5d7e-4a39-9f55-3f9d2a1b0c4d' }],
      })
      .expect(404);
    expect(await estimateRows(jobId)).toEqual([]);
  });

  it('lists a job’s versions newest first, and 404s another company’s job and estimate', async () => {
    const jobId = await newJob();
    await createArea(owner.client, jobId);
    const first = await createEstimate(owner.client, jobId);
    const list = await owner.client.get(`/api/jobs/${jobId}/estimates`).expect(200);
    expect(listOf(list.body).map((e) => e.id)).toEqual([first.id]);

    const other = await signUpCompany(testApp().app);
    await other.client.get(`/api/jobs/${jobId}/estimates`).expect(404);
    await other.client.post(`/api/jobs/${jobId}/estimates`, {}).expect(404);
    await other.client.get(`/api/estimates/${first.id}`).expect(404);
    await other.client.patch(`/api/estimates/${first.id}`, { notes: 'x' }).expect(404);
    await other.client.post(`/api/estimates/${first.id}/revisions`, {}).expect(404);
    expect((await estimateRows(jobId))[0]).toMatchObject({ notes: null });
  });
});
