// The aging report: the SQL sums what is owed per customer and due day, the pure
// `ageReceivables` (packages/domain) buckets it, and the balance is the invoices module's own
// `invoiceBalanceCents`, so nothing is counted or rounded differently in two places.
import {
  addCalendarDays,
  ageReceivables,
  invoiceBalanceCents,
  localDateOf,
} from '@seamwright/domain';
import type { AgingReportView } from '@seamwright/shared';
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { findOwnCompany } from '../company/company.repository.js';
import { selectOwingGroups } from './receivables.repository.js';

/** `asOf`, or today in the company's time zone (one more statement) when absent. */
export async function resolveAsOf(ctx: RequestContext, asOf: string | undefined, now = new Date()) {
  if (asOf) return asOf;
  const company = await findOwnCompany(ctx);
  return localDateOf(now, company?.timeZone ?? 'UTC');
}

/**
 * Aging as of `asOf`: invoices issued on or before it, aged by their due day, at the balances
 * kept today (payments recorded after `asOf` are not taken back out).
 */
export async function agingReport(
  ctx: RequestContext,
  sequelize: Sequelize,
  asOf: string,
  customerId?: string,
): Promise<AgingReportView> {
  const groups = await selectOwingGroups(ctx, sequelize, asOf, customerId);
  return ageReceivables(
    groups.map((g) => ({
      customerId: g.customerId,
      customerName: g.customerName,
      // The due day that is `daysPastDue` before asOf: ageReceivables counts the days again.
      dueDate: addCalendarDays(asOf, -g.daysPastDue),
      balanceCents: invoiceBalanceCents(g),
    })),
    asOf,
  );
}
