// What else changes when a job moves along its lifecycle, inside the same transaction as the
// move (so the move and its effects commit together or not at all).
import type { JobStatus } from '@seamwright/domain';
import type { RequestContext } from '../../context.js';
import type { Tx } from '../../db/sequelize.js';
import { cutJobTurf, releaseJobTurf } from '../stock/reservations.service.js';

export async function applyJobStatusEffects(
  ctx: RequestContext,
  jobId: string,
  to: JobStatus,
  tx: Tx,
): Promise<void> {
  // A lost or cancelled job gives its held turf back to stock.
  if (to === 'lost' || to === 'cancelled') await releaseJobTurf(ctx, jobId, tx);
  // The crew starts: the held pieces are cut from their rolls.
  if (to === 'in_progress') await cutJobTurf(ctx, jobId, tx);
}
