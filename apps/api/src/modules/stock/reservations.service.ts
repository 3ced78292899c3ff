// A job's turf reserved on rolls of one dye lot per product. The rolls are locked, searched
// (reserveTurf, in the worker pool) and written in one transaction, so two reservations at the
// same moment never hold the same length of a roll: the second waits for the first's locks and
// then sees what it holds. A job that no lot can hold is refused with what to order, unless the
// office asks to hold what there is (`allowShort`).
import type { JobReservationView } from '@seamwright/shared';
import type { JobStatus } from '@seamwright/domain';
import { jobStatusLabels } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { Tx } from '../../db/sequelize.js';
import type { ServiceDeps } from '../../deps.js';
import { notFound } from '../../errors.js';
import { listJobTurfPieces } from '../areas/job-takeoff.service.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { findJob, lockJob } from '../jobs/jobs.repository.js';
import {
  conflict,
  productsToReserve,
  reservationRequest,
  shortConflict,
} from './reservation-request.js';
import { toReservationView } from './reservation-view.js';
import {
  createReservation,
  deleteReservations,
  listAllocations,
  listReservationsOfJob,
  markReservationsCut,
} from './reservations.repository.js';
import type { AllocationValues } from './reservations.repository.js';
import { lockRolls, lockRollsForReservation, updateRoll } from './rolls.repository.js';

/** Turf is reserved once the sale is made, and may be reserved again until the crew cuts it. */
export const reservableStatuses: readonly JobStatus[] = ['accepted', 'scheduled'];

export async function getJobReservation(
  ctx: RequestContext,
  jobId: string,
): Promise<JobReservationView> {
  const [job, reservations] = await Promise.all([
    findJob(ctx, jobId),
    listReservationsOfJob(ctx, jobId),
  ]);
  if (!job) throw notFound('Job');
  const allocations = await listAllocations(
    ctx,
    reservations.map((r) => r.id),
  );
  return toReservationView(jobId, reservations, allocations);
}

/** Length each roll holds for the job's `held` reservations. */
async function heldByJob(ctx: RequestContext, jobId: string, tx: Tx) {
  const reservations = (await listReservationsOfJob(ctx, jobId, tx)).filter(
    (r) => r.status === 'held',
  );
  const allocations = await listAllocations(
    ctx,
    reservations.map((r) => r.id),
    tx,
  );
  const perRoll = new Map<string, number>();
  for (const a of allocations) perRoll.set(a.rollId, (perRoll.get(a.rollId) ?? 0) + a.lengthFt);
  return { reservations, allocations, perRoll };
}

/** Adds `delta` (ft, per roll) to the held length of rolls already locked in `tx`. */
async function changeHeld(
  ctx: RequestContext,
  rolls: { id: string; heldFt: number }[],
  delta: Map<string, number>,
  tx: Tx,
) {
  for (const roll of rolls) {
    const change = delta.get(roll.id);
    if (change === undefined || Math.abs(change) < 1e-9) continue;
    await updateRoll(ctx, roll.id, { heldFt: Math.max(0, roll.heldFt + change) }, tx);
  }
}

export function createReservationsService(deps: Pick<ServiceDeps, 'sequelize' | 'plannerPool'>) {
  const { sequelize, plannerPool } = deps;

  async function reserve(
    ctx: RequestContext,
    jobId: string,
    input: { allowShort: boolean },
  ): Promise<JobReservationView> {
    const products = productsToReserve(await listJobTurfPieces(ctx, jobId));
    await inTransaction(sequelize, async (tx) => {
      const job = await lockJob(ctx, jobId, tx);
      if (!job) throw notFound('Job');
      if (!reservableStatuses.includes(job.status))
        throw conflict(
          'status',
          `The job is ${jobStatusLabels[job.status].toLowerCase()}: turf is reserved once a job is accepted or scheduled`,
        );
      const current = await heldByJob(ctx, jobId, tx);
      if (current.reservations.length === 0 && (await listReservationsOfJob(ctx, jobId, tx)).length)
        throw conflict('status', "The job's turf is already cut; return remnants instead");
      const rolls = await lockRollsForReservation(
        ctx,
        products.map((p) => p.turfProductId),
        [...current.perRoll.keys()],
        tx,
      );
      const plan = await plannerPool.reserveTurf(
        reservationRequest(products, rolls, current.perRoll),
      );
      if (plan.shortFt > 0 && !input.allowShort) throw shortConflict(plan, products);

      const delta = new Map<string, number>();
      for (const [rollId, ft] of current.perRoll) delta.set(rollId, -ft);
      await deleteReservations(
        ctx,
        current.reservations.map((r) => r.id),
        tx,
      );
      const rollById = new Map(rolls.map((roll) => [roll.id, roll]));
      for (const product of plan.products) {
        const group = products.find((p) => p.turfProductId === product.productId);
        if (!group) continue;
        const allocations: AllocationValues[] = product.allocations.map((allocation) => {
          const piece = group.pieces[allocation.pieceIndex];
          if (!piece) throw new Error('The search placed a piece the job does not have.');
          delta.set(allocation.rollId, (delta.get(allocation.rollId) ?? 0) + allocation.lengthFt);
          return {
            rollId: allocation.rollId,
            areaId: piece.areaId,
            areaName: piece.areaName,
            piece: piece.piece,
            isRemnant: allocation.isRemnant,
            widthFt: allocation.widthFt,
            lengthFt: allocation.lengthFt,
          };
        });
        await createReservation(
          ctx,
          {
            jobId,
            turfProductId: product.productId,
            turfProductName: group.turfProductName ?? '',
            dyeLot: product.dyeLot,
            status: 'held',
            shortFt: product.shortFt,
            toOrder: product.toOrder,
            isExhaustive: product.isExhaustive,
          },
          allocations,
          tx,
        );
      }
      await changeHeld(ctx, [...rollById.values()], delta, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'job.turf_reserved',
          entity: 'job',
          entityId: jobId,
          data: {
            dyeLots: plan.products.map((p) => p.dyeLot),
            shortFt: plan.shortFt,
          },
        },
        tx,
      );
    });
    return getJobReservation(ctx, jobId);
  }

  async function release(ctx: RequestContext, jobId: string): Promise<void> {
    await inTransaction(sequelize, async (tx) => {
      if (!(await lockJob(ctx, jobId, tx))) throw notFound('Job');
      if (await releaseJobTurf(ctx, jobId, tx))
        await recordAuditEvent(
          ctx,
          { action: 'job.turf_released', entity: 'job', entityId: jobId },
          tx,
        );
    });
  }

  return { get: getJobReservation, reserve, release };
}

/**
 * Gives back what the job holds and has not cut (a job lost or cancelled, or the office's
 * release). Called inside the transaction that holds the job's lock. Returns whether anything
 * was held.
 */
export async function releaseJobTurf(ctx: RequestContext, jobId: string, tx: Tx) {
  const current = await heldByJob(ctx, jobId, tx);
  if (current.reservations.length === 0) return false;
  const rolls = await lockRolls(ctx, [...current.perRoll.keys()], tx);
  const delta = new Map([...current.perRoll].map(([id, ft]) => [id, -ft] as const));
  await changeHeld(ctx, rolls, delta, tx);
  await deleteReservations(
    ctx,
    current.reservations.map((r) => r.id),
    tx,
  );
  return true;
}

/**
 * The crew cuts the held pieces (the job goes in progress): each roll's length left and held
 * length both drop by what was cut, and the reservation is kept, marked cut, as the record of
 * which lot went into the job.
 */
export async function cutJobTurf(ctx: RequestContext, jobId: string, tx: Tx) {
  const current = await heldByJob(ctx, jobId, tx);
  if (current.reservations.length === 0) return;
  for (const roll of await lockRolls(ctx, [...current.perRoll.keys()], tx)) {
    const cut = current.perRoll.get(roll.id) ?? 0;
    await updateRoll(
      ctx,
      roll.id,
      {
        remainingFt: Math.max(0, roll.remainingFt - cut),
        heldFt: Math.max(0, roll.heldFt - cut),
      },
      tx,
    );
  }
  await markReservationsCut(
    ctx,
    current.reservations.map((r) => r.id),
    tx,
  );
}
