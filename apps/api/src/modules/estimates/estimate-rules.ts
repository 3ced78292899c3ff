// The checks every estimate write makes: the job still takes estimates, only a draft changes,
// and a job has at most one draft.
import type { JobStatus } from '@seamwright/domain';
import { computeEstimateTiers, MoneyInputError } from '@seamwright/domain';
import type { EstimateTier, EstimateTierInput } from '@seamwright/domain';
import { jobStatusLabels } from '@seamwright/shared';
import type { DepositRule } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import type { Tx } from '../../db/sequelize.js';
import { AppError, notFound } from '../../errors.js';
import { lockJob } from '../jobs/jobs.repository.js';
import type { EstimateRecord } from './estimates.repository.js';
import { listEstimatesOfJob } from './estimates.repository.js';
import { mainTier } from './estimate-view.js';

export const estimateJobStatuses: readonly JobStatus[] = ['lead', 'estimated'];

function conflict(message: string, path: string): AppError {
  return new AppError('CONFLICT', message, { errors: [{ path, message }] });
}

/** Locks the job (so two estimate writes of one job run one after the other) and checks it. */
export async function lockJobForEstimate(ctx: RequestContext, jobId: string, tx: Tx) {
  const job = await lockJob(ctx, jobId, tx);
  if (!job) throw notFound('Job');
  if (!estimateJobStatuses.includes(job.status))
    throw conflict(
      `The job is ${jobStatusLabels[job.status].toLowerCase()}: estimates are made only while a job is a lead or estimated`,
      'status',
    );
  return job;
}

/** The job's versions (under the job lock); 409 when one is still a draft. */
export async function versionsWithoutDraft(
  ctx: RequestContext,
  jobId: string,
  tx: Tx,
): Promise<EstimateRecord[]> {
  const versions = await listEstimatesOfJob(ctx, jobId, tx);
  const draft = versions.find((v) => v.status === 'draft');
  if (draft)
    throw conflict(
      `Version ${draft.version} of this job's estimate is still a draft: change it, or send it before making another`,
      'status',
    );
  return versions;
}

export function assertDraft(record: EstimateRecord): void {
  if (record.status !== 'draft')
    throw conflict(
      `Version ${record.version} is ${record.status}: it can no longer change; make a revision instead`,
      'status',
    );
}

/** Tiers with totals, and the cached columns (the main tier's totals). */
export function computeTiers(
  tiers: readonly EstimateTierInput[],
  rates: { taxRateBasisPoints: number; depositRule: DepositRule },
  chosenTierId: string | null,
) {
  let computed: EstimateTier[];
  try {
    computed = computeEstimateTiers(tiers, rates);
  } catch (error) {
    if (error instanceof MoneyInputError)
      throw new AppError('VALIDATION_FAILED', error.message, {
        errors: [{ path: error.path, message: error.message }],
      });
    throw error;
  }
  const main = mainTier({ tiers: computed, chosenTierId });
  return {
    tiers: computed,
    subtotalCents: main.subtotalCents,
    taxCents: main.taxCents,
    totalCents: main.totalCents,
    depositCents: main.depositCents,
  };
}
