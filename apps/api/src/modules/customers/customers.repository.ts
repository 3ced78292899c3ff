import { Op } from 'sequelize';
import type { WhereOptions } from 'sequelize';
import type { CustomerListQuery } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { CustomerModel, SiteModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

export type CustomerRow = Awaited<
  ReturnType<ReturnType<typeof scoped<CustomerModel>>['findAll']>
>[number];
type CustomerWhere = WhereOptions<CustomerModel['_attributes']>;

/** `%` and `_` typed by the user are literal characters, not wildcards. */
function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

function listWhere(query: CustomerListQuery): CustomerWhere {
  const where: Record<string | symbol, unknown> = {};
  // Built as a plain record (symbol keys for Op.or) and returned as Sequelize's where type.
  if (query.status === 'active') where.archivedAt = null;
  if (query.status === 'archived') where.archivedAt = { [Op.ne]: null };
  if (query.q) {
    const pattern = containsPattern(query.q);
    where[Op.or] = [
      { name: { [Op.like]: pattern } },
      { email: { [Op.like]: pattern } },
      { phone: { [Op.like]: pattern } },
    ];
  }
  return where;
}

export async function listCustomers(ctx: RequestContext, query: CustomerListQuery) {
  const customers = scoped(ctx, CustomerModel);
  const where = listWhere(query);
  const [rows, total] = await Promise.all([
    customers.findAll({
      where,
      order: [
        [query.sort.field, query.sort.direction.toUpperCase()],
        ['id', 'ASC'],
      ],
      limit: query.pageSize,
      offset: (query.page - 1) * query.pageSize,
    }),
    customers.count(where),
  ]);
  return { rows, total };
}

/** Number of sites per customer, for the given customers of this company. */
export async function countSitesByCustomer(
  ctx: RequestContext,
  customerIds: string[],
): Promise<Map<string, number>> {
  const counts = new Map<string, number>();
  if (customerIds.length === 0) return counts;
  const sites = await scoped(ctx, SiteModel).findAll({ where: { customerId: customerIds } });
  for (const site of sites) counts.set(site.customerId, (counts.get(site.customerId) ?? 0) + 1);
  return counts;
}

export function findCustomer(ctx: RequestContext, id: string, tx?: Tx) {
  return scoped(ctx, CustomerModel).findById(id, tx ? { tx, lock: true } : {});
}

export function createCustomer(
  ctx: RequestContext,
  values: {
    name: string;
    email: string | null;
    phone: string | null;
    billingAddress: string | null;
    notes: string | null;
  },
  tx: Tx,
) {
  return scoped(ctx, CustomerModel).create({ ...values, archivedAt: null }, tx);
}

export function updateCustomer(
  ctx: RequestContext,
  id: string,
  values: Partial<Omit<CustomerRow, 'id' | 'companyId'>>,
  tx: Tx,
) {
  return scoped(ctx, CustomerModel).update(id, values, tx);
}

/** Removes the customer and every site of theirs in this company. */
export async function deleteCustomerWithSites(
  ctx: RequestContext,
  id: string,
  tx: Tx,
): Promise<void> {
  await scoped(ctx, SiteModel).destroy({ customerId: id }, tx);
  await scoped(ctx, CustomerModel).destroy({ id }, tx);
}
