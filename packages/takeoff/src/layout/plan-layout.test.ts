import { describe, expect, it } from 'vitest';
import { LayoutInputError } from './errors.js';
import { planLayout } from './plan-layout.js';
import { beanYard } from './sample-yards.js';
import { cutAlongDirection, directionGap, isInCut } from './test-helpers.js';
import type { Point } from './types.js';

const rectangle = (w: number, h: number): Point[] => [
  [0, 0],
  [w, 0],
  [w, h],
  [0, h],
];

describe('planLayout — TRADE.md check values', () => {
  // Each row: the input as the check value states it and the expected purchase.
  const rows = [
    {
      // Check value 1 — derived (arithmetic on the sold-by-full-width rule, TRADE.md §1).
      name: '#1 rectangle 30 × 20, grain along the 20 ft side',
      outer: rectangle(30, 20),
      angleDeg: 90 as number | undefined,
      pieces: [
        { widthFt: 15, lengthFt: 20 },
        { widthFt: 15, lengthFt: 20 },
      ],
      ordered: 600,
      seams: { count: 1, sideFt: 20, buttFt: 0 },
    },
    {
      // Check value 2 — common practice, no published source (trade page example).
      name: '#2 rectangle 16 × 18, strips along the 16 ft side',
      outer: rectangle(16, 18),
      angleDeg: 0,
      pieces: [
        { widthFt: 15, lengthFt: 16 },
        { widthFt: 15, lengthFt: 16 },
      ],
      ordered: 480,
      seams: { count: 1, sideFt: 16, buttFt: 0 },
    },
    {
      // Check value 3 — common practice, no published source: 5 × (15 × 40) beats 3 × (15 × 70).
      name: '#3 rectangle 40 × 70, planner chooses',
      outer: rectangle(40, 70),
      angleDeg: undefined,
      pieces: Array.from({ length: 5 }, () => ({ widthFt: 15, lengthFt: 40 })),
      ordered: 3000,
      seams: { count: 4, sideFt: 160, buttFt: 0 },
    },
  ];
  for (const row of rows) {
    it(row.name, () => {
      const plan = planLayout({
        area: { outer: row.outer, holes: [] },
        roll: { widthFt: 15, maxLengthFt: 100 },
        grain: row.angleDeg === undefined ? undefined : { angleDeg: row.angleDeg },
      });
      expect(plan.pieces).toEqual(row.pieces);
      expect(plan.orderedSqFt).toBe(row.ordered);
      expect(plan.seams).toEqual(row.seams);
    });
  }

  it('#3 the long way buys 3 × (15 × 70) = 3,150 sq ft, excess 350', () => {
    // Check value 3 — common practice, no published source.
    const plan = planLayout({
      area: { outer: rectangle(40, 70) },
      roll: { widthFt: 15 },
      grain: { angleDeg: 90 },
    });
    expect(plan.orderedSqFt).toBe(3150);
    expect(plan.excessSqFt).toBe(350);
  });

  it('#2 net 288 sq ft, 192 sq ft excess', () => {
    // Check value 2 — common practice, no published source.
    const plan = planLayout({
      area: { outer: rectangle(16, 18) },
      roll: { widthFt: 15 },
      grain: { angleDeg: 0 },
    });
    expect(plan.areaSqFt).toBe(288);
    expect(plan.excessSqFt).toBe(192);
  });

  it('#4 one 20 ft × 15 ft piece is 300 sq ft = 33.33 sq yd', () => {
    // Check value 4 — common practice, no published source (sold by the rectangle cut); yd² by arithmetic.
    const plan = planLayout({
      area: { outer: rectangle(15, 20) },
      roll: { widthFt: 15 },
      grain: { angleDeg: 90 },
    });
    expect(plan.pieces).toEqual([{ widthFt: 15, lengthFt: 20 }]);
    expect(plan.orderedSqFt).toBe(300);
    expect(Math.round((plan.orderedSqFt / 9) * 100) / 100).toBe(33.33);
  });

  it('matches the contract example cut for cut', () => {
    const plan = planLayout({
      area: { outer: rectangle(30, 20), holes: [] },
      roll: { widthFt: 15, maxLengthFt: 100 },
      grain: { angleDeg: 90 },
      lengthStepFt: 1,
    });
    expect(
      plan.cuts.map(({ piece, alongFt, acrossFt, corners }) => ({
        piece,
        alongFt,
        acrossFt,
        corners,
      })),
    ).toEqual([
      {
        piece: 0,
        alongFt: 20,
        acrossFt: 15,
        corners: [
          [0, 0],
          [15, 0],
          [15, 20],
          [0, 20],
        ],
      },
      {
        piece: 1,
        alongFt: 20,
        acrossFt: 15,
        corners: [
          [15, 0],
          [30, 0],
          [30, 20],
          [15, 20],
        ],
      },
    ]);
    expect(plan.seamLines).toEqual([{ kind: 'side', from: [15, 0], to: [15, 20], lengthFt: 20 }]);
  });
});

describe('planLayout — the bean (common practice, no published source)', () => {
  const bean = { area: { outer: beanYard() }, roll: { widthFt: 15, maxLengthFt: 100 } };

  it('along the 27 ft length the usual strips buy about 600 sq ft (15 × 27 + 15 × 13)', () => {
    const plan = planLayout({ ...bean, grain: { angleDeg: 0 } });
    expect(plan.simpleStripOrderedSqFt).toBeGreaterThanOrEqual(585);
    expect(plan.simpleStripOrderedSqFt).toBeLessThanOrEqual(615);
    expect(plan.orderedSqFt).toBeLessThanOrEqual(plan.simpleStripOrderedSqFt);
  });

  it('across it two pieces of 15 ft width do, about 540 sq ft or less', () => {
    const plan = planLayout({ ...bean, grain: { angleDeg: 90 } });
    expect(plan.pieces).toHaveLength(2);
    expect(plan.orderedSqFt).toBeLessThanOrEqual(540);
    expect(plan.seams.sideFt).toBeGreaterThan(0);
  });

  it('left free, the planner runs the roll across the bean and buys ≤ 540 sq ft', () => {
    const plan = planLayout(bean);
    expect(plan.grainSource).toBe('planner');
    expect(plan.orderedSqFt).toBeLessThanOrEqual(540);
    expect(directionGap(plan.grainAngleDeg, 90)).toBeLessThanOrEqual(20);
  });
});

describe('planLayout — shapes', () => {
  it('a run longer than the roll length is joined with a butt seam', () => {
    const plan = planLayout({
      area: { outer: rectangle(15, 130) },
      roll: { widthFt: 15, maxLengthFt: 100 },
      grain: { angleDeg: 90 },
    });
    expect(plan.pieces).toEqual([
      { widthFt: 15, lengthFt: 100 },
      { widthFt: 15, lengthFt: 30 },
    ]);
    expect(plan.seams).toEqual({ count: 1, sideFt: 0, buttFt: 15 });
    expect(plan.seamLines[0]).toMatchObject({ kind: 'butt', from: [0, 100], to: [15, 100] });
  });

  it('a U whose arms fall in one strip gets one cut per arm', () => {
    const outer: Point[] = [
      [0, 0],
      [30, 0],
      [30, 30],
      [20, 30],
      [20, 10],
      [10, 10],
      [10, 30],
      [0, 30],
    ];
    const plan = planLayout({ area: { outer }, roll: { widthFt: 15 }, grain: { angleDeg: 0 } });
    expect(plan.cuts.length).toBeGreaterThanOrEqual(3);
    for (const cut of plan.cuts) expect(directionGap(cutAlongDirection(cut), 0)).toBeLessThan(1e-9);
  });

  it('offcut reuse: narrow cuts share a piece and buy less than the simple strips', () => {
    const circle = Array.from({ length: 64 }, (_, i): Point => [
      20 * Math.cos((i * Math.PI) / 32),
      20 * Math.sin((i * Math.PI) / 32),
    ]);
    const plan = planLayout({
      area: { outer: circle },
      roll: { widthFt: 15 },
      grain: { angleDeg: 0 },
    });
    expect(plan.offcutReuse).toBe(true);
    expect(plan.orderedSqFt).toBeLessThan(plan.simpleStripOrderedSqFt);
    expect(plan.pieces.length).toBeLessThan(plan.cuts.length);
  });

  it('a walkway seam is moved off the path when the same turf allows it', () => {
    // 45 × 20: seams at 15 and 30 would run inside the path at x = 15; strips offset by
    // 2.5 ft buy the same 900 sq ft (the 2.5 and 12.5 ft cuts share a piece) and miss it.
    const plan = planLayout({
      area: { outer: rectangle(45, 20) },
      roll: { widthFt: 15 },
      grain: { angleDeg: 90 },
      trafficPaths: [
        {
          points: [
            [15, 0],
            [15, 20],
          ],
          widthFt: 3,
        },
      ],
    });
    expect(plan.orderedSqFt).toBe(900);
    expect(plan.trafficSeamCrossings).toEqual([]);
    expect(plan.seamLines.every((seam) => Math.abs(seam.from[0] - 15) > 1.5)).toBe(true);
  });

  it('a planter hole is left out of the area and stays covered around', () => {
    const plan = planLayout({
      area: {
        outer: rectangle(40, 30),
        holes: [
          [
            [14, 10],
            [24, 10],
            [24, 17],
            [14, 17],
          ],
        ],
      },
      roll: { widthFt: 15 },
      grain: { angleDeg: 0 },
    });
    expect(plan.areaSqFt).toBe(1130);
    expect(plan.perimeterFt).toBe(140 + 34);
    for (const point of [
      [1, 1],
      [39, 29],
      [20, 5],
      [20, 20],
    ] as Point[]) {
      expect(plan.cuts.some((cut) => isInCut(point, cut))).toBe(true);
    }
  });

  it('reports perimeter by edge tag, untagged as unknown', () => {
    const plan = planLayout({
      area: { outer: rectangle(30, 20) },
      roll: { widthFt: 15 },
      grain: { angleDeg: 90 },
      edges: ['hard', 'bed', 'house', null],
    });
    expect(plan.perimeterByTagFt).toEqual({ hard: 30, bed: 20, house: 30, unknown: 20 });
  });

  it('keeps side seams out of a walkway when that costs no turf, and reports crossings', () => {
    // 30 × 20 with a north–south path at x = 15: the seam at x = 15 would run inside it.
    const request = {
      area: { outer: rectangle(45, 20) },
      roll: { widthFt: 15 },
      grain: { angleDeg: 90 },
      trafficPaths: [
        {
          points: [
            [15, 0],
            [15, 20],
          ] as Point[],
          widthFt: 3,
        },
      ],
    };
    const plan = planLayout(request);
    expect(plan.orderedSqFt).toBe(900);
    expect(plan.trafficSeamCrossings).toEqual([]);
    const across = planLayout({
      ...request,
      trafficPaths: [
        [
          [0, 10],
          [45, 10],
        ],
      ],
    });
    expect(across.trafficSeamCrossings.length).toBe(across.seams.count);
    expect(across.trafficSeamCrossings[0]?.lengthFt).toBeCloseTo(3, 6);
  });

  it('writes a cut sheet with places in words and a grain arrow', () => {
    const plan = planLayout({
      area: { outer: rectangle(30, 20) },
      roll: { widthFt: 15 },
      grain: { angleDeg: 90 },
    });
    expect(plan.cutSheet[0]).toMatchObject({
      piece: 0,
      lengthFt: 20,
      widthFt: 15,
      grainArrow: { angleDeg: 90, bearingDeg: 0, compass: 'N' },
      cuts: [
        {
          cut: 0,
          acrossFromFt: 0,
          acrossToFt: 15,
          goes: 'west, 0–15 ft from the west edge',
          position: 'west',
          fromEdge: 'west',
          fromEdgeStartFt: 0,
          fromEdgeEndFt: 15,
        },
      ],
    });
  });

  it('is deterministic', () => {
    const request = { area: { outer: beanYard() }, roll: { widthFt: 12 } };
    expect(JSON.stringify(planLayout(request))).toBe(JSON.stringify(planLayout(request)));
  });

  it('throws LayoutInputError on bad geometry', () => {
    const bowtie: Point[] = [
      [0, 0],
      [10, 10],
      [10, 0],
      [0, 10],
    ];
    expect(() => planLayout({ area: { outer: bowtie }, roll: { widthFt: 15 } })).toThrow(
      LayoutInputError,
    );
  });
});
