import type { CreateSiteData } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { SiteModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

export type SiteRow = Awaited<ReturnType<ReturnType<typeof scoped<SiteModel>>['findAll']>>[number];
export type SiteValues = Required<{
  [K in keyof CreateSiteData]: Exclude<CreateSiteData[K], undefined>;
}>;

export async function listSitesOfCustomer(
  ctx: RequestContext,
  customerId: string,
  page: { limit: number; offset: number },
) {
  const sites = scoped(ctx, SiteModel);
  const [rows, total] = await Promise.all([
    sites.findAll({
      where: { customerId },
      order: [
        ['createdAt', 'ASC'],
        ['id', 'ASC'],
      ],
      limit: page.limit,
      offset: page.offset,
    }),
    sites.count({ customerId }),
  ]);
  return { rows, total };
}

export function findSite(ctx: RequestContext, id: string, tx?: Tx) {
  return scoped(ctx, SiteModel).findById(id, tx ? { tx, lock: true } : {});
}

export function createSite(ctx: RequestContext, customerId: string, values: SiteValues, tx: Tx) {
  return scoped(ctx, SiteModel).create({ ...values, customerId }, tx);
}

export function updateSite(ctx: RequestContext, id: string, values: Partial<SiteValues>, tx: Tx) {
  return scoped(ctx, SiteModel).update(id, values, tx);
}

export function deleteSite(ctx: RequestContext, id: string, tx: Tx) {
  return scoped(ctx, SiteModel).destroy({ id }, tx);
}
