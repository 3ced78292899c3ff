// The checks every area write makes: the job may still change, and the turf product named is
// one of the company's turf products.
import type { JobStatus } from '@seamwright/domain';
import { jobStatusLabels } from '@seamwright/shared';
import type { AreaTurfProduct, TurfAttributes } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import type { Tx } from '../../db/sequelize.js';
import { AppError, notFound } from '../../errors.js';
import { lockJob } from '../jobs/jobs.repository.js';
import { findPriceBookItem } from '../price-book/price-book.repository.js';

/** Areas, and so the plans an estimate is priced from, change only before the sale. */
export const areaEditableStatuses: readonly JobStatus[] = ['lead', 'estimated'];

/**
 * Locks the job inside `tx` (so a status move waits for the area write) and refuses with 409
 * naming the job's status once it is past estimated. A missing job is a 404.
 */
export async function lockEditableJob(ctx: RequestContext, jobId: string, tx: Tx): Promise<void> {
  const job = await lockJob(ctx, jobId, tx);
  if (!job) throw notFound('Job');
  if (areaEditableStatuses.includes(job.status)) return;
  const message = `The job is ${jobStatusLabels[job.status].toLowerCase()}: areas can change only while a job is a lead or estimated`;
  throw new AppError('CONFLICT', message, { errors: [{ path: 'status', message }] });
}

/**
 * The turf product as the plan keeps it (a snapshot, so a later price-book change does not
 * change a saved plan). Another company's item or none at all is a 404 naming
 * `turfProductId`; an item that is not turf is a 400 naming it.
 */
export async function turfProductFor(
  ctx: RequestContext,
  id: string | null | undefined,
  tx?: Tx,
): Promise<AreaTurfProduct | null> {
  if (id === null || id === undefined) return null;
  const item = await findPriceBookItem(ctx, id, tx);
  if (!item)
    throw new AppError('NOT_FOUND', 'Turf product not found', {
      errors: [{ path: 'turfProductId', message: 'No such turf product in the price book' }],
    });
  if (item.kind !== 'turf') {
    const message = `${item.name} is not a turf product`;
    throw new AppError('VALIDATION_FAILED', `turfProductId: ${message}`, {
      errors: [{ path: 'turfProductId', message }],
    });
  }
  // The view narrows by kind: turf items carry turfAttributesSchema's attributes.
  const attributes: TurfAttributes = item.attributes;
  return {
    id: item.id,
    key: item.key,
    name: item.name,
    pileHeightIn: attributes.pileHeightIn,
    rollWidthsFt: attributes.rollWidthsFt,
    maxRollLengthFt: attributes.maxRollLengthFt,
  };
}
