// Estimate links and answers (migration 0011).
import { Op } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { EstimateAnswerModel, EstimateLinkModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

export type EstimateAnswerRow = EstimateAnswerModel['_attributes'];
export type EstimateLinkRow = EstimateLinkModel['_attributes'];

export async function createEstimateLink(
  ctx: RequestContext,
  values: { estimateId: string; tokenHash: string; expiresAt: Date },
  tx: Tx,
): Promise<EstimateLinkRow> {
  return scoped(ctx, EstimateLinkModel).create({ ...values, revokedAt: null }, tx);
}

/** Revokes the estimate's open links; returns how many. */
export async function revokeEstimateLinks(
  ctx: RequestContext,
  estimateId: string,
  now: Date,
  tx: Tx,
): Promise<number> {
  const links = scoped(ctx, EstimateLinkModel);
  const open = await links.findAll({ where: { estimateId, revokedAt: null }, tx, lock: true });
  for (const link of open) await links.update(link.id, { revokedAt: now }, tx);
  return open.length;
}

/**
 * Unscoped on purpose: the customer has no account, so the token (whose hash only the e-mailed
 * link can produce) is what identifies the company. Revoked and expired links are returned too,
 * so the caller can tell them apart (404 / 410).
 */
export async function unsafeFindEstimateLinkByTokenHash(
  tokenHash: string,
  tx?: Tx,
): Promise<EstimateLinkRow | null> {
  const row = await EstimateLinkModel.findOne({
    where: { tokenHash },
    unscopedReason: 'the estimate link token identifies the company',
    ...(tx ? { transaction: tx, lock: tx.LOCK.UPDATE } : {}),
  });
  return row ? row.get({ plain: true }) : null;
}

export async function findEstimateAnswer(
  ctx: RequestContext,
  estimateId: string,
  tx?: Tx,
): Promise<EstimateAnswerRow | null> {
  const [row] = await scoped(ctx, EstimateAnswerModel).findAll({
    where: { estimateId },
    ...(tx ? { tx } : {}),
  });
  return row ?? null;
}

export async function createEstimateAnswer(
  ctx: RequestContext,
  values: Omit<EstimateAnswerRow, 'id' | 'companyId' | 'createdAt'>,
  tx: Tx,
): Promise<EstimateAnswerRow> {
  return scoped(ctx, EstimateAnswerModel).create(values, tx);
}

/** The latest end of a cancellation period still running on one of these estimates. */
export async function latestRunningCancellation(
  ctx: RequestContext,
  estimateIds: string[],
  now: Date,
  tx?: Tx,
): Promise<Date | null> {
  if (estimateIds.length === 0) return null;
  const rows = await scoped(ctx, EstimateAnswerModel).findAll({
    where: {
      estimateId: estimateIds,
      kind: 'accepted',
      cancellationEndsAt: { [Op.gt]: now },
    },
    order: [['cancellationEndsAt', 'DESC']],
    limit: 1,
    ...(tx ? { tx } : {}),
  });
  return rows[0]?.cancellationEndsAt ?? null;
}
