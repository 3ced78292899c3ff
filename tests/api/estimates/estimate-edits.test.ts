// PATCH /api/estimates/:id: line and tier edits, recomputed totals, and nothing saved on bad
// input. Figures worked by hand with the rounding rule (packages/domain/src/estimates).
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
} from '../../fixtures/estimates.js';
import { createCustomer, createJob, createSite, signUpCompany } from '../../fixtures/factories.js';
import type { SignedIn } from '../../fixtures/factories.js';

const percent30 = { kind: 'percent', basisPoints: 3000 } as const;

describe('PATCH /api/estimates/:id', () => {
  let owner: SignedIn;
  let customerId: string;
  let siteId: string;
  let landscape: string;
  let pet: string;

  const draft = async (): Promise<EstimateView> => {
    const jobId = (await createJob(owner.client, customerId, siteId)).id;
    await createArea(owner.client, jobId, areaBody({ turfProductId: landscape }));
    return createEstimate(owner.client, jobId);
  };
  const patch = async (id: string, body: object, status = 200) =>
    (await owner.client.patch(`/api/estimates/${id}`, body).expect(status)).body as {
      data: EstimateView;
    };

  beforeAll(async () => {
    owner = await signUpCompany(testApp().app);
    customerId = (await createCustomer(owner.client)).id;
    siteId = (await createSite(owner.client, customerId)).id;
    const products = await turfProducts(owner.client);
    landscape = products.find((p) => p.key === 'turf-landscape-175')!.id;
    pet = products.find((p) => p.key === 'turf-pet-125')!.id;
    await owner.client
      .patch('/api/estimating-settings', { markupBasisPoints: 1000, taxRateBasisPoints: 825 })
      .expect(200);
  });

  it('recomputes hand-worked totals after lines are removed and typed in', async () => {
    const estimate = await draft();
    const body = await patch(estimate.id, {
      lines: {
        remove: estimate.lines.map((l) => l.id),
        add: [
          { label: 'Turf', quantity: 452.25, unit: 'sq ft', unitPriceCents: 276 },
          { label: 'Base', quantity: 6.5, unit: 'tons', unitPriceCents: 4370 },
          { label: 'Labour', quantity: 1, unit: 'job', unitPriceCents: 15_000, taxable: false },
        ],
      },
    });
    const view = body.data;
    // Worked by hand: 452.25 × $2.76 = $1,248.21; 6.5 × $43.70 = $284.05; $150.00 untaxed.
    // Subtotal $1,682.26; taxable $1,532.26 × 8.25 % = 126.41145 → $126.41; total $1,808.67;
    // deposit 30 % = 542.601 → $542.60.
    expect(view.lines.map((l) => [l.amountCents, l.source, l.key])).toEqual([
      [124_821, 'manual', 'manual'],
      [28_405, 'manual', 'manual'],
      [15_000, 'manual', 'manual'],
    ]);
    expect(view).toMatchObject({
      subtotalCents: 168_226,
      taxCents: 12_641,
      totalCents: 180_867,
      depositCents: 54_260,
    });
    // A fixed deposit larger than the total is capped at the total.
    const capped = (await patch(estimate.id, { depositRule: { kind: 'amount', cents: 999_999 } }))
      .data;
    expect(capped.depositCents).toBe(180_867);
    const fixed = (await patch(estimate.id, { depositRule: { kind: 'amount', cents: 50_000 } }))
      .data;
    expect(fixed.depositCents).toBe(50_000);
    const [row] = await estimateRows(view.jobId);
    expect(Number(row!.total_cents)).toBe(180_867);
  });

  it('overrides a takeoff line by hand, keeping its rule and the computed figures', async () => {
    const estimate = await draft();
    const turf = estimate.lines.find((l) => l.kind === 'turf')!;
    const view = (
      await patch(estimate.id, {
        lines: { update: [{ id: turf.id, quantity: 700, unitPriceCents: 250 }] },
        notes: 'Gate is 36 in wide',
        validUntil: '2027-01-31',
      })
    ).data;
    const edited = view.lines.find((l) => l.id === turf.id)!;
    expect(edited).toMatchObject({
      source: 'manual-override',
      quantity: 700,
      unitPriceCents: 250,
      amountCents: 175_000, // 700 × $2.50
      rule: turf.rule,
      computed: { quantity: turf.quantity, unitPriceCents: turf.unitPriceCents },
    });
    expect(view).toMatchObject({ notes: 'Gate is 36 in wide', validUntil: '2027-01-31' });
    expect(view.subtotalCents).toBe(estimate.subtotalCents - turf.amountCents + 175_000);
    expectConsistentTier(view, 825, percent30);
    const job = await owner.client.get(`/api/jobs/${estimate.jobId}`).expect(200);
    expect(activityActions(job.body)).toContain('job.estimate_changed');
  });

  it('adds a tier priced with another turf, renames and removes tiers', async () => {
    const estimate = await draft();
    const first = estimate.tiers[0]!;
    const added = (
      await patch(estimate.id, { tiers: { add: [{ name: 'Pet upgrade', turfProductId: pet }] } })
    ).data;
    expect(added.tiers.map((t) => t.name)).toEqual(['Standard', 'Pet upgrade']);
    const upgrade = added.tiers[1]!;
    const turfOf = (lines: EstimateView['lines']) => lines.find((l) => l.kind === 'turf')!;
    // $2.85 × 1.1 = 313.5 ¢ → 314 ¢ (worked by hand), same sq ft as the first tier.
    expect(turfOf(upgrade.lines)).toMatchObject({
      unitPriceCents: 314,
      quantity: turfOf(first.lines).quantity,
      priceBookItemId: pet,
    });
    expect(upgrade.lines).toHaveLength(first.lines.length);
    expectConsistentTier(upgrade, 825, percent30);
    // Top-level figures stay the first tier's.
    expect(added.totalCents).toBe(first.totalCents);

    const renamed = (
      await patch(estimate.id, {
        tiers: { rename: [{ id: first.id, name: 'Good' }], remove: [upgrade.id] },
        lines: {
          add: [
            {
              tierId: first.id,
              label: 'Haul away old sod',
              quantity: 1,
              unit: 'job',
              unitPriceCents: 12_345,
            },
          ],
        },
      })
    ).data;
    expect(renamed.tiers.map((t) => t.name)).toEqual(['Good']);
    expect(renamed.totalCents).toBeGreaterThan(first.totalCents);
    expectConsistentTier(renamed, 825, percent30);
  });

  it('refuses bad edits naming the field, and saves nothing', async () => {
    const estimate = await draft();
    const [before] = await estimateRows(estimate.jobId);
    const line = estimate.lines[0]!;
    const cases: [object, string][] = [
      [{ lines: { update: [{ id: line.id, quantity: -1 }] } }, 'lines.update.0.quantity'],
      [
        { lines: { update: [{ id: line.id, unitPriceCents: 1.5 }] } },
        'lines.update.0.unitPriceCents',
      ],
      [
        { lines: { update: [{ id: '0b5f1c1e-5d7e-4a39-9f55-3f9d2a1b0c4d' }] } },
        'lines.update.0.id',
      ],
      [{ lines: { add: [{ label: 'x', quantity: 1, unit: 'ea' }] } }, 'lines.add.0.unitPriceCents'],
      [{ tiers: { remove: [estimate.tiers[0]!.id] } }, 'tiers.remove'],
      [{ validUntil: 'soon' }, 'validUntil'],
      [{ depositRule: { kind: 'percent', basisPoints: 20_000 } }, 'depositRule.basisPoints'],
      [{ status: 'sent' }, ''],
      [{}, ''],
    ];
    for (const [body, path] of cases) {
      const res = await owner.client.patch(`/api/estimates/${estimate.id}`, body).expect(400);
      expect(res.body.code, JSON.stringify(body)).toBe('VALIDATION_FAILED');
      expect(errorPaths(res.body), JSON.stringify(body)).toContain(path);
    }
    // Valid changes sent with a bad one are not saved either.
    await owner.client
      .patch(`/api/estimates/${estimate.id}`, {
        notes: 'Should not stick',
        lines: { remove: ['0b5f1c1e-5d7e-4a39-9f55-3f9d2a1b0c4d'] },
      })
      .expect(400);
    const [after] = await estimateRows(estimate.jobId);
    expect(after).toEqual(before);
  });
});
