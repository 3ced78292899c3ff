// Rows of the accountant's CSV exports: issued invoices and received payments in a range of
// calendar days (both ends included), each in one statement.
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { scopedSql } from '../../db/tenant-scope.js';

export interface ExportRange {
  from?: string | undefined;
  to?: string | undefined;
}

export interface InvoiceExportRow {
  number: number;
  kind: string;
  status: string;
  issuedOn: string;
  dueDate: string;
  customerName: string;
  currency: string;
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  paidCents: number;
  refundedCents: number;
  creditedCents: number;
}

export interface PaymentExportRow {
  receivedOn: string;
  invoiceNumber: number;
  customerName: string;
  method: string;
  reference: string | null;
  currency: string;
  amountCents: number;
  refundedCents: number;
}

function rangeSql(column: string, range: ExportRange): string {
  return [range.from ? `AND ${column} >= :from` : '', range.to ? `AND ${column} <= :to` : ''].join(
    ' ',
  );
}

const day = (column: string) => `DATE_FORMAT(${column}, '%Y-%m-%d')`;

/** Every invoice given a number and sent (drafts are not yet the accountant's), by number. */
export async function selectInvoicesForExport(
  ctx: RequestContext,
  sequelize: Sequelize,
  range: ExportRange,
): Promise<InvoiceExportRow[]> {
  const rows = await scopedSql(ctx, sequelize).select<InvoiceExportRow>(
    `SELECT i.number, i.kind, i.status, ${day('i.issued_on')} AS issuedOn,
            ${day('i.due_date')} AS dueDate, c.name AS customerName, i.currency,
            i.subtotal_cents AS subtotalCents, i.tax_cents AS taxCents,
            i.total_cents AS totalCents, i.paid_cents AS paidCents,
            i.refunded_cents AS refundedCents, i.credited_cents AS creditedCents
       FROM invoices i
       JOIN customers c ON c.company_id = i.company_id AND c.id = i.customer_id
      WHERE i.company_id = :companyId AND i.status <> 'draft' ${rangeSql('i.issued_on', range)}
      ORDER BY i.number`,
    { ...range },
  );
  return rows.map((r) => ({
    ...r,
    number: Number(r.number),
    subtotalCents: Number(r.subtotalCents),
    taxCents: Number(r.taxCents),
    totalCents: Number(r.totalCents),
    paidCents: Number(r.paidCents),
    refundedCents: Number(r.refundedCents),
    creditedCents: Number(r.creditedCents),
  }));
}

/** Every payment received in the range, by day, then invoice number. */
export async function selectPaymentsForExport(
  ctx: RequestContext,
  sequelize: Sequelize,
  range: ExportRange,
): Promise<PaymentExportRow[]> {
  const rows = await scopedSql(ctx, sequelize).select<PaymentExportRow>(
    `SELECT ${day('p.received_on')} AS receivedOn, i.number AS invoiceNumber,
            c.name AS customerName, p.method, p.reference, i.currency,
            p.amount_cents AS amountCents, p.refunded_cents AS refundedCents
       FROM payments p
       JOIN invoices i ON i.company_id = p.company_id AND i.id = p.invoice_id
       JOIN customers c ON c.company_id = i.company_id AND c.id = i.customer_id
      WHERE p.company_id = :companyId ${rangeSql('p.received_on', range)}
      ORDER BY p.received_on, i.number, p.created_at`,
    { ...range },
  );
  return rows.map((r) => ({
    ...r,
    invoiceNumber: Number(r.invoiceNumber),
    amountCents: Number(r.amountCents),
    refundedCents: Number(r.refundedCents),
  }));
}
