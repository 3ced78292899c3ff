// What the sending step (PDF and e-mail, built later) calls: freeze a draft as sent. Sending
// a job's first estimate moves a lead to estimated.
import type { EstimateView } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { Tx } from '../../db/sequelize.js';
import { AppError, notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { updateJob } from '../jobs/jobs.repository.js';
import { lockJobForEstimate } from './estimate-rules.js';
import { toEstimateView } from './estimate-view.js';
import { estimatesSequelize, findEstimate, updateEstimate } from './estimates.repository.js';

async function markSent(
  ctx: RequestContext,
  estimateId: string,
  sentAt: Date,
  tx: Tx,
): Promise<EstimateView> {
  const current = await findEstimate(ctx, estimateId);
  if (!current) throw notFound('Estimate');
  const job = await lockJobForEstimate(ctx, current.jobId, tx);
  const locked = await findEstimate(ctx, estimateId, tx);
  if (!locked) throw notFound('Estimate');
  // Sending the same version again (a resend) changes nothing here.
  if (locked.status === 'sent') return toEstimateView(locked);
  if (locked.status !== 'draft') {
    const message = `Version ${locked.version} is ${locked.status}: only a draft is sent`;
    throw new AppError('CONFLICT', message, { errors: [{ path: 'status', message }] });
  }
  await updateEstimate(ctx, estimateId, { status: 'sent', sentAt }, tx);
  await recordAuditEvent(
    ctx,
    {
      action: 'job.estimate_sent',
      entity: 'job',
      entityId: locked.jobId,
      data: { estimateId, version: locked.version, sentAt: sentAt.toISOString() },
    },
    tx,
  );
  if (job.status === 'lead') {
    await updateJob(ctx, job.id, { status: 'estimated' }, tx);
    await recordAuditEvent(
      ctx,
      {
        action: 'job.status_changed',
        entity: 'job',
        entityId: job.id,
        data: { from: 'lead', to: 'estimated', estimateId },
      },
      tx,
    );
  }
  const sent = await findEstimate(ctx, estimateId, tx);
  return toEstimateView(sent ?? locked);
}

/**
 * Freezes a draft estimate as sent at `sentAt` (a sent one stays as it is; any other status is
 * 409). Inside the caller's transaction when given one (the e-mail step records its link in
 * the same one), else in its own. 404 for another company's estimate.
 */
export async function markEstimateSent(
  ctx: RequestContext,
  estimateId: string,
  { sentAt }: { sentAt: Date },
  transaction?: Tx,
): Promise<EstimateView> {
  if (transaction) return markSent(ctx, estimateId, sentAt, transaction);
  return inTransaction(estimatesSequelize(), (tx) => markSent(ctx, estimateId, sentAt, tx));
}
