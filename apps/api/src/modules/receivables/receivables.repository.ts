// The SQL of the receivables reports, one statement each, through scopedSql (every table
// restricted to the context's company).
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { scopedSql } from '../../db/tenant-scope.js';

/** Stored statuses that can still owe money; `settledStatus` makes any invoice owing nothing `paid`. */
export const owingStatuses = ['sent', 'partly_paid'] as const;

/**
 * Days past due are capped to [0, agingDaysCap]: every bucket edge of `agingBucketFor` lies
 * inside that span (0 is the last current day, 91 the first of over 90; a unit test beside the
 * aging service checks both), so the cap never moves an invoice to another bucket, and an old
 * debt folds into one row per customer instead of one per due day.
 */
export const agingDaysCap = 91;

/** Kept totals of one customer's owing invoices that are `daysPastDue` (capped) late. */
export interface OwingGroup {
  customerId: string;
  customerName: string;
  daysPastDue: number;
  totalCents: number;
  paidCents: number;
  refundedCents: number;
  creditedCents: number;
}

interface OwingGroupRow {
  customerId: string;
  customerName: string;
  daysPastDue: number | string;
  totalCents: string | number;
  paidCents: string | number;
  refundedCents: string | number;
  creditedCents: string | number;
}

/**
 * What each customer owes per (capped) day count past due, on invoices issued by `asOf`. The
 * kept totals are summed per group, not per invoice: the balance is linear in them, and every
 * summed invoice owes more than 0 (`settledStatus` turns one that owes nothing into `paid`), so
 * the balance of the sums is exactly the sum of the invoices' balances. Grouped first on the
 * covering index `invoices_company_owing` (migration 0020), then joined to the customers.
 */
export async function selectOwingGroups(
  ctx: RequestContext,
  sequelize: Sequelize,
  asOf: string,
  customerId?: string,
): Promise<OwingGroup[]> {
  const rows = await scopedSql(ctx, sequelize).select<OwingGroupRow>(
    `SELECT g.customer_id AS customerId, c.name AS customerName, g.days AS daysPastDue,
            g.total AS totalCents, g.paid AS paidCents, g.refunded AS refundedCents,
            g.credited AS creditedCents
       FROM (SELECT i.customer_id,
                    LEAST(GREATEST(DATEDIFF(:asOf, i.due_date), 0), :cap) AS days,
                    SUM(i.total_cents) AS total, SUM(i.paid_cents) AS paid,
                    SUM(i.refunded_cents) AS refunded, SUM(i.credited_cents) AS credited
               FROM invoices i
              WHERE i.company_id = :companyId AND i.status IN (:statuses)
                AND i.issued_on <= :asOf
                ${customerId ? 'AND i.customer_id = :customerId' : ''}
              GROUP BY i.customer_id, days) g
       JOIN customers c ON c.company_id = :companyId AND c.id = g.customer_id`,
    { statuses: [...owingStatuses], asOf, customerId, cap: agingDaysCap },
  );
  return rows.map((r) => ({
    customerId: r.customerId,
    customerName: r.customerName,
    daysPastDue: Number(r.daysPastDue),
    totalCents: Number(r.totalCents),
    paidCents: Number(r.paidCents),
    refundedCents: Number(r.refundedCents),
    creditedCents: Number(r.creditedCents),
  }));
}

export interface StatementInvoiceRow {
  id: string;
  number: number;
  issuedOn: string;
  dueDate: string;
  totalCents: number;
  paidCents: number;
  refundedCents: number;
  creditedCents: number;
}

export interface StatementMovementRow {
  invoiceNumber: number;
  kind: 'payment' | 'credit';
  day: string;
  /** Net of refunds for a payment. */
  cents: number;
  method: string | null;
  creditNumber: number | null;
}

const cents = (value: unknown) => Number(value);

/** The customer's owing invoices issued by `asOf`, by issue day then number. */
export async function selectStatementInvoices(
  ctx: RequestContext,
  sequelize: Sequelize,
  customerId: string,
  asOf: string,
): Promise<StatementInvoiceRow[]> {
  const rows = await scopedSql(ctx, sequelize).select<StatementInvoiceRow>(
    `SELECT id, number, DATE_FORMAT(issued_on, '%Y-%m-%d') AS issuedOn,
            DATE_FORMAT(due_date, '%Y-%m-%d') AS dueDate, total_cents AS totalCents,
            paid_cents AS paidCents, refunded_cents AS refundedCents,
            credited_cents AS creditedCents
       FROM invoices
      WHERE company_id = :companyId AND customer_id = :customerId AND status IN (:statuses)
        AND issued_on <= :asOf
      ORDER BY issued_on, number`,
    { customerId, asOf, statuses: [...owingStatuses] },
  );
  return rows.map((r) => ({
    ...r,
    number: Number(r.number),
    totalCents: cents(r.totalCents),
    paidCents: cents(r.paidCents),
    refundedCents: cents(r.refundedCents),
    creditedCents: cents(r.creditedCents),
  }));
}

/** Payments (net of refunds) and credit notes on the customer's owing invoices, in one UNION. */
export async function selectStatementMovements(
  ctx: RequestContext,
  sequelize: Sequelize,
  customerId: string,
  asOf: string,
): Promise<StatementMovementRow[]> {
  const rows = await scopedSql(ctx, sequelize).select<StatementMovementRow>(
    `SELECT i.number AS invoiceNumber, 'payment' AS kind,
            DATE_FORMAT(p.received_on, '%Y-%m-%d') AS day,
            p.amount_cents - p.refunded_cents AS cents, p.method, NULL AS creditNumber
       FROM payments p
       JOIN invoices i ON i.company_id = p.company_id AND i.id = p.invoice_id
      WHERE p.company_id = :companyId AND i.customer_id = :customerId
        AND i.status IN (:statuses) AND i.issued_on <= :asOf
     UNION ALL
     SELECT i.number, 'credit', DATE_FORMAT(n.issued_on, '%Y-%m-%d'), n.amount_cents, NULL, n.number
       FROM credit_notes n
       JOIN invoices i ON i.company_id = n.company_id AND i.id = n.invoice_id
      WHERE n.company_id = :companyId AND i.customer_id = :customerId
        AND i.status IN (:statuses) AND i.issued_on <= :asOf`,
    { customerId, asOf, statuses: [...owingStatuses] },
  );
  return rows.map((r) => ({
    ...r,
    invoiceNumber: Number(r.invoiceNumber),
    cents: cents(r.cents),
    creditNumber: r.creditNumber === null ? null : Number(r.creditNumber),
  }));
}
