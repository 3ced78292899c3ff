// Invoices and their lines (migration 0014), always through scoped() or scopedSql().
import { Op, literal } from 'sequelize';
import type { Includeable, Sequelize, WhereOptions } from 'sequelize';
import type { InvoiceListQuery } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { CustomerModel, InvoiceLineModel, InvoiceModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped, scopedSql } from '../../db/tenant-scope.js';

export type InvoiceRow = InvoiceModel['_attributes'];
export type InvoiceLineRow = InvoiceLineModel['_attributes'];
export interface InvoiceWithCustomer extends InvoiceRow {
  customer: { id: string; name: string };
}

// Joined through the (company_id, customer_id) foreign key, so the customer is the invoice's
// own company's.
const customerJoin: Includeable[] = [
  { model: CustomerModel, as: 'customer', attributes: ['id', 'name'] },
];

/** BIGINT and DECIMAL come back from the driver as strings or bigints: cents stay below 2^53. */
export function normaliseInvoice<T extends InvoiceRow>(row: T): T {
  return {
    ...row,
    subtotalCents: Number(row.subtotalCents),
    taxCents: Number(row.taxCents),
    totalCents: Number(row.totalCents),
    paidCents: Number(row.paidCents),
    refundedCents: Number(row.refundedCents),
    creditedCents: Number(row.creditedCents),
  };
}

/**
 * Makes the company's counter row if it has none, in its own short transaction, before the
 * transaction that takes a number: that one then only ever locks an existing row by its key
 * (no gap locks, and no second pool connection while it holds one).
 */
export async function ensureInvoiceCounter(ctx: RequestContext, sequelize: Sequelize) {
  const sql = scopedSql(ctx, sequelize);
  await sequelize.transaction((own) =>
    sql.execute('INSERT IGNORE INTO invoice_counters (company_id) VALUES (:companyId)', {}, own),
  );
}

/**
 * Takes the next invoice or credit-note number of the company inside `tx`: the counter row is
 * locked (SELECT … FOR UPDATE) until `tx` ends, so numbers are handed out one at a time and a
 * rolled-back transaction gives its number back (no gaps). Call ensureInvoiceCounter first.
 */
export async function takeNumber(
  ctx: RequestContext,
  sequelize: Sequelize,
  sequence: 'invoice' | 'credit_note',
  tx: Tx,
): Promise<number> {
  const sql = scopedSql(ctx, sequelize);
  const column = sequence === 'invoice' ? 'next_number' : 'next_credit_note_number';
  const [row] = await sql.select<{ next: number }>(
    `SELECT ${column} AS next FROM invoice_counters WHERE company_id = :companyId FOR UPDATE`,
    {},
    tx,
  );
  if (!row) throw new Error('The invoice counter row is missing: call ensureInvoiceCounter');
  await sql.execute(
    `UPDATE invoice_counters SET ${column} = ${column} + 1 WHERE company_id = :companyId`,
    {},
    tx,
  );
  return Number(row.next);
}

export async function createInvoiceRow(
  ctx: RequestContext,
  values: Omit<
    InvoiceRow,
    'id' | 'companyId' | 'createdAt' | 'updatedAt' | 'paidCents' | 'refundedCents' | 'creditedCents'
  >,
  lines: Omit<InvoiceLineRow, 'id' | 'companyId' | 'invoiceId' | 'position'>[],
  tx: Tx,
): Promise<InvoiceRow> {
  const invoice = await scoped(ctx, InvoiceModel).create(values, tx);
  const lineTable = scoped(ctx, InvoiceLineModel);
  for (const [position, line] of lines.entries())
    await lineTable.create({ ...line, invoiceId: invoice.id, position }, tx);
  return normaliseInvoice(invoice);
}

export async function findInvoice(
  ctx: RequestContext,
  id: string,
  options: { tx?: Tx; lock?: boolean } = {},
): Promise<InvoiceWithCustomer | null> {
  const row = (await scoped(ctx, InvoiceModel).findById(id, {
    ...options,
    // A locking read takes the invoice row only (FOR UPDATE over a join would lock the customer).
    ...(options.lock ? {} : { include: customerJoin }),
  })) as InvoiceWithCustomer | null;
  return row ? normaliseInvoice(row) : null;
}

/** The invoice row, locked until `tx` ends (payments, credits and void read, then write). */
export async function lockInvoice(ctx: RequestContext, id: string, tx: Tx) {
  const row = await scoped(ctx, InvoiceModel).findById(id, { tx, lock: true });
  return row ? normaliseInvoice(row) : null;
}

export function updateInvoice(
  ctx: RequestContext,
  id: string,
  values: Partial<Omit<InvoiceRow, 'id' | 'companyId'>>,
  tx: Tx,
) {
  return scoped(ctx, InvoiceModel).update(id, values, tx);
}

export async function listLinesOfInvoice(ctx: RequestContext, invoiceId: string, tx?: Tx) {
  const rows = await scoped(ctx, InvoiceLineModel).findAll({
    where: { invoiceId },
    order: [['position', 'ASC']],
    ...(tx ? { tx } : {}),
  });
  return rows.map((l) => ({
    ...l,
    quantity: Number(l.quantity),
    unitPriceCents: Number(l.unitPriceCents),
    amountCents: Number(l.amountCents),
  }));
}

/** The job's invoices, oldest first (under the job lock when `tx` holds it). */
export async function listInvoicesOfJob(ctx: RequestContext, jobId: string, tx?: Tx) {
  const rows = await scoped(ctx, InvoiceModel).findAll({
    where: { jobId },
    order: [['number', 'ASC']],
    ...(tx ? { tx } : {}),
  });
  return rows.map(normaliseInvoice);
}

function listWhere(query: InvoiceListQuery, today: string): WhereOptions<InvoiceRow> {
  const where: Record<string | symbol, unknown> = {};
  if (query.customerId) where.customerId = query.customerId;
  if (query.jobId) where.jobId = query.jobId;
  if (query.status.length > 0) {
    // `overdue` is sent or partly paid past the due day; sent and partly paid mean not yet due.
    const open = { [Op.gte]: today };
    const any: Record<string, unknown>[] = [];
    for (const status of query.status) {
      if (status === 'overdue')
        any.push({ status: ['sent', 'partly_paid'], dueDate: { [Op.lt]: today } });
      else if (status === 'sent' || status === 'partly_paid') any.push({ status, dueDate: open });
      else any.push({ status });
    }
    where[Op.or] = any;
  }
  return where;
}

/** One page (newest number first) and the total in one statement, like the jobs list. */
export async function listInvoices(ctx: RequestContext, query: InvoiceListQuery, today: string) {
  const invoices = scoped(ctx, InvoiceModel);
  const where = listWhere(query, today);
  const rows = (await invoices.findAll({
    where,
    include: customerJoin,
    attributes: { include: [[literal('COUNT(*) OVER ()'), 'totalRows']] },
    order: [['number', 'DESC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  })) as (InvoiceWithCustomer & { totalRows: number | bigint | string })[];
  const first = rows[0];
  const total = first ? Number(first.totalRows) : query.page > 1 ? await invoices.count(where) : 0;
  return { rows: rows.map(normaliseInvoice), total };
}
