import type { AreaCandidate } from './area-candidates.js';
import { alonePacking } from './evaluate-job.js';
import type { JobEvaluation, JobEvaluator } from './evaluate-job.js';
import { compareFigures, compareSeamsFirst, compareTurfOnly, costOf } from './job-rank.js';
import type { Figures } from './job-rank.js';
import { roundFt, roundSqFt } from '../layout/rounding.js';
import type { JobAlternative, JobCosts, JobRequest, RollChoice, SeamTotals } from './types.js';

function roundSeams(seams: SeamTotals): SeamTotals {
  return { count: seams.count, sideFt: roundFt(seams.sideFt), buttFt: roundFt(seams.buttFt) };
}

function alternativeOf(
  kind: JobAlternative['kind'],
  figures: Figures,
  candidates: readonly AreaCandidate[],
  job: JobRequest,
): JobAlternative {
  return {
    kind,
    orderedSqFt: roundSqFt(figures.orderedSqFt),
    seams: roundSeams(figures.seams),
    ...(job.costs ? { cost: costOf(figures, job.costs) } : {}),
    areas: candidates.map((candidate, i) => ({
      id: job.areas[i]?.id ?? String(i),
      rollWidthFt: candidate.rollWidthFt,
      grainAngleDeg: candidate.grainAngleDeg,
    })),
  };
}

function bestBy(
  evaluations: readonly JobEvaluation[],
  compare: (a: Figures, b: Figures) => number,
): JobEvaluation {
  return evaluations.reduce((best, next) =>
    compare(next.figures, best.figures) < 0 ? next : best,
  );
}

/**
 * The trade-off between turf, seams and cost: the least-turf and fewest-seam choices the
 * search saw (the fewest-seam choice per area is packed for the purpose), the cheapest
 * installed when costs are given, and the areas planned one by one.
 */
export function jobAlternatives(
  lists: readonly (readonly AreaCandidate[])[],
  evaluator: JobEvaluator,
  job: JobRequest,
): JobAlternative[] {
  const fewestSeams = lists.map((list) =>
    list.reduce(
      (best, candidate, i) =>
        compareSeamsFirst(candidate.figures, (list[best] as AreaCandidate).figures) < 0 ? i : best,
      0,
    ),
  );
  evaluator.evaluate(fewestSeams);
  const all = evaluator.all();
  const alone = lists.map((list) => list[0] as AreaCandidate);
  const aloneFigures: Figures = {
    ...evaluator.evaluate(alone.map(() => 0)).figures,
    orderedSqFt: alonePacking(alone).newSqFt,
  };
  const result = [
    ['least-turf', bestBy(all, compareTurfOnly)],
    ['fewest-seams', bestBy(all, compareSeamsFirst)],
  ] as [JobAlternative['kind'], JobEvaluation][];
  const costs = job.costs;
  if (costs)
    result.push(['cheapest-installed', bestBy(all, (a, b) => compareFigures(a, b, costs))]);
  return [
    ...result.map(([kind, evaluation]) =>
      alternativeOf(kind, evaluation.figures, evaluation.candidates, job),
    ),
    alternativeOf('areas-alone', aloneFigures, alone, job),
  ];
}

function signedMoney(cents: number): string {
  return `${cents < 0 ? '−' : '+'}$${(Math.abs(cents) / 100).toFixed(2)}`;
}

function signed(value: number, unit: string): string {
  const rounded = Math.round(value * 100) / 100;
  return `${rounded >= 0 ? '+' : '−'}${Math.abs(rounded)}${unit}`;
}

/**
 * Per area, every roll width offered: what the area orders alone with it, what the whole job
 * would order (and cost) with it there, and why it was or was not chosen.
 */
export function rollChoices(
  area: number,
  chosen: JobEvaluation,
  lists: readonly (readonly AreaCandidate[])[],
  evaluator: JobEvaluator,
  costs: JobCosts | undefined,
): RollChoice[] {
  const list = lists[area] ?? [];
  const mine = chosen.candidates[area] as AreaCandidate;
  const widths = list.map((c) => c.rollIndex).filter((r, i, all) => all.indexOf(r) === i);
  return widths.map((rollIndex): RollChoice => {
    const option =
      rollIndex === mine.rollIndex
        ? mine
        : (list.find((c) => c.rollIndex === rollIndex) as AreaCandidate);
    const index = list.indexOf(option);
    const evaluation = evaluator.evaluate(chosen.choice.map((c, a) => (a === area ? index : c)));
    const isChosen = option === mine;
    const jobCost = costs ? costOf(evaluation.figures, costs).totalCents : undefined;
    const chosenCost = costs ? costOf(chosen.figures, costs).totalCents : 0;
    const turf = evaluation.figures.orderedSqFt - chosen.figures.orderedSqFt;
    const seams = evaluation.figures.seams.count - chosen.figures.seams.count;
    const tie =
      Math.abs(turf) < 1e-6 && seams === 0 && (jobCost === undefined || jobCost === chosenCost);
    const why = isChosen
      ? `chosen: ${costs ? 'cheapest installed' : 'least turf'} for the job`
      : tie
        ? 'as good for the job; the width found first is kept'
        : `the job would order ${signed(turf, ' sq ft')}, ${signed(seams, ' seams')}` +
          (jobCost !== undefined ? `, installed ${signedMoney(jobCost - chosenCost)}` : '');
    return {
      rollWidthFt: option.rollWidthFt,
      grainAngleDeg: option.grainAngleDeg,
      aloneOrderedSqFt: option.plan.orderedSqFt,
      seams: option.plan.seams,
      chosen: isChosen,
      jobOrderedSqFt: roundSqFt(evaluation.figures.orderedSqFt),
      ...(jobCost !== undefined ? { jobCostCents: jobCost } : {}),
      why,
    };
  });
}
