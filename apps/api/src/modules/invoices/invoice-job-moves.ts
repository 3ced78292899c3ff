// What invoices do to their job along the lifecycle (DOMAIN.md: … installed → invoiced → paid):
// sending the final invoice of an installed job makes it invoiced; paying the final invoice in
// full makes an invoiced job paid (an installed one passes through invoiced first). Any other
// status is left as it is: the lifecycle does not allow the move, and an invoice is no reason
// to force one. Inside the caller's transaction, audited like every job move.
import { canTransition } from '@seamwright/domain';
import type { JobStatus } from '@seamwright/domain';
import type { RequestContext } from '../../context.js';
import type { Tx } from '../../db/sequelize.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { applyJobStatusEffects } from '../jobs/job-status-effects.js';
import { lockJob, updateJob } from '../jobs/jobs.repository.js';

export async function moveJobForInvoice(
  ctx: RequestContext,
  jobId: string,
  target: 'invoiced' | 'paid',
  meta: { invoiceId: string; userId: string | null },
  tx: Tx,
): Promise<void> {
  const job = await lockJob(ctx, jobId, tx);
  if (!job) return;
  const path: JobStatus[] = target === 'paid' ? ['invoiced', 'paid'] : ['invoiced'];
  let from = job.status;
  for (const to of path) {
    if (from === to || !canTransition(from, to)) continue;
    await updateJob(ctx, jobId, { status: to }, tx);
    await applyJobStatusEffects(ctx, jobId, to, tx);
    await recordAuditEvent(
      ctx,
      {
        action: 'job.status_changed',
        entity: 'job',
        entityId: jobId,
        data: { from, to, invoiceId: meta.invoiceId },
        userId: meta.userId,
      },
      tx,
    );
    from = to;
  }
}
