// A job whose buyer may still cancel (an acceptance's cancellation period is running, TRADE.md
// §8.2) cannot be scheduled or started: work must not begin before the right to cancel ends.
import { localDateOf, longCalendarDate } from '@seamwright/domain';
import type { JobStatus } from '@seamwright/domain';
import type { RequestContext } from '../../context.js';
import type { Tx } from '../../db/sequelize.js';
import { AppError } from '../../errors.js';
import { findOwnCompany } from '../company/company.repository.js';
import { latestRunningCancellation } from '../estimates/estimate-links.repository.js';
import { listEstimatesOfJob } from '../estimates/estimates.repository.js';

const guardedMoves: readonly JobStatus[] = ['scheduled', 'in_progress'];

export async function assertCancellationPeriodOver(
  ctx: RequestContext,
  jobId: string,
  to: JobStatus,
  tx: Tx,
): Promise<void> {
  if (!guardedMoves.includes(to)) return;
  const versions = await listEstimatesOfJob(ctx, jobId, tx);
  const now = new Date();
  const endsAt = await latestRunningCancellation(
    ctx,
    versions.map((v) => v.id),
    now,
    tx,
  );
  if (!endsAt) return;
  const company = await findOwnCompany(ctx);
  // The period ends at local midnight, so its last day is the day of the instant just before.
  const lastDay = localDateOf(new Date(endsAt.getTime() - 1), company?.timeZone ?? 'UTC');
  const message = `The buyer may cancel until midnight at the end of ${longCalendarDate(lastDay)} (${endsAt.toISOString()}): the job cannot be ${to === 'scheduled' ? 'scheduled' : 'started'} before then`;
  throw new AppError('CONFLICT', message, { errors: [{ path: 'status', message }] });
}
