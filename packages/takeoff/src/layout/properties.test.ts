import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isPointInArea } from '../geometry/ring.js';
import { scanBands } from './band-scan.js';
import { clipParts } from './clip-parts.js';
import { boundaryLines } from './evaluate-offset.js';
import { toFramePolygon } from './frame-polygon.js';
import { planLayout } from './plan-layout.js';
import {
  cutAlongDirection,
  cutsOverlapOnPiece,
  directionGap,
  isInCut,
  piecesSqFt,
} from './test-helpers.js';
import type { LayoutPlan, LayoutRequestInput, Point } from './types.js';

/** A star-shaped polygon (always simple), sometimes with a small hole around its centre. */
const starYard = fc
  .record({
    sides: fc.integer({ min: 5, max: 12 }),
    jitter: fc.array(fc.double({ min: -0.3, max: 0.3, noNaN: true }), {
      minLength: 12,
      maxLength: 12,
    }),
    radii: fc.array(fc.double({ min: 6, max: 30, noNaN: true }), { minLength: 12, maxLength: 12 }),
    centre: fc.tuple(fc.integer({ min: -50, max: 50 }), fc.integer({ min: -50, max: 50 })),
    withHole: fc.boolean(),
  })
  .map(({ sides, jitter, radii, centre, withHole }) => {
    const outer = Array.from({ length: sides }, (_, i): Point => {
      const t = ((i + (jitter[i] ?? 0)) * 2 * Math.PI) / sides;
      const r = radii[i] ?? 10;
      return [centre[0] + r * Math.cos(t), centre[1] + r * Math.sin(t)];
    });
    const holeRadius = 0.3 * Math.min(...radii.slice(0, sides)) * Math.cos(Math.PI / sides);
    const hole: Point[] = [0, 1, 2, 3].map((k) => [
      centre[0] + holeRadius * Math.cos((k * Math.PI) / 2 + 0.3),
      centre[1] + holeRadius * Math.sin((k * Math.PI) / 2 + 0.3),
    ]);
    return { outer, holes: withHole ? [hole] : [] };
  });

/** An orthogonal "skyline" polygon on whole feet: columns of random heights (L, U, steps). */
const skylineYard = fc
  .array(
    fc.record({ width: fc.integer({ min: 2, max: 14 }), height: fc.integer({ min: 2, max: 30 }) }),
    {
      minLength: 1,
      maxLength: 6,
    },
  )
  .map((columns) => {
    const top: Point[] = [];
    let x = 0;
    for (const column of columns) {
      top.push([x, column.height], [x + column.width, column.height]);
      x += column.width;
    }
    const outer: Point[] = [[0, 0], [x, 0], ...top.reverse()];
    return { outer, holes: [] as Point[][] };
  });

const yard = fc.oneof(starYard, skylineYard);
const roll = fc.record({
  widthFt: fc.constantFrom(6, 12, 15),
  maxLengthFt: fc.constantFrom(20, 100),
  lengthStepFt: fc.constantFrom(0.5, 1),
});

function samplePoints(outer: Point[], holes: Point[][]): Point[] {
  const xs = outer.map((p) => p[0]);
  const ys = outer.map((p) => p[1]);
  const [minX, maxX, minY, maxY] = [
    Math.min(...xs),
    Math.max(...xs),
    Math.min(...ys),
    Math.max(...ys),
  ];
  const points: Point[] = [];
  for (let i = 0; i < 23; i += 1) {
    for (let j = 0; j < 23; j += 1) {
      const point: Point = [
        minX + ((i + 0.5) / 23) * (maxX - minX),
        minY + ((j + 0.5) / 23) * (maxY - minY),
      ];
      if (isPointInArea(point, outer, holes)) points.push(point);
    }
  }
  return points;
}

function checkPlan(
  plan: LayoutPlan,
  request: LayoutRequestInput & { lengthStepFt: number; roll: { maxLengthFt: number } },
): void {
  const outer = request.area.outer as Point[];
  const holes = (request.area.holes ?? []) as Point[][];
  for (const point of samplePoints(outer, holes))
    expect(plan.cuts.some((cut) => isInCut(point, cut))).toBe(true);
  for (const cut of plan.cuts) {
    // Corners are rounded to 1/10000 ft, so a short cut may turn by a few thousandths of a degree.
    expect(directionGap(cutAlongDirection(cut), plan.grainAngleDeg)).toBeLessThan(0.02);
    const piece = plan.pieces[cut.piece]!;
    expect(cut.acrossOffsetFt + cut.acrossFt).toBeLessThanOrEqual(piece.widthFt + 2e-4);
    expect(cut.alongOffsetFt + cut.alongFt).toBeLessThanOrEqual(piece.lengthFt + 2e-4);
  }
  plan.cuts.forEach((a, i) =>
    plan.cuts.slice(i + 1).forEach((b) => {
      if (a.piece === b.piece) expect(cutsOverlapOnPiece(a, b)).toBe(false);
    }),
  );
  for (const piece of plan.pieces) {
    expect(piece.widthFt).toBe(request.roll.widthFt);
    expect(piece.lengthFt).toBeLessThanOrEqual(request.roll.maxLengthFt);
    const steps = piece.lengthFt / request.lengthStepFt;
    expect(Math.abs(steps - Math.round(steps))).toBeLessThan(1e-6);
  }
  expect(plan.orderedSqFt).toBeCloseTo(piecesSqFt(plan), 6);
  expect(plan.orderedSqFt).toBeGreaterThanOrEqual(plan.areaSqFt - 0.01);
  expect(plan.orderedSqFt).toBeLessThanOrEqual(plan.simpleStripOrderedSqFt);
}

describe('layout properties (fast-check)', () => {
  it('given a grain: cuts cover the area, run the grain, fit their pieces; never worse than simple strips', () => {
    fc.assert(
      fc.property(yard, roll, fc.integer({ min: 0, max: 359 }), (area, rollSpec, angleDeg) => {
        const request = {
          area,
          roll: { widthFt: rollSpec.widthFt, maxLengthFt: rollSpec.maxLengthFt },
          lengthStepFt: rollSpec.lengthStepFt,
          grain: { angleDeg },
        };
        const plan = planLayout(request);
        checkPlan(plan, request);
        // The usual practice: strips started at the edge where the across coordinate is least.
        expect(JSON.stringify(planLayout(request))).toBe(JSON.stringify(plan));
      }),
      { numRuns: 40, seed: 20241 },
    );
  });

  it('free direction: no whole degree does better, and the result is deterministic', () => {
    fc.assert(
      fc.property(yard, (area) => {
        const request = { area, roll: { widthFt: 15, maxLengthFt: 100 }, lengthStepFt: 1 };
        const plan = planLayout(request);
        checkPlan(plan, request);
        for (const angleDeg of [0, 30, 45, 60, 90, 135]) {
          const fixed = planLayout({ ...request, grain: { angleDeg } });
          expect(plan.orderedSqFt).toBeLessThanOrEqual(fixed.orderedSqFt);
        }
        expect(JSON.stringify(planLayout(request))).toBe(JSON.stringify(plan));
      }),
      { numRuns: 8, seed: 7 },
    );
  });

  it('the fast band scan finds the same parts as polygon clipping', () => {
    fc.assert(
      fc.property(
        yard,
        fc.double({ min: 0, max: 180, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.boolean(),
        (area, angle, fraction, alignToVertex) => {
          const polygon = toFramePolygon(angle, area.outer, area.holes);
          const widthFt = 7;
          const offset = alignToVertex
            ? (polygon.u[Math.floor(fraction * (polygon.u.length - 1))] as number)
            : polygon.uMin + fraction * widthFt;
          const lines = boundaryLines(polygon, widthFt, offset);
          const fast = scanBands(polygon, lines).parts;
          const clipped = clipParts(polygon, lines);
          expect(fast.length).toBe(clipped.length);
          fast.forEach((part, i) => {
            const other = clipped[i]!;
            expect(part.band).toBe(other.band);
            for (const key of ['uMin', 'uMax', 'vMin', 'vMax'] as const)
              expect(Math.abs(part[key] - other[key])).toBeLessThan(1e-6);
          });
        },
      ),
      { numRuns: 150, seed: 99 },
    );
  });
});
