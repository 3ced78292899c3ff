// The tenant row itself: always addressed by the context's company id, never by input.
import type { RequestContext } from '../../context.js';
import { CompanyModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';

export async function findOwnCompany(ctx: RequestContext, tx?: Tx) {
  const row = await CompanyModel.findByPk(
    ctx.companyId,
    tx ? { transaction: tx, lock: tx.LOCK.UPDATE } : {},
  );
  return row ? row.get({ plain: true }) : null;
}

export async function updateOwnCompany(
  ctx: RequestContext,
  values: Partial<{
    name: string;
    timeZone: string;
    region: string | null;
    address: string | null;
    measurementSystem: 'imperial' | 'metric';
  }>,
  tx: Tx,
): Promise<void> {
  await CompanyModel.update(values, { where: { id: ctx.companyId }, transaction: tx });
}
