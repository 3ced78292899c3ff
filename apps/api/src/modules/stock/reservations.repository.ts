// Rows of `turf_reservations` and `roll_allocations`: what each job holds on which roll.
import type { RequestContext } from '../../context.js';
import { RollAllocationModel, TurfReservationModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

type ReservationRow = Awaited<
  ReturnType<ReturnType<typeof scoped<TurfReservationModel>>['findAll']>
>[number];
type AllocationRow = Awaited<
  ReturnType<ReturnType<typeof scoped<RollAllocationModel>>['findAll']>
>[number];
export type { AllocationRow, ReservationRow };

export type ReservationValues = Omit<
  ReservationRow,
  'id' | 'companyId' | 'createdAt' | 'updatedAt'
>;
export type AllocationValues = Omit<
  AllocationRow,
  'id' | 'companyId' | 'reservationId' | 'createdAt' | 'updatedAt'
>;

/**
 * A job's reservations (one per turf product), oldest first, read inside `tx` when given. Not
 * locked: callers hold the job's row lock, which already serializes writes to its
 * reservations (a FOR UPDATE here would take gap locks that deadlock two jobs' inserts).
 */
export function listReservationsOfJob(ctx: RequestContext, jobId: string, tx?: Tx) {
  return scoped(ctx, TurfReservationModel).findAll({
    where: { jobId },
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
    ...(tx ? { tx } : {}),
  });
}

export function listAllocations(ctx: RequestContext, reservationIds: string[], tx?: Tx) {
  if (reservationIds.length === 0) return Promise.resolve([]);
  return scoped(ctx, RollAllocationModel).findAll({
    where: { reservationId: reservationIds },
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
    ...(tx ? { tx } : {}),
  });
}

export async function createReservation(
  ctx: RequestContext,
  values: ReservationValues,
  allocations: AllocationValues[],
  tx: Tx,
): Promise<string> {
  const reservation = await scoped(ctx, TurfReservationModel).create(values, tx);
  for (const allocation of allocations)
    await scoped(ctx, RollAllocationModel).create(
      { ...allocation, reservationId: reservation.id },
      tx,
    );
  return reservation.id;
}

export async function markReservationsCut(ctx: RequestContext, ids: string[], tx: Tx) {
  for (const id of ids) await scoped(ctx, TurfReservationModel).update(id, { status: 'cut' }, tx);
}

/** Removes reservations and (by the foreign key's cascade) their allocations. */
export function deleteReservations(ctx: RequestContext, ids: string[], tx: Tx) {
  if (ids.length === 0) return Promise.resolve(0);
  return scoped(ctx, TurfReservationModel).destroy({ id: ids }, tx);
}
