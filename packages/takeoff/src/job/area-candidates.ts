import { normalizeDegrees } from '../geometry/grain-frame.js';
import { planLayout } from '../layout/plan-layout.js';
import type { LayoutPlan, LayoutRequest } from '../layout/types.js';
import { directedWithin } from './grain-facing.js';
import { compareFigures } from './job-rank.js';
import type { Figures } from './job-rank.js';
import { screenRange } from './screen-range.js';
import type { JobArea, JobRequest } from './types.js';

/** Most layouts per area and roll width handed to the job search. */
const CANDIDATES_PER_ROLL = 4;

/** A cut to place in the job's pieces: width across the grain, length along it. */
export interface JobItem {
  readonly acrossFt: number;
  readonly alongFt: number;
}

/** One way to lay one area: a roll width and a direction, planned by the single-area planner. */
export interface AreaCandidate {
  readonly area: number;
  readonly rollIndex: number;
  readonly rollWidthFt: number;
  /** Grain as reported (0–360 for a facing, as requested for a fixed grain). */
  readonly grainAngleDeg: number;
  readonly plan: LayoutPlan;
  /** True when the grain runs opposite to the plan's cut corners (from 180° on). */
  readonly reversed: boolean;
  /** The area alone: the plan's own pieces. */
  readonly figures: Figures;
  readonly items: JobItem[];
}

function figuresOf(plan: LayoutPlan): Figures {
  const trafficSeamFt = plan.trafficSeamCrossings
    .filter((crossing) => crossing.kind === 'side')
    .reduce((sum, crossing) => sum + crossing.lengthFt, 0);
  return { orderedSqFt: plan.orderedSqFt, trafficSeamFt, seams: plan.seams };
}

function candidateOf(
  area: number,
  rollIndex: number,
  plan: LayoutPlan,
  grainAngleDeg: number,
): AreaCandidate {
  // The single-area planner lays cuts out for the direction modulo 180° (the strips are
  // the same both ways); a grain from 180° on runs the other way along them.
  const reversed = normalizeDegrees(grainAngleDeg) >= 180;
  return {
    area,
    rollIndex,
    rollWidthFt: plan.pieces[0]?.widthFt ?? 0,
    grainAngleDeg,
    plan,
    reversed,
    figures: figuresOf(plan),
    items: plan.cuts.map((cut) => ({ acrossFt: cut.acrossFt, alongFt: cut.alongFt })),
  };
}

function fixed(request: LayoutRequest, angleDeg: number): LayoutPlan {
  return planLayout({ ...request, grain: { angleDeg } });
}

/** Layouts for one area and one roll width, the area-alone best first. */
function layoutsFor(area: JobArea, request: LayoutRequest): { plan: LayoutPlan; angle: number }[] {
  const { grain } = area;
  if (grain.kind === 'angle') {
    const plan = fixed(request, grain.angleDeg);
    return [{ plan, angle: plan.grainAngleDeg }];
  }
  if (grain.kind === 'free' || grain.toleranceDeg >= 90) {
    // Every direction is allowed (one way or the other): the single-area search, with its
    // runners-up as further candidates; a facing picks the end of the arrow in its range.
    const best = planLayout(request);
    const directed = (angle: number): number | null =>
      grain.kind === 'free' ? angle : directedWithin(angle, grain.centreDeg, grain.toleranceDeg);
    const found: { plan: LayoutPlan; angle: number }[] = [];
    const bestAngle = directed(best.grainAngleDeg);
    if (bestAngle !== null) found.push({ plan: best, angle: bestAngle });
    // A facing also tries itself, so the range never plans worse than the facing alone.
    if (grain.kind === 'facing')
      found.push({ plan: fixed(request, grain.centreDeg), angle: grain.centreDeg });
    for (const other of best.alternatives) {
      const angle = directed(other.grainAngleDeg);
      if (angle !== null) found.push({ plan: fixed(request, angle), angle });
    }
    return found;
  }
  return screenRange(request, grain.centreDeg, grain.toleranceDeg, CANDIDATES_PER_ROLL).map(
    (angle) => {
      const plan = fixed(request, angle);
      return { plan, angle };
    },
  );
}

/**
 * Candidate layouts per area: for every roll width, the best direction within the grain
 * constraint and a few runners-up, each planned alone by the single-area planner. Each list
 * is sorted best alone first (ties keep the order found), so `[0]` is the area-alone plan.
 */
export function areaCandidates(job: JobRequest): AreaCandidate[][] {
  return job.areas.map((area, areaIndex) => {
    const found: AreaCandidate[] = [];
    job.rolls.forEach((roll, rollIndex) => {
      const request: LayoutRequest = { ...area.request, roll, grain: undefined };
      const layouts = layoutsFor(area, request).slice(0, CANDIDATES_PER_ROLL);
      for (const { plan, angle } of layouts) {
        const candidate = candidateOf(areaIndex, rollIndex, plan, angle);
        const same = found.some(
          (other) => other.rollIndex === rollIndex && other.grainAngleDeg === angle,
        );
        if (!same) found.push(candidate);
      }
    });
    return stableSort(found, (a, b) => compareFigures(a.figures, b.figures, job.costs));
  });
}

function stableSort<T>(list: T[], compare: (a: T, b: T) => number): T[] {
  return list
    .map((item, order) => ({ item, order }))
    .sort((a, b) => compare(a.item, b.item) || a.order - b.order)
    .map(({ item }) => item);
}
