// Invoiced and collected per calendar month of the period, one statement each.
import type { MonthAmount } from '@seamwright/shared';
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { scopedSql } from '../../db/tenant-scope.js';
import type { DashboardRange } from './dashboard-range.js';

interface MonthRow {
  month: string;
  cents: string | number;
}
const toMonths = (rows: MonthRow[]): MonthAmount[] =>
  rows.map((r) => ({ month: r.month, cents: Number(r.cents) }));

/**
 * Totals (tax included) of the invoices issued in each month: sent, partly paid or paid, never
 * drafts or void ones. Credit notes are not taken off here (they show in the balances).
 * Index `invoices_company_issued` (migration 0020) covers it.
 */
export async function invoicedByMonth(
  ctx: RequestContext,
  sequelize: Sequelize,
  range: DashboardRange,
): Promise<MonthAmount[]> {
  const rows = await scopedSql(ctx, sequelize).select<MonthRow>(
    `SELECT DATE_FORMAT(issued_on, '%Y-%m') AS month, SUM(total_cents) AS cents
       FROM invoices
      WHERE company_id = :companyId AND issued_on BETWEEN :from AND :to
        AND status IN ('sent', 'partly_paid', 'paid')
      GROUP BY month ORDER BY month`,
    { from: range.from, to: range.to },
  );
  return toMonths(rows);
}

/**
 * Payments received in each month, net of what was refunded of them (a refund counts in the
 * month of the payment it returns). Index `payments_company_received` (0020) covers it.
 */
export async function collectedByMonth(
  ctx: RequestContext,
  sequelize: Sequelize,
  range: DashboardRange,
): Promise<MonthAmount[]> {
  const rows = await scopedSql(ctx, sequelize).select<MonthRow>(
    `SELECT DATE_FORMAT(received_on, '%Y-%m') AS month,
            SUM(amount_cents - refunded_cents) AS cents
       FROM payments
      WHERE company_id = :companyId AND received_on BETWEEN :from AND :to
      GROUP BY month ORDER BY month`,
    { from: range.from, to: range.to },
  );
  return toMonths(rows);
}
