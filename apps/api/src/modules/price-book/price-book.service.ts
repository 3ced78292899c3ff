import { UniqueConstraintError } from 'sequelize';
import type { Sequelize } from 'sequelize';
import {
  priceBookItemInputSchema,
  type ListResponse,
  type PriceBookItemData,
  type PriceBookItemView,
  type PriceBookListQuery,
  type UpdatePriceBookItemInput,
} from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { Tx } from '../../db/sequelize.js';
import { AppError, notFound } from '../../errors.js';
import { parseInput } from '../../http/validate.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import {
  createPriceBookItem,
  deletePriceBookItem,
  findPriceBookItem,
  findPriceBookItemByKey,
  listAllPriceBookItems,
  listPriceBookItems,
  updatePriceBookItem,
} from './price-book.repository.js';
import { priceBookToCsv } from './price-book-csv.js';

function dataOf(view: PriceBookItemView): PriceBookItemData {
  const { id: _id, createdAt: _c, updatedAt: _u, ...data } = view;
  return data;
}

const keyTaken = (key: string) =>
  new AppError('CONFLICT', `key: "${key}" is already in the price book`, {
    errors: [{ path: 'key', message: `"${key}" is already in the price book` }],
  });

export function createPriceBookService(sequelize: Sequelize) {
  async function list(
    ctx: RequestContext,
    query: PriceBookListQuery,
  ): Promise<ListResponse<PriceBookItemView>> {
    const { rows, total } = await listPriceBookItems(ctx, query);
    return { data: rows, meta: { page: query.page, pageSize: query.pageSize, total } };
  }

  async function audit(ctx: RequestContext, action: string, item: PriceBookItemView, tx: Tx) {
    await recordAuditEvent(
      ctx,
      { action, entity: 'price_book_item', entityId: item.id, data: { key: item.key } },
      tx,
    );
  }

  async function create(ctx: RequestContext, input: PriceBookItemData): Promise<PriceBookItemView> {
    try {
      return await inTransaction(sequelize, async (tx) => {
        if (await findPriceBookItemByKey(ctx, input.key, tx)) throw keyTaken(input.key);
        const created = await createPriceBookItem(ctx, input, tx);
        await audit(ctx, 'price_book_item.created', created, tx);
        return created;
      });
    } catch (error) {
      if (error instanceof UniqueConstraintError) throw keyTaken(input.key);
      throw error;
    }
  }

  async function update(
    ctx: RequestContext,
    id: string,
    input: UpdatePriceBookItemInput,
  ): Promise<PriceBookItemView> {
    try {
      await inTransaction(sequelize, async (tx) => {
        const current = await findPriceBookItem(ctx, id, tx);
        if (!current) throw notFound('Price book item');
        const kindChanged = input.kind !== undefined && input.kind !== current.kind;
        // A new price is the company's own, no longer the invented starter figure.
        const isStarter =
          input.isStarter ??
          (input.priceMillicents !== undefined && input.priceMillicents !== current.priceMillicents
            ? false
            : current.isStarter);
        const merged = parseInput(priceBookItemInputSchema, {
          ...dataOf(current),
          ...input,
          isStarter,
          attributes: input.attributes ?? (kindChanged ? {} : current.attributes),
        });
        if (merged.key !== current.key && (await findPriceBookItemByKey(ctx, merged.key, tx)))
          throw keyTaken(merged.key);
        await updatePriceBookItem(ctx, id, merged, tx);
        await audit(ctx, 'price_book_item.updated', current, tx);
      });
    } catch (error) {
      if (error instanceof UniqueConstraintError) throw keyTaken(String(input.key));
      throw error;
    }
    const updated = await findPriceBookItem(ctx, id);
    if (!updated) throw notFound('Price book item');
    return updated;
  }

  async function remove(ctx: RequestContext, id: string): Promise<void> {
    await inTransaction(sequelize, async (tx) => {
      const current = await findPriceBookItem(ctx, id, tx);
      if (!current) throw notFound('Price book item');
      await deletePriceBookItem(ctx, id, tx);
      await audit(ctx, 'price_book_item.deleted', current, tx);
    });
  }

  async function exportCsv(ctx: RequestContext): Promise<string> {
    return priceBookToCsv(await listAllPriceBookItems(ctx));
  }

  return { list, create, update, remove, exportCsv };
}
