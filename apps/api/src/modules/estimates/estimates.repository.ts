import type { EstimateTier } from '@seamwright/domain';
import type { DepositRule, EstimateStatus } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { EstimateModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

/** An estimate row with its JSON columns read back as values. */
export interface EstimateRecord {
  id: string;
  jobId: string;
  version: number;
  status: EstimateStatus;
  tiers: EstimateTier[];
  chosenTierId: string | null;
  warnings: string[];
  notes: string | null;
  validUntil: string | null;
  markupBasisPoints: number;
  taxRateBasisPoints: number;
  depositRule: DepositRule;
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  depositCents: number;
  sentAt: Date | null;
  createdBy: string | null;
  createdAt: Date;
  updatedAt: Date;
}

export type EstimateValues = Omit<EstimateRecord, 'id' | 'jobId' | 'createdAt' | 'updatedAt'>;

/** MariaDB hands JSON back as text and BIGINT possibly as strings; every value was validated. */
const fromJson = (value: unknown): unknown =>
  typeof value === 'string' ? JSON.parse(value) : value;

function toRecord(row: EstimateModel['_attributes']): EstimateRecord {
  return {
    id: row.id,
    jobId: row.jobId,
    version: Number(row.version),
    status: row.status as EstimateStatus,
    tiers: fromJson(row.tiers) as EstimateTier[],
    chosenTierId: row.chosenTierId,
    warnings: fromJson(row.warnings) as string[],
    notes: row.notes,
    validUntil: row.validUntil,
    markupBasisPoints: row.markupBasisPoints,
    taxRateBasisPoints: row.taxRateBasisPoints,
    depositRule: fromJson(row.depositRule) as DepositRule,
    subtotalCents: Number(row.subtotalCents),
    taxCents: Number(row.taxCents),
    totalCents: Number(row.totalCents),
    depositCents: Number(row.depositCents),
    sentAt: row.sentAt,
    createdBy: row.createdBy,
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  };
}

export async function findEstimate(
  ctx: RequestContext,
  id: string,
  tx?: Tx,
): Promise<EstimateRecord | null> {
  const row = await scoped(ctx, EstimateModel).findById(id, tx ? { tx, lock: true } : {});
  return row ? toRecord(row) : null;
}

/** The job's versions, newest first. */
export async function listEstimatesOfJob(
  ctx: RequestContext,
  jobId: string,
  tx?: Tx,
): Promise<EstimateRecord[]> {
  const rows = await scoped(ctx, EstimateModel).findAll({
    where: { jobId },
    order: [['version', 'DESC']],
    ...(tx ? { tx } : {}),
  });
  return rows.map(toRecord);
}

export async function createEstimate(
  ctx: RequestContext,
  jobId: string,
  values: EstimateValues,
  tx: Tx,
): Promise<string> {
  return (await scoped(ctx, EstimateModel).create({ jobId, ...values }, tx)).id;
}

export async function updateEstimate(
  ctx: RequestContext,
  id: string,
  values: Partial<EstimateValues>,
  tx: Tx,
): Promise<void> {
  await scoped(ctx, EstimateModel).update(id, values, tx);
}

/**
 * The Sequelize instance the models were set up on, for service functions other modules call
 * without ServiceDeps (markEstimateSent opens its own transaction when given none).
 */
export function estimatesSequelize() {
  const sequelize = EstimateModel.sequelize;
  if (!sequelize) throw new Error('The models are not initialised');
  return sequelize;
}
