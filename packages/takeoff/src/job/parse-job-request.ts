import { LayoutInputError } from '../layout/errors.js';
import { MAX_TOTAL_VERTICES } from '../layout/limits.js';
import { DEFAULT_MAX_LENGTH_FT, parseLayoutRequest } from '../layout/parse-request.js';
import {
  readNumber,
  readOptionalNumber,
  requireArray,
  requireRecord,
} from '../layout/read-fields.js';
import { readJobGrain } from './grain-facing.js';
import {
  MAX_JOB_AREAS,
  MAX_JOB_REMNANTS,
  MAX_JOB_ROLLS,
  checkJobRequestSize,
} from './job-limits.js';
import type { JobArea, JobCosts, JobRemnant, JobRequest, JobRoll } from './types.js';

function readRolls(value: unknown, lengthStepFt: number): JobRoll[] {
  const list = requireArray('rolls', value);
  if (list.length === 0) throw new LayoutInputError('rolls', 'needs at least one roll');
  if (list.length > MAX_JOB_ROLLS)
    throw new LayoutInputError('rolls', `must have at most ${MAX_JOB_ROLLS} rolls`);
  const rolls = list.map((item, i): JobRoll => {
    const roll = requireRecord(`rolls[${i}]`, item);
    const widthFt = readNumber(`rolls[${i}].widthFt`, roll.widthFt, { positive: true });
    const maxLengthFt =
      readOptionalNumber(`rolls[${i}].maxLengthFt`, roll.maxLengthFt, { positive: true }) ??
      DEFAULT_MAX_LENGTH_FT;
    if (maxLengthFt < lengthStepFt)
      throw new LayoutInputError(`rolls[${i}].maxLengthFt`, 'must be at least lengthStepFt');
    return { widthFt, maxLengthFt };
  });
  rolls.forEach((roll, i) => {
    if (rolls.findIndex((other) => other.widthFt === roll.widthFt) !== i)
      throw new LayoutInputError(`rolls[${i}].widthFt`, 'repeats the width of an earlier roll');
  });
  return rolls;
}

function readId(path: string, value: unknown, fallback: string): string {
  if (value === undefined || value === null) return fallback;
  if (typeof value === 'number' && Number.isFinite(value)) return String(value);
  if (typeof value !== 'string' || value.trim() === '')
    throw new LayoutInputError(path, 'must be a non-empty string');
  return value;
}

function readRemnants(value: unknown): JobRemnant[] {
  if (value === undefined || value === null) return [];
  const list = requireArray('remnants', value);
  if (list.length > MAX_JOB_REMNANTS)
    throw new LayoutInputError('remnants', `must have at most ${MAX_JOB_REMNANTS} remnants`);
  const remnants = list.map((item, i): JobRemnant => {
    const remnant = requireRecord(`remnants[${i}]`, item);
    return {
      id: readId(`remnants[${i}].id`, remnant.id, `remnant-${i + 1}`),
      widthFt: readNumber(`remnants[${i}].widthFt`, remnant.widthFt, { positive: true }),
      lengthFt: readNumber(`remnants[${i}].lengthFt`, remnant.lengthFt, { positive: true }),
    };
  });
  remnants.forEach((remnant, i) => {
    if (remnants.findIndex((other) => other.id === remnant.id) !== i)
      throw new LayoutInputError(`remnants[${i}].id`, `repeats the id "${remnant.id}"`);
  });
  return remnants;
}

function readCosts(value: unknown): JobCosts | undefined {
  if (value === undefined || value === null) return undefined;
  const costs = requireRecord('costs', value);
  const rate = (name: keyof JobCosts): number =>
    readOptionalNumber(`costs.${name}`, costs[name], { nonNegative: true }) ?? 0;
  return {
    turfCentsPerSqFt: rate('turfCentsPerSqFt'),
    sideSeamCentsPerFt: rate('sideSeamCentsPerFt'),
    buttSeamCentsPerFt: rate('buttSeamCentsPerFt'),
  };
}

/**
 * Where a single-area parser error lands in the job: area fields under `areas[i].`, the roll
 * under the roll it was checked with, the job-wide step as it is.
 */
function jobPath(path: string, areaIndex: number, rollIndex: number): string {
  if (path === 'request') return `areas[${areaIndex}]`;
  if (path === 'lengthStepFt') return path;
  if (path === 'roll' || path.startsWith('roll.'))
    return `rolls[${rollIndex}]${path.slice('roll'.length)}`;
  return `areas[${areaIndex}].${path}`;
}

/**
 * One area through the single-area parser (so every single-area rule and work limit applies
 * to each area too), with the narrowest roll: the strip-count limit is strictest there.
 */
function readArea(
  value: unknown,
  index: number,
  job: { rolls: JobRoll[]; lengthStepFt: number; trimAllowanceFt: number | undefined },
): JobArea {
  const record = requireRecord(`areas[${index}]`, value);
  const grain = readJobGrain(`areas[${index}].grain`, record.grain);
  const narrowest = job.rolls.reduce(
    (best, roll, i) => (roll.widthFt < (job.rolls[best] as JobRoll).widthFt ? i : best),
    0,
  );
  const single = {
    ...record,
    roll: job.rolls[narrowest],
    grain: undefined,
    lengthStepFt: job.lengthStepFt,
    trimAllowanceFt: record.trimAllowanceFt ?? job.trimAllowanceFt,
  };
  const id = readId(`areas[${index}].id`, record.id, `area-${index + 1}`);
  try {
    return { id, request: parseLayoutRequest(single), grain };
  } catch (error) {
    if (!(error instanceof LayoutInputError)) throw error;
    throw new LayoutInputError(jobPath(error.path, index, narrowest), error.detail);
  }
}

/**
 * Validates an untrusted job request (parsed JSON) and fills in defaults. Throws
 * {@link LayoutInputError} whose `path` names the first bad field (`areas[1].area.outer`,
 * `rolls[0].widthFt`, `remnants[2].lengthFt`, `costs.turfCentsPerSqFt`, …) and whose message
 * is one line. Each area is checked by the single-area parser.
 */
export function parseJobRequest(json: unknown): JobRequest {
  // Array lengths first: an oversize job is refused before any ring is read.
  checkJobRequestSize(json);
  const body = requireRecord('request', json);
  const lengthStepFt =
    readOptionalNumber('lengthStepFt', body.lengthStepFt, { positive: true }) ?? 1;
  const trimAllowanceFt = readOptionalNumber('trimAllowanceFt', body.trimAllowanceFt, {
    nonNegative: true,
  });
  const list = requireArray('areas', body.areas);
  if (list.length === 0) throw new LayoutInputError('areas', 'needs at least one area');
  if (list.length > MAX_JOB_AREAS)
    throw new LayoutInputError('areas', `must have at most ${MAX_JOB_AREAS} areas`);
  const rolls = readRolls(body.rolls, lengthStepFt);
  const areas = list.map((item, i) => readArea(item, i, { rolls, lengthStepFt, trimAllowanceFt }));
  areas.forEach((area, i) => {
    if (areas.findIndex((other) => other.id === area.id) !== i)
      throw new LayoutInputError(`areas[${i}].id`, `repeats the id "${area.id}"`);
  });
  // Job-wide work limit: all areas together no bigger than one largest single request.
  const points = areas.reduce(
    (sum, area) => sum + area.request.area.outer.length + area.request.area.holes.flat().length,
    0,
  );
  // (checkJobRequestSize counted array lengths; this counts points after closing points go.)
  if (points > MAX_TOTAL_VERTICES)
    throw new LayoutInputError('areas', `must have at most ${MAX_TOTAL_VERTICES} points in all`);
  return {
    areas,
    rolls,
    remnants: readRemnants(body.remnants),
    lengthStepFt,
    costs: readCosts(body.costs),
  };
}
