// Property tests: random small stocks and jobs, checked for the invariants and against a brute
// force that enumerates every assignment of every piece to every roll of every lot (or short)
// and scores it with its own code.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { reserveTurf } from './reserve-turf.js';
import type { ProductPieces, StockRoll } from './types.js';

const EPS = 1e-6;
const SCRAP_BELOW_FT = 3;

type Score = [short: number, negRemnant: number, scrap: number, trim: number, rolls: number];

/** Independent scoring of one complete assignment (`to[i]` roll index or -1). */
function score(pieces: ProductPieces['pieces'], rolls: StockRoll[], to: number[]): Score | null {
  const used = rolls.map(() => 0);
  const s: Score = [0, 0, 0, 0, 0];
  for (let i = 0; i < pieces.length; i += 1) {
    const p = pieces[i];
    const r = to[i] ?? -1;
    if (!p) continue;
    if (r < 0) {
      s[0] += p.lengthFt;
      continue;
    }
    const roll = rolls[r];
    if (!roll || roll.widthFt < p.widthFt) return null;
    used[r] = (used[r] ?? 0) + p.lengthFt;
    if (roll.isRemnant) s[1] -= p.lengthFt;
    s[3] += (roll.widthFt - p.widthFt) * p.lengthFt;
  }
  for (let r = 0; r < rolls.length; r += 1) {
    const u = used[r] ?? 0;
    const roll = rolls[r];
    if (!roll || u === 0) continue;
    if (u > roll.availableFt + EPS) return null;
    s[4] += 1;
    const left = roll.availableFt - u;
    if (left > EPS && left < SCRAP_BELOW_FT) s[2] += left;
  }
  return s;
}

function compare(a: Score, b: Score): number {
  for (let k = 0; k < a.length; k += 1) {
    const d = (a[k] ?? 0) - (b[k] ?? 0);
    if (Math.abs(d) > EPS) return d;
  }
  return 0;
}

/** The best score over every lot and every assignment. */
function bruteForce(product: ProductPieces, stock: StockRoll[]): Score {
  const lots = [
    ...new Set(stock.filter((r) => r.productId === product.productId).map((r) => r.dyeLot)),
  ];
  const none: Score = [product.pieces.reduce((s, p) => s + p.lengthFt, 0), 0, 0, 0, 0];
  let best = none;
  for (const lot of lots) {
    const rolls = stock.filter((r) => r.productId === product.productId && r.dyeLot === lot);
    const to = product.pieces.map(() => -1);
    const walk = (i: number): void => {
      if (i === to.length) {
        const s = score(product.pieces, rolls, to);
        if (s && compare(s, best) < 0) best = s;
        return;
      }
      for (let r = -1; r < rolls.length; r += 1) {
        to[i] = r;
        walk(i + 1);
      }
      to[i] = -1;
    };
    walk(0);
  }
  return best;
}

const pieceArb = fc.record({
  widthFt: fc.constantFrom(12, 15),
  lengthFt: fc.integer({ min: 1, max: 40 }),
});
const rollArb = fc.record({
  productId: fc.constantFrom('p1', 'p2'),
  dyeLot: fc.constantFrom('L1', 'L2', 'L3'),
  widthFt: fc.constantFrom(12, 15),
  availableFt: fc.integer({ min: 1, max: 60 }),
  isRemnant: fc.boolean(),
});
const caseArb = fc.record({
  products: fc.uniqueArray(
    fc.record({
      productId: fc.constantFrom('p1', 'p2'),
      pieces: fc.array(pieceArb, { minLength: 1, maxLength: 5 }),
    }),
    { minLength: 1, maxLength: 2, selector: (p) => p.productId },
  ),
  rolls: fc
    .array(rollArb, { minLength: 0, maxLength: 6 })
    .map((list) => list.map((r, i) => ({ ...r, id: `r${i}` }))),
});

describe('reserveTurf properties', () => {
  it('never over-allocates a roll, places or counts short every piece, one lot per product', () => {
    fc.assert(
      fc.property(caseArb, ({ products, rolls }) => {
        const plan = reserveTurf({ products, rolls });
        const byId = new Map(rolls.map((r) => [r.id, r]));
        const taken = new Map<string, number>();
        let totalShort = 0;
        plan.products.forEach((result, k) => {
          const product = products[k];
          expect(result.productId).toBe(product?.productId);
          const placed = [
            ...result.allocations.map((a) => a.pieceIndex),
            ...result.shortPieces.map((s) => s.pieceIndex),
          ].sort((a, b) => a - b);
          expect(placed).toEqual(product?.pieces.map((_, i) => i));
          for (const a of result.allocations) {
            const r = byId.get(a.rollId);
            expect(r?.productId).toBe(result.productId);
            expect(r?.dyeLot).toBe(result.dyeLot);
            expect(r?.widthFt).toBeGreaterThanOrEqual(a.widthFt);
            taken.set(a.rollId, (taken.get(a.rollId) ?? 0) + a.lengthFt);
          }
          const short = result.shortPieces.reduce((s, p) => s + p.lengthFt, 0);
          expect(result.shortFt).toBeCloseTo(short, 9);
          totalShort += short;
        });
        for (const [id, ft] of taken)
          expect(ft).toBeLessThanOrEqual((byId.get(id)?.availableFt ?? 0) + EPS);
        expect(plan.shortFt).toBeCloseTo(totalShort, 9);
      }),
      { numRuns: 300 },
    );
  });

  it('finds the same best figures as the brute force', () => {
    fc.assert(
      fc.property(caseArb, ({ products, rolls }) => {
        const plan = reserveTurf({ products, rolls, scrapBelowFt: SCRAP_BELOW_FT });
        plan.products.forEach((result, k) => {
          const product = products[k];
          if (!product) return;
          const got: Score = [
            result.shortFt,
            -result.remnantFt,
            result.scrapFt,
            result.trimSqFt,
            result.rollsCut,
          ];
          expect(result.isExhaustive).toBe(true);
          expect(compare(got, bruteForce(product, rolls))).toBe(0);
        });
      }),
      { numRuns: 300 },
    );
  });

  it('answers the same plan for the same request', () => {
    fc.assert(
      fc.property(caseArb, (request) => {
        expect(reserveTurf(request)).toEqual(reserveTurf(request));
      }),
      { numRuns: 50 },
    );
  });
});
