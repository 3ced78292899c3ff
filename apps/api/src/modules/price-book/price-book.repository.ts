import { Op } from 'sequelize';
import type { PriceBookItemData, PriceBookItemView, PriceBookListQuery } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { PriceBookItemModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

type Row = PriceBookItemModel['_attributes'];

/** `%` and `_` typed by the user are literal characters, not wildcards. */
function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** MariaDB may hand JSON columns back as text and BIGINT as bigint; plain values out. */
function toView(row: Row): PriceBookItemView {
  const attributes: unknown =
    typeof row.attributes === 'string' ? JSON.parse(row.attributes) : row.attributes;
  // The row was validated with priceBookItemInputSchema before it was written.
  return {
    id: row.id,
    kind: row.kind,
    key: row.key,
    name: row.name,
    unit: row.unit,
    packSize: row.packSize === null ? null : Number(row.packSize),
    priceMillicents: Number(row.priceMillicents),
    attributes,
    isStarter: Boolean(row.isStarter),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  } as PriceBookItemView;
}

export async function listPriceBookItems(ctx: RequestContext, query: PriceBookListQuery) {
  const items = scoped(ctx, PriceBookItemModel);
  const where: Record<string | symbol, unknown> = {};
  if (query.kind) where.kind = query.kind;
  if (query.q) {
    const pattern = containsPattern(query.q);
    where[Op.or] = [{ name: { [Op.like]: pattern } }, { key: { [Op.like]: pattern } }];
  }
  const [rows, total] = await Promise.all([
    items.findAll({
      where,
      order: [
        ['kind', 'ASC'],
        ['name', 'ASC'],
        ['id', 'ASC'],
      ],
      limit: query.pageSize,
      offset: (query.page - 1) * query.pageSize,
    }),
    items.count(where),
  ]);
  return { rows: rows.map(toView), total };
}

/** Every item of the company, for the CSV export and the import's key lookup. */
export async function listAllPriceBookItems(ctx: RequestContext, tx?: Tx) {
  const rows = await scoped(ctx, PriceBookItemModel).findAll({
    order: [
      ['kind', 'ASC'],
      ['name', 'ASC'],
      ['id', 'ASC'],
    ],
    ...(tx ? { tx, lock: true } : {}),
  });
  return rows.map(toView);
}

export async function findPriceBookItem(ctx: RequestContext, id: string, tx?: Tx) {
  const row = await scoped(ctx, PriceBookItemModel).findById(id, tx ? { tx, lock: true } : {});
  return row ? toView(row) : null;
}

export async function findPriceBookItemByKey(ctx: RequestContext, key: string, tx: Tx) {
  const [row] = await scoped(ctx, PriceBookItemModel).findAll({ where: { key }, tx, lock: true });
  return row ? toView(row) : null;
}

export async function createPriceBookItem(ctx: RequestContext, item: PriceBookItemData, tx: Tx) {
  return toView(await scoped(ctx, PriceBookItemModel).create(item, tx));
}

export async function updatePriceBookItem(
  ctx: RequestContext,
  id: string,
  item: PriceBookItemData,
  tx: Tx,
): Promise<void> {
  await scoped(ctx, PriceBookItemModel).update(id, item, tx);
}

export async function deletePriceBookItem(ctx: RequestContext, id: string, tx: Tx) {
  return scoped(ctx, PriceBookItemModel).destroy({ id }, tx);
}
