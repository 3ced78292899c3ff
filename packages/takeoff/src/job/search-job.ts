import type { AreaCandidate } from './area-candidates.js';
import type { JobEvaluation, JobEvaluator } from './evaluate-job.js';
import { compareFigures } from './job-rank.js';
import type { JobCosts } from './types.js';

/** Jobs with at most this many layout choices are searched exhaustively. */
const EXHAUSTIVE_CHOICES = 64;
/** Passes of the one-area-at-a-time search before it stops (it usually settles in two). */
const MAX_PASSES = 6;
/** Most choices one search packs before it stops improving (bounds big jobs; deterministic). */
const MAX_EVALUATIONS = 160;

function better(a: JobEvaluation, b: JobEvaluation, costs: JobCosts | undefined): boolean {
  const order = compareFigures(a.figures, b.figures, costs);
  // At equal figures, prefer areas whose cuts come from pieces of the width they are laid out for.
  return order < 0 || (order === 0 && a.mismatched < b.mismatched);
}

function exhaustive(
  lists: readonly (readonly AreaCandidate[])[],
  evaluator: JobEvaluator,
  costs: JobCosts | undefined,
): JobEvaluation {
  const choice = lists.map(() => 0);
  let best = evaluator.evaluate(choice);
  for (;;) {
    // Odometer over the choices, first area fastest; all zeros (areas alone) comes first.
    let area = 0;
    while (area < lists.length) {
      choice[area] = (choice[area] as number) + 1;
      if ((choice[area] as number) < (lists[area]?.length ?? 0)) break;
      choice[area] = 0;
      area += 1;
    }
    if (area === lists.length) return best;
    const next = evaluator.evaluate(choice);
    if (better(next, best, costs)) best = next;
  }
}

function descend(
  lists: readonly (readonly AreaCandidate[])[],
  evaluator: JobEvaluator,
  costs: JobCosts | undefined,
  start: readonly number[],
): JobEvaluation {
  let best = evaluator.evaluate(start);
  const budget = evaluator.evaluated + MAX_EVALUATIONS;
  for (let pass = 0; pass < MAX_PASSES; pass += 1) {
    const before = best;
    lists.forEach((list, area) => {
      const base = best.choice;
      list.forEach((_, option) => {
        if (option === base[area] || evaluator.evaluated >= budget) return;
        const next = evaluator.evaluate(base.map((c, a) => (a === area ? option : c)));
        if (better(next, best, costs)) best = next;
      });
    });
    if (best === before || evaluator.evaluated >= budget) break;
  }
  return best;
}

/** How many layout choices a job has (the product of each area's candidates). */
export function choiceCount(lists: readonly (readonly AreaCandidate[])[]): number {
  return lists.reduce((product, list) => product * list.length, 1);
}

/**
 * Picks one layout per area for the job. Small jobs try every choice; larger ones change one
 * area at a time from `start` (the areas alone, or the best without remnants) while that
 * helps, packing at most a fixed number of choices. Deterministic: ties keep the earlier choice.
 */
export function searchJob(
  lists: readonly (readonly AreaCandidate[])[],
  evaluator: JobEvaluator,
  costs: JobCosts | undefined,
  start: readonly number[],
): JobEvaluation {
  return choiceCount(lists) <= EXHAUSTIVE_CHOICES
    ? exhaustive(lists, evaluator, costs)
    : descend(lists, evaluator, costs, start);
}
