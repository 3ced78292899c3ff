// Rows of `rolls`. Lengths change only through the functions below, under the row lock of the
// transaction that changes them, so `held_ft` is always what the roll's reservations hold.
import { literal, Op } from 'sequelize';
import type { RollListQuery, RollView } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { RollModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

type RollRow = Awaited<ReturnType<ReturnType<typeof scoped<RollModel>>['findAll']>>[number];
export type RollValues = Omit<RollRow, 'id' | 'companyId' | 'heldFt' | 'createdAt' | 'updatedAt'>;

/** Lengths are sums of feet held as doubles; shown to a thousandth of a foot. */
function feet(value: number): number {
  return Math.round(value * 1000) / 1000;
}

export function toRollView(row: RollRow): RollView {
  return {
    id: row.id,
    turfProductId: row.turfProductId,
    turfProductName: row.turfProductName,
    dyeLot: row.dyeLot,
    widthFt: row.widthFt,
    lengthFt: row.lengthFt,
    remainingFt: feet(row.remainingFt),
    heldFt: feet(row.heldFt),
    availableFt: feet(Math.max(0, row.remainingFt - row.heldFt)),
    location: row.location,
    isRemnant: row.isRemnant,
    sourceJobId: row.sourceJobId,
    receivedOn: row.receivedOn,
    notes: row.notes,
    archived: row.archivedAt !== null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** One page of rolls and the total in one statement (`COUNT(*) OVER ()`, as jobs do). */
export async function listRolls(ctx: RequestContext, query: RollListQuery) {
  const where: Record<string | symbol, unknown> = {};
  if (query.turfProductId) where.turfProductId = query.turfProductId;
  if (query.dyeLot) where.dyeLot = query.dyeLot;
  if (query.kind !== 'all') where.isRemnant = query.kind === 'remnant';
  if (!query.includeEmpty) {
    where.archivedAt = null;
    where.remainingFt = { [Op.gt]: 0 };
  }
  const rolls = scoped(ctx, RollModel);
  const rows = (await rolls.findAll({
    where,
    attributes: { include: [[literal('COUNT(*) OVER ()'), 'totalRows']] },
    order: [
      ['turfProductName', 'ASC'],
      ['dyeLot', 'ASC'],
      ['isRemnant', 'ASC'],
      ['remainingFt', 'DESC'],
      ['id', 'ASC'],
    ],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  })) as (RollRow & { totalRows: number | bigint | string })[];
  const first = rows[0];
  const total = first ? Number(first.totalRows) : query.page > 1 ? await rolls.count(where) : 0;
  return { rows: rows as RollRow[], total };
}

export function findRoll(ctx: RequestContext, id: string, tx?: Tx, lock = false) {
  return scoped(ctx, RollModel).findById(id, tx ? { tx, lock } : {});
}

export function createRoll(ctx: RequestContext, values: RollValues, tx: Tx) {
  return scoped(ctx, RollModel).create(values, tx);
}

export function updateRoll(
  ctx: RequestContext,
  id: string,
  values: Partial<RollValues> & { heldFt?: number },
  tx: Tx,
) {
  return scoped(ctx, RollModel).update(id, values, tx);
}

/**
 * Every usable roll of these products, and the rolls named by `alsoIds` (what the job holds
 * now), locked until `tx` ends, in id order: the same order in every transaction, so two
 * reservations wait for each other instead of deadlocking.
 */
export function lockRollsForReservation(
  ctx: RequestContext,
  productIds: string[],
  alsoIds: string[],
  tx: Tx,
) {
  const usable = { turfProductId: productIds, archivedAt: null, remainingFt: { [Op.gt]: 0 } };
  return scoped(ctx, RollModel).findAll({
    where: alsoIds.length > 0 ? { [Op.or]: [usable, { id: alsoIds }] } : usable,
    order: [['id', 'ASC']],
    tx,
    lock: true,
  });
}

/** Locks the rolls with these ids (id order, see above). */
export function lockRolls(ctx: RequestContext, ids: string[], tx: Tx) {
  return scoped(ctx, RollModel).findAll({
    where: { id: ids },
    order: [['id', 'ASC']],
    tx,
    lock: true,
  });
}
