// CSV import: a dry run answers the preview; a real run writes every row in one transaction,
// or nothing at all when any row has an error (422). Rows match existing items by key.
import type { Sequelize } from 'sequelize';
import type {
  PriceBookImportInput,
  PriceBookImportPreview,
  PriceBookImportRow,
  PriceBookItemView,
} from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import { AppError } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { itemFromCsvRecord, parsePriceBookCsv } from './price-book-csv.js';
import {
  createPriceBookItem,
  listAllPriceBookItems,
  updatePriceBookItem,
} from './price-book.repository.js';

/** At most this many rows per file; a price book is hundreds of rows, not millions. */
export const MAX_IMPORT_ROWS = 2000;

function preview(csv: string, existing: PriceBookItemView[]): PriceBookImportPreview {
  const { records, fileErrors } = parsePriceBookCsv(csv);
  if (fileErrors.length > 0)
    throw new AppError('UNPROCESSABLE', `csv: ${fileErrors.join('; ')}`, {
      errors: fileErrors.map((message) => ({ path: 'csv', message })),
    });
  if (records.length > MAX_IMPORT_ROWS)
    throw new AppError('UNPROCESSABLE', `csv: at most ${MAX_IMPORT_ROWS} rows per file`, {
      errors: [{ path: 'csv', message: `At most ${MAX_IMPORT_ROWS} rows per file` }],
    });
  const existingKeys = new Set(existing.map((item) => item.key));
  const seenKeys = new Map<string, number>();
  const rows: PriceBookImportRow[] = records.map((record, index) => {
    const line = index + 2;
    const { item, errors } = itemFromCsvRecord(record);
    const key = item?.key ?? (record.key ?? '').trim();
    const firstLine = seenKeys.get(key);
    if (key && firstLine !== undefined)
      errors.push({ field: 'key', message: `"${key}" is already on line ${firstLine}` });
    else if (key) seenKeys.set(key, line);
    return {
      line,
      action: existingKeys.has(key) ? 'update' : 'create',
      item: errors.length === 0 ? item : null,
      raw: record,
      errors,
    };
  });
  return {
    rows,
    summary: {
      total: rows.length,
      create: rows.filter((r) => r.action === 'create').length,
      update: rows.filter((r) => r.action === 'update').length,
      withErrors: rows.filter((r) => r.errors.length > 0).length,
    },
    imported: false,
  };
}

export function createPriceBookImportService(sequelize: Sequelize) {
  return async function importCsv(
    ctx: RequestContext,
    input: PriceBookImportInput,
  ): Promise<PriceBookImportPreview> {
    if (input.dryRun) return preview(input.csv, await listAllPriceBookItems(ctx));
    return inTransaction(sequelize, async (tx) => {
      const existing = await listAllPriceBookItems(ctx, tx);
      const result = preview(input.csv, existing);
      const failed = result.rows.filter((row) => row.errors.length > 0);
      if (failed.length > 0)
        throw new AppError(
          'UNPROCESSABLE',
          `Nothing was imported: ${failed.length} row(s) have errors (first on line ${failed[0]?.line})`,
          {
            errors: failed.flatMap((row) =>
              row.errors.map((e) => ({ path: `line ${row.line}: ${e.field}`, message: e.message })),
            ),
          },
        );
      const idByKey = new Map(existing.map((item) => [item.key, item.id]));
      for (const row of result.rows) {
        if (!row.item) continue;
        const id = idByKey.get(row.item.key);
        if (id) await updatePriceBookItem(ctx, id, row.item, tx);
        else await createPriceBookItem(ctx, row.item, tx);
      }
      await recordAuditEvent(
        ctx,
        {
          action: 'price_book.imported',
          entity: 'price_book',
          entityId: null,
          data: result.summary,
        },
        tx,
      );
      return { ...result, imported: true };
    });
  };
}
