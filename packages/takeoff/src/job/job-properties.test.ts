import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isPointInArea } from '../geometry/ring.js';
import { planLayout } from '../layout/plan-layout.js';
import { isInCut } from '../layout/test-helpers.js';
import type { LayoutCut, Point } from '../layout/types.js';
import { FACING_DEGREES } from './grain-facing.js';
import { cutGrainDirection, newSqFt, packingProblems, turnGap } from './job-test-helpers.js';
import { parseJobRequest } from './parse-job-request.js';
import { planJob } from './plan-job.js';
import type { JobPlan } from './types.js';

type Json = Record<string, unknown>;

/** A star-shaped polygon (always simple) of 5–10 vertices around the origin. */
const star = fc
  .record({
    sides: fc.integer({ min: 5, max: 10 }),
    radii: fc.array(fc.double({ min: 5, max: 22, noNaN: true }), { minLength: 10, maxLength: 10 }),
  })
  .map(({ sides, radii }) =>
    Array.from({ length: sides }, (_, i): Point => {
      const t = (i * 2 * Math.PI) / sides;
      return [(radii[i] ?? 10) * Math.cos(t), (radii[i] ?? 10) * Math.sin(t)];
    }),
  );

/** An orthogonal "skyline" polygon on whole feet (L, U, steps). */
const skyline = fc
  .array(fc.record({ w: fc.integer({ min: 2, max: 12 }), h: fc.integer({ min: 2, max: 25 }) }), {
    minLength: 1,
    maxLength: 4,
  })
  .map((columns) => {
    const top: Point[] = [];
    let x = 0;
    for (const { w, h } of columns) {
      top.push([x, h], [x + w, h]);
      x += w;
    }
    return [[0, 0], [x, 0], ...top.reverse()] as Point[];
  });

const facing = fc.constantFrom(...(Object.keys(FACING_DEGREES) as (keyof typeof FACING_DEGREES)[]));
const grain = fc.oneof(
  fc.constant(undefined),
  fc.integer({ min: 0, max: 359 }).map((angleDeg) => ({ angleDeg })),
  fc
    .record({ facing, toleranceDeg: fc.constantFrom(0, 5, 30, 100) })
    .map((g) => ({ facing: g.facing, toleranceDeg: g.toleranceDeg })),
);

const jobArb = fc.record({
  shapes: fc.array(fc.record({ outer: fc.oneof(star, skyline), grain }), {
    minLength: 1,
    maxLength: 4,
  }),
  rolls: fc.subarray([6, 12, 15], { minLength: 1 }),
  maxLengthFt: fc.constantFrom(20, 100),
  lengthStepFt: fc.constantFrom(0.5, 1),
  remnants: fc.array(
    fc.record({
      widthFt: fc.integer({ min: 3, max: 15 }),
      lengthFt: fc.integer({ min: 3, max: 40 }),
    }),
    { maxLength: 5 },
  ),
  costs: fc.option(
    fc.record({
      turfCentsPerSqFt: fc.integer({ min: 100, max: 500 }),
      sideSeamCentsPerFt: fc.integer({ min: 0, max: 3000 }),
      buttSeamCentsPerFt: fc.integer({ min: 0, max: 3000 }),
    }),
    { nil: undefined },
  ),
});

type JobSpec = typeof jobArb extends fc.Arbitrary<infer T> ? T : never;

/** The job as JSON: areas 100 ft apart along x, so none overlaps another. */
function jobJson(spec: JobSpec, withRemnants = true): Json {
  return {
    areas: spec.shapes.map((shape, i) => ({
      id: `area-${i}`,
      area: { outer: shape.outer.map(([x, y]): Point => [x + 100 * i, y]), holes: [] },
      ...(shape.grain ? { grain: shape.grain } : {}),
    })),
    rolls: spec.rolls.map((widthFt) => ({ widthFt, maxLengthFt: spec.maxLengthFt })),
    lengthStepFt: spec.lengthStepFt,
    remnants: withRemnants ? spec.remnants.map((r, i) => ({ id: `R-${i}`, ...r })) : [],
    ...(spec.costs ? { costs: spec.costs } : {}),
  };
}

function samplePoints(outer: Point[]): Point[] {
  const xs = outer.map((p) => p[0]);
  const ys = outer.map((p) => p[1]);
  const [minX, maxX, minY, maxY] = [
    Math.min(...xs),
    Math.max(...xs),
    Math.min(...ys),
    Math.max(...ys),
  ];
  const points: Point[] = [];
  for (let i = 0; i < 15; i += 1)
    for (let j = 0; j < 15; j += 1) {
      const point: Point = [
        minX + ((i + 0.5) / 15) * (maxX - minX),
        minY + ((j + 0.5) / 15) * (maxY - minY),
      ];
      if (isPointInArea(point, outer, [])) points.push(point);
    }
  return points;
}

/** The job's ranking figure: installed cents with costs, else sq ft of new turf. */
function score(
  plan: { orderedSqFt: number; seams: { sideFt: number; buttFt: number } },
  spec: JobSpec,
): number {
  const c = spec.costs;
  if (!c) return plan.orderedSqFt;
  return (
    plan.orderedSqFt * c.turfCentsPerSqFt +
    plan.seams.sideFt * c.sideSeamCentsPerFt +
    plan.seams.buttFt * c.buttSeamCentsPerFt
  );
}

/** Each area planned alone by the single-area planner, best roll per area, summed. */
function aloneScore(json: Json, spec: JobSpec): number {
  const areas = json.areas as {
    area: { outer: Point[] };
    grain?: { angleDeg?: number; facing?: keyof typeof FACING_DEGREES };
  }[];
  return areas.reduce((sum, area) => {
    const angle = area.grain?.facing ? FACING_DEGREES[area.grain.facing] : area.grain?.angleDeg;
    const best = Math.min(
      ...spec.rolls.map((widthFt) =>
        score(
          planLayout({
            area: area.area,
            roll: { widthFt, maxLengthFt: spec.maxLengthFt },
            lengthStepFt: spec.lengthStepFt,
            ...(angle !== undefined ? { grain: { angleDeg: angle } } : {}),
          }),
          spec,
        ),
      ),
    );
    return sum + best;
  }, 0);
}

function checkPlan(plan: JobPlan, json: Json, spec: JobSpec): void {
  const areas = json.areas as {
    area: { outer: Point[] };
    grain?: { angleDeg?: number; facing?: keyof typeof FACING_DEGREES; toleranceDeg?: number };
  }[];
  expect(packingProblems(plan)).toEqual([]);
  expect(plan.orderedSqFt).toBeCloseTo(newSqFt(plan), 1);
  plan.areas.forEach((areaPlan, i) => {
    const request = areas[i]!;
    const cuts = areaPlan.cuts as unknown as LayoutCut[]; // same corner shape as single-area cuts
    for (const point of samplePoints(request.area.outer))
      expect(cuts.some((cut) => isInCut(point, cut))).toBe(true);
    const g = request.grain;
    if (g?.angleDeg !== undefined)
      expect(turnGap(areaPlan.grainAngleDeg, g.angleDeg)).toBeLessThan(1e-6);
    if (g?.facing)
      expect(turnGap(areaPlan.grainAngleDeg, FACING_DEGREES[g.facing])).toBeLessThanOrEqual(
        (g.toleranceDeg ?? 0) + 1e-6,
      );
    for (const cut of areaPlan.cuts) {
      // Corners are rounded to 1/10000 ft, so a short cut may turn by a few thousandths of a degree.
      const along =
        g === undefined
          ? Math.min(
              turnGap(cutGrainDirection(cut), areaPlan.grainAngleDeg),
              turnGap(cutGrainDirection(cut), areaPlan.grainAngleDeg + 180),
            )
          : turnGap(cutGrainDirection(cut), areaPlan.grainAngleDeg);
      expect(along).toBeLessThan(0.02);
    }
  });
  for (const piece of plan.pieces) {
    if (piece.source === 'new') {
      expect(spec.rolls).toContain(piece.widthFt);
      expect(piece.lengthFt).toBeLessThanOrEqual(spec.maxLengthFt + 1e-9);
      const steps = piece.lengthFt / spec.lengthStepFt;
      expect(Math.abs(steps - Math.round(steps))).toBeLessThan(1e-6);
    } else {
      const remnant = (json.remnants as { id: string; widthFt: number; lengthFt: number }[]).find(
        (r) => r.id === piece.remnantId,
      );
      expect(remnant).toMatchObject({ widthFt: piece.widthFt, lengthFt: piece.lengthFt });
    }
  }
  if (spec.costs) expect(plan.cost).toBeDefined();
}

describe('job planner properties (fast-check)', () => {
  it('covers every area along its grain, packs cuts guillotine, never worse than alone or without remnants, deterministic', () => {
    fc.assert(
      fc.property(jobArb, (spec) => {
        const json = jobJson(spec);
        const plan = planJob(parseJobRequest(json));
        checkPlan(plan, json, spec);
        const tolerance = 1e-6 * Math.max(1, score(plan, spec));
        expect(score(plan, spec)).toBeLessThanOrEqual(aloneScore(json, spec) + tolerance);
        const without = planJob(parseJobRequest(jobJson(spec, false)));
        checkPlan(without, jobJson(spec, false), spec);
        expect(score(plan, spec)).toBeLessThanOrEqual(score(without, spec) + tolerance);
        expect(JSON.stringify(planJob(parseJobRequest(json)))).toBe(JSON.stringify(plan));
      }),
      { numRuns: 15, seed: 8080 },
    );
  }, 120_000);
});
