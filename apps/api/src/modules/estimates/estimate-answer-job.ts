// What an acceptance does to the job: it moves to accepted along the lifecycle (audited), with
// the move's effects, inside the acceptance's transaction.
import { assertTransition, JobTransitionError } from '@seamwright/domain';
import type { RequestContext } from '../../context.js';
import type { Tx } from '../../db/sequelize.js';
import { AppError } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { applyJobStatusEffects } from '../jobs/job-status-effects.js';
import { updateJob } from '../jobs/jobs.repository.js';
import type { JobStatus } from '@seamwright/domain';

export async function moveJobToAccepted(
  ctx: RequestContext,
  job: { id: string; status: JobStatus },
  actor: { userId: string | null; estimateId: string },
  tx: Tx,
): Promise<void> {
  if (job.status === 'accepted') return;
  try {
    assertTransition(job.status, 'accepted');
  } catch (error) {
    if (error instanceof JobTransitionError)
      throw new AppError('CONFLICT', error.message, {
        errors: [{ path: 'status', message: error.message }],
      });
    throw error;
  }
  await updateJob(ctx, job.id, { status: 'accepted' }, tx);
  await applyJobStatusEffects(ctx, job.id, 'accepted', tx);
  await recordAuditEvent(
    ctx,
    {
      action: 'job.status_changed',
      entity: 'job',
      entityId: job.id,
      data: { from: job.status, to: 'accepted', estimateId: actor.estimateId },
      userId: actor.userId,
    },
    tx,
  );
}
