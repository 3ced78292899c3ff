// A draft estimate as the API answers it, figures worked by hand with the rounding rule
// (packages/domain/src/estimates: each line half-up to the cent, tax once on the subtotal).
import { ESTIMATE_ROUNDING_RULE, type EstimateLine, type EstimateView } from '@seamwright/shared';

const turf: EstimateLine = {
  id: '00000000-0000-4000-8000-0000000e1001',
  key: 'turf',
  label: 'Landscape turf',
  quantity: 600,
  unit: 'sq ft',
  unitPriceCents: 240,
  taxable: true,
  source: 'takeoff',
  rule: 'Ordered area of the saved plans, priced per sq ft.',
  amountCents: 144_000,
};
const tape: EstimateLine = {
  id: '00000000-0000-4000-8000-0000000e1002',
  key: 'seam-tape',
  label: 'Seam tape',
  quantity: 1,
  unit: 'rolls',
  unitPriceCents: 4500,
  taxable: true,
  source: 'manual-override',
  rule: 'Seam length plus 10 %, in whole rolls.',
  computed: { quantity: 2, unitPriceCents: 4500 },
  amountCents: 4500,
};

/** $1,485.00 subtotal, 8.25 % tax = $122.5125 → $122.51, total $1,607.51, 30 % → $482.25. */
export function sampleEstimate(overrides: Partial<EstimateView> = {}): EstimateView {
  const tier = {
    id: '00000000-0000-4000-8000-0000000e2001',
    name: 'Standard',
    turfProductId: null,
    lines: [turf, tape],
    subtotalCents: 148_500,
    taxableSubtotalCents: 148_500,
    taxCents: 12_251,
    totalCents: 160_751,
    depositCents: 48_225,
  };
  return {
    id: '00000000-0000-4000-8000-0000000e0001',
    jobId: '00000000-0000-4000-8000-0000000e0002',
    version: 1,
    status: 'draft',
    lines: tier.lines,
    subtotalCents: tier.subtotalCents,
    taxCents: tier.taxCents,
    totalCents: tier.totalCents,
    depositCents: tier.depositCents,
    tiers: [tier],
    chosenTierId: null,
    warnings: [],
    notes: null,
    validUntil: '2026-12-31',
    depositRule: { kind: 'percent', basisPoints: 3000 },
    markupBasisPoints: 0,
    taxRateBasisPoints: 825,
    roundingRule: ESTIMATE_ROUNDING_RULE.sentence,
    sentAt: null,
    createdBy: null,
    createdAt: '2026-12-01T15:00:00.000Z',
    updatedAt: '2026-12-01T15:00:00.000Z',
    ...overrides,
  };
}
