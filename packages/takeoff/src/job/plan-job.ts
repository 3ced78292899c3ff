import { areaCandidates } from './area-candidates.js';
import { jobAlternatives, rollChoices } from './alternatives.js';
import { assemblePlan } from './assemble-plan.js';
import { JobEvaluator } from './evaluate-job.js';
import type { PackStock } from './pack-job.js';
import { searchJob } from './search-job.js';
import type { JobPlan, JobRequest } from './types.js';

/**
 * Plans the turf for a whole job: per area a roll width and a direction within its grain
 * constraint (each area laid out by the single-area planner), then the cuts of all areas
 * packed together into remnants first and new pieces — offcuts of one area's pieces serve
 * cuts of another, never turned. Ranked by installed cost when `costs` is given, else by
 * least turf, then fewer seam feet in walkways, then fewer seams. Never orders more than
 * the areas planned one by one, nor more than without the remnants. Pure and deterministic.
 * Takes a request validated by {@link parseJobRequest}.
 */
export function planJob(job: JobRequest): JobPlan {
  const lists = areaCandidates(job);
  const alone = lists.map(() => 0);
  const stock: PackStock = { rolls: job.rolls, remnants: job.remnants };
  const plain = new JobEvaluator(lists, stock);
  let evaluator = plain;
  let best = searchJob(lists, plain, job.costs, alone);
  if (job.remnants.length > 0) {
    // Starting from the best plan without remnants keeps the result at least as good.
    evaluator = new JobEvaluator(lists, stock, plain);
    best = searchJob(lists, evaluator, job.costs, best.choice);
  }
  const alternatives = jobAlternatives(lists, evaluator, job);
  return assemblePlan(
    job,
    best,
    (area) => rollChoices(area, best, lists, evaluator, job.costs),
    alternatives,
  );
}
