import type { DepositRule, TakeoffOverrides } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { EstimatingSettingsModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

export interface EstimatingSettingsRecord {
  takeoffOverrides: TakeoffOverrides;
  markupBasisPoints: number;
  taxRateBasisPoints: number;
  depositRule: DepositRule;
}

const fromJson = (value: unknown): unknown =>
  typeof value === 'string' ? JSON.parse(value) : value;

/** The company's row, or null for a company made before estimating settings existed. */
export async function findEstimatingSettings(
  ctx: RequestContext,
  tx?: Tx,
): Promise<(EstimatingSettingsRecord & { id: string }) | null> {
  const [row] = await scoped(ctx, EstimatingSettingsModel).findAll(tx ? { tx, lock: true } : {});
  if (!row) return null;
  // Written only after validation by the service (updateEstimatingSettingsInputSchema).
  return {
    id: row.id,
    takeoffOverrides: fromJson(row.takeoffOverrides) as TakeoffOverrides,
    markupBasisPoints: row.markupBasisPoints,
    taxRateBasisPoints: row.taxRateBasisPoints,
    depositRule: fromJson(row.depositRule) as DepositRule,
  };
}

export async function createEstimatingSettingsRow(
  ctx: RequestContext,
  values: EstimatingSettingsRecord,
  tx: Tx,
): Promise<void> {
  await scoped(ctx, EstimatingSettingsModel).create(values, tx);
}

export async function updateEstimatingSettingsRow(
  ctx: RequestContext,
  id: string,
  values: EstimatingSettingsRecord,
  tx: Tx,
): Promise<void> {
  await scoped(ctx, EstimatingSettingsModel).update(id, values, tx);
}
