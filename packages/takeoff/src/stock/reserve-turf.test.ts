import { describe, expect, it } from 'vitest';
import { reserveTurf } from './reserve-turf.js';
import type { StockRoll } from './types.js';

const roll = (
  id: string,
  dyeLot: string,
  widthFt: number,
  availableFt: number,
  isRemnant = false,
): StockRoll => ({ id, productId: 'grass', dyeLot, widthFt, availableFt, isRemnant });

// Worked example, computed by hand (README "Reservation search"). Lot A: a 15 × 100 ft roll and
// a 15 × 24 ft remnant; lot B: 15 × 60 and 15 × 40 ft rolls.
const stock = [
  roll('A1', 'A', 15, 100),
  roll('A2', 'A', 15, 24, true),
  roll('B1', 'B', 15, 60),
  roll('B2', 'B', 15, 40),
];

describe('reserveTurf', () => {
  it('puts the job on the lot that uses the remnant: 22 ft on the remnant, 40 + 35 ft on the roll', () => {
    const plan = reserveTurf({
      products: [
        {
          productId: 'grass',
          pieces: [
            { widthFt: 15, lengthFt: 40 },
            { widthFt: 15, lengthFt: 35 },
            { widthFt: 15, lengthFt: 22 },
          ],
        },
      ],
      rolls: stock,
    });
    const [grass] = plan.products;
    // Both lots hold all 97 ft; only lot A has a remnant the 22 ft piece fits.
    expect(grass).toMatchObject({
      dyeLot: 'A',
      shortFt: 0,
      remnantFt: 22,
      scrapFt: 2, // 24 − 22 ft left on the remnant, under the 3 ft scrap line
      rollsCut: 2,
      isExhaustive: true,
      lotsCompared: [
        { dyeLot: 'A', shortFt: 0 },
        { dyeLot: 'B', shortFt: 0 },
      ],
    });
    expect(grass?.allocations.map((a) => [a.pieceIndex, a.rollId])).toEqual([
      [0, 'A1'],
      [1, 'A1'],
      [2, 'A2'],
    ]);
    expect(plan.shortFt).toBe(0);
  });

  it('reports what to order when no lot holds the job: 30 ft of 15 ft wide', () => {
    const plan = reserveTurf({
      products: [
        {
          productId: 'grass',
          pieces: [
            { widthFt: 15, lengthFt: 40 },
            { widthFt: 15, lengthFt: 35 },
            { widthFt: 15, lengthFt: 30 },
          ],
        },
      ],
      rolls: stock,
    });
    const [grass] = plan.products;
    // 105 ft: lot A's 100 ft roll takes 40 + 35 (the remnant fits none), lot B's best also
    // leaves 30 ft short but cuts two rolls, so lot A wins on fewer rolls cut.
    expect(grass).toMatchObject({ dyeLot: 'A', shortFt: 30, rollsCut: 1 });
    expect(grass?.shortPieces).toEqual([{ pieceIndex: 2, widthFt: 15, lengthFt: 30 }]);
    expect(grass?.toOrder).toEqual([{ widthFt: 15, lengthFt: 30 }]);
    expect(plan.shortFt).toBe(30);
  });

  it('cuts a 12 ft piece from a 15 ft roll only when no 12 ft roll of the lot holds it', () => {
    const rolls = [roll('W15', 'A', 15, 100), roll('W12', 'A', 12, 20)];
    const fits = reserveTurf({
      products: [{ productId: 'grass', pieces: [{ widthFt: 12, lengthFt: 20 }] }],
      rolls,
    });
    expect(fits.products[0]?.allocations[0]?.rollId).toBe('W12');
    expect(fits.products[0]?.trimSqFt).toBe(0);
    const tooLong = reserveTurf({
      products: [{ productId: 'grass', pieces: [{ widthFt: 12, lengthFt: 25 }] }],
      rolls,
    });
    expect(tooLong.products[0]?.allocations[0]?.rollId).toBe('W15');
    expect(tooLong.products[0]?.trimSqFt).toBe(75); // 3 ft × 25 ft trimmed off the side
  });

  it('answers every piece short with no lot when the product has no stock', () => {
    const plan = reserveTurf({
      products: [{ productId: 'other', pieces: [{ widthFt: 15, lengthFt: 10 }] }],
      rolls: stock,
    });
    expect(plan.products[0]).toMatchObject({
      dyeLot: null,
      shortFt: 10,
      allocations: [],
      toOrder: [{ widthFt: 15, lengthFt: 10 }],
    });
  });

  it('never mixes lots, even when two lots together would hold the job', () => {
    const plan = reserveTurf({
      products: [
        {
          productId: 'grass',
          pieces: [
            { widthFt: 15, lengthFt: 60 },
            { widthFt: 15, lengthFt: 60 },
          ],
        },
      ],
      rolls: [roll('A', 'A', 15, 60), roll('B', 'B', 15, 60)],
    });
    expect(plan.products[0]?.shortFt).toBe(60);
    expect(new Set(plan.products[0]?.allocations.map((a) => a.rollId)).size).toBe(1);
  });

  it('stops at the work limit with a valid answer and says it is not proved best', () => {
    const pieces = Array.from({ length: 40 }, (_, i) => ({ widthFt: 15, lengthFt: 7 + (i % 9) }));
    const rolls = Array.from({ length: 12 }, (_, i) => roll(`R${i}`, 'A', 15, 31 + i * 3));
    const plan = reserveTurf({
      products: [{ productId: 'grass', pieces }],
      rolls,
      maxNodesPerLot: 2000,
    });
    const grass = plan.products[0];
    expect(grass?.isExhaustive).toBe(false);
    expect((grass?.allocations.length ?? 0) + (grass?.shortPieces.length ?? 0)).toBe(40);
  });
});
