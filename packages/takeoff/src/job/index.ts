// Public surface of the job planner (several areas, shared offcuts, remnants, roll widths).
export { planJob } from './plan-job.js';
export { parseJobRequest } from './parse-job-request.js';
export {
  checkJobRequestSize,
  MAX_JOB_AREAS,
  MAX_JOB_REMNANTS,
  MAX_JOB_ROLLS,
} from './job-limits.js';
export { FACING_DEGREES } from './grain-facing.js';
export type {
  CompassFacing,
  JobAlternative,
  JobArea,
  JobAreaPlan,
  JobCost,
  JobCosts,
  JobCut,
  JobCutSheetCut,
  JobCutSheetEntry,
  JobGrain,
  JobPiece,
  JobPlan,
  JobRemnant,
  JobRequest,
  JobRoll,
  RollChoice,
  SeamTotals,
} from './types.js';
export { sampleJobs } from './sample-jobs.js';
export type { SampleJob } from './sample-jobs.js';
