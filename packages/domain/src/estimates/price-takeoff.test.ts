import { describe, expect, it } from 'vitest';
import { computeEstimateTiers } from './estimate-lines.js';
import { priceTakeoff } from './price-takeoff.js';
import type { PricingItem, PricingTakeoffLine } from './price-takeoff.js';

// Invented prices (like the starter price book); expected figures worked by hand.
const items: PricingItem[] = [
  {
    id: 'p-land',
    kind: 'turf',
    key: 'turf-landscape',
    name: 'Landscape turf',
    unit: 'sq ft',
    packSize: null,
    priceMillicents: 240_000,
  },
  {
    id: 'p-pet',
    kind: 'turf',
    key: 'turf-pet',
    name: 'Pet turf',
    unit: 'sq ft',
    packSize: null,
    priceMillicents: 285_000,
  },
  {
    id: 'stone',
    kind: 'material',
    key: 'base-stone',
    name: 'Base stone',
    unit: 'ton',
    packSize: null,
    priceMillicents: 3_800_000,
  },
  {
    id: 'nails',
    kind: 'material',
    key: 'nails-6in-50',
    name: 'Nails (50)',
    unit: 'box',
    packSize: 50,
    priceMillicents: 1_400_000,
  },
  {
    id: 'tape',
    kind: 'material',
    key: 'seam-tape-100',
    name: 'Seam tape',
    unit: 'roll',
    packSize: 100,
    priceMillicents: 4_500_000,
  },
  {
    id: 'inst',
    kind: 'labour',
    key: 'labour-install',
    name: 'Install labour',
    unit: 'sq ft',
    packSize: null,
    priceMillicents: 125_000,
    basis: 'per_sq_ft',
  },
  {
    id: 'hour',
    kind: 'labour',
    key: 'labour-hour',
    name: 'Crew hour',
    unit: 'hour',
    packSize: null,
    priceMillicents: 6_500_000,
    basis: 'per_hour',
  },
  {
    id: 'box',
    kind: 'disposal',
    key: 'roll-off-10',
    name: 'Roll-off',
    unit: 'load',
    packSize: null,
    priceMillicents: 42_500_000,
  },
  {
    id: 'cutter',
    kind: 'equipment',
    key: 'sod-cutter',
    name: 'Sod cutter',
    unit: 'day',
    packSize: null,
    priceMillicents: 11_000_000,
  },
];

const takeoff = (
  over: Partial<PricingTakeoffLine> & Pick<PricingTakeoffLine, 'key'>,
): PricingTakeoffLine => ({
  kind: 'material',
  label: over.key,
  quantity: 1,
  unit: 'ea',
  rule: `rule of ${over.key}`,
  areas: [],
  ...over,
});

const lines: PricingTakeoffLine[] = [
  takeoff({
    key: 'turf',
    label: 'Turf',
    quantity: 750,
    unit: 'sq ft',
    areas: [
      { areaName: 'Front', turfProductId: 'p-land', quantity: 450 },
      { areaName: 'Back', turfProductId: 'p-pet', quantity: 300 },
    ],
  }),
  takeoff({ key: 'excavation-spoil', kind: 'haul', quantity: 6.17, unit: 'cu yd' }),
  takeoff({ key: 'haul-loads', kind: 'haul', quantity: 1, unit: 'loads' }),
  takeoff({ key: 'base-stone-volume', quantity: 5, unit: 'cu yd' }),
  takeoff({ key: 'base-stone-tons', quantity: 6.5, unit: 'tons' }),
  takeoff({ key: 'compaction', kind: 'note', quantity: 90, unit: '%' }),
  takeoff({ key: 'seam-nails', quantity: 62, unit: 'ea' }),
  takeoff({ key: 'seam-tape', quantity: 1, unit: 'rolls' }),
  takeoff({
    key: 'pet-perimeter-boards',
    label: 'Pet perimeter boards',
    quantity: 9,
    unit: 'boards',
  }),
  takeoff({ key: 'labour-install', kind: 'labour', quantity: 4, unit: 'hours' }),
  takeoff({ key: 'labour-seams', kind: 'labour', quantity: 1.5, unit: 'hours' }),
  takeoff({ key: 'equipment:sod-cutter', kind: 'equipment', quantity: 1, unit: 'days' }),
];

let n = 0;
const ids = () => `line-${++n}`;
const measures = { areaSqFt: 700, seamFt: 20 };

describe('priceTakeoff', () => {
  it('prices each takeoff line from the price book (worked by hand, 10 % markup)', () => {
    const priced = priceTakeoff({ lines, items, markupBasisPoints: 1000, measures }, ids);
    const view = priced.lines.map((l) => [l.key, l.quantity, l.unit, l.unitPriceCents]);
    expect(view).toEqual([
      ['turf:turf-landscape', 450, 'sq ft', 264], // $2.40 × 1.1
      ['turf:turf-pet', 300, 'sq ft', 314], // $2.85 × 1.1 = 313.5 ¢ → 314 ¢
      ['haul-loads', 1, 'loads', 46_750], // $425 × 1.1
      ['base-stone-tons', 6.5, 'tons', 4180], // $38 × 1.1
      ['seam-nails', 2, 'box', 1540], // 62 nails in boxes of 50 → 2 boxes; $14 × 1.1
      ['seam-tape', 1, 'rolls', 4950],
      ['pet-perimeter-boards', 9, 'boards', 0], // no item: kept at 0
      ['labour-install', 700, 'sq ft', 138], // per sq ft of area: $1.25 × 1.1 = 137.5 → 138
      ['labour-seams', 1.5, 'hours', 7150], // no seam rate: crew hour $65 × 1.1
      ['equipment:sod-cutter', 1, 'days', 12_100],
    ]);
    expect(priced.warnings).toEqual([
      'Pet perimeter boards (pet-perimeter-boards): no price in the price book, priced at 0',
    ]);
    expect(priced.lines.every((l) => l.source === 'takeoff')).toBe(true);
    expect(priced.lines[0]?.rule).toMatch(/Front: 450 sq ft ordered; priced as Landscape turf/);
  });

  it('prices all turf with one product for a tier, and warns when an area has none', () => {
    const turfOnly = [lines[0] as PricingTakeoffLine];
    const tier = priceTakeoff(
      { lines: turfOnly, items, markupBasisPoints: 0, measures, turfProductId: 'p-pet' },
      ids,
    );
    expect(tier.lines.map((l) => [l.key, l.quantity, l.unitPriceCents])).toEqual([
      ['turf:turf-pet', 750, 285],
    ]);
    const none = priceTakeoff(
      { lines: turfOnly, items, markupBasisPoints: 0, measures, turfProductId: null },
      ids,
    );
    expect(none.lines.map((l) => [l.key, l.quantity, l.unitPriceCents])).toEqual([
      ['turf', 750, 0],
    ]);
    expect(none.warnings[0]).toMatch(/no turf product chosen/);
  });

  it('gives two tiers their own totals (worked by hand)', () => {
    const turfOnly = [lines[0] as PricingTakeoffLine];
    const tiers = computeEstimateTiers(
      ['p-land', 'p-pet'].map((id) => ({
        id,
        name: id,
        turfProductId: id,
        lines: priceTakeoff(
          { lines: turfOnly, items, markupBasisPoints: 0, measures, turfProductId: id },
          ids,
        ).lines,
      })),
      { taxRateBasisPoints: 825, depositRule: { kind: 'percent', basisPoints: 3000 } },
    );
    // 750 × $2.40 = $1,800.00; tax 8.25 % = $148.50; total $1,948.50; deposit 30 % = $584.55.
    // 750 × $2.85 = $2,137.50; tax = 176.34375 → $176.34; total $2,313.84; deposit 694.152 → $694.15.
    expect(tiers.map((t) => [t.subtotalCents, t.taxCents, t.totalCents, t.depositCents])).toEqual([
      [180_000, 14_850, 194_850, 58_455],
      [213_750, 17_634, 231_384, 69_415],
    ]);
  });
});
