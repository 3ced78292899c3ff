// The customer statement: every owing invoice with the payments (net of refunds) and credit
// notes recorded against it, in date order with the running balance, the customer's aging line
// and the balance due. The balance it ends on is the aging report's total for the customer:
// both come from the same invoices and the invoices module's `invoiceBalanceCents`.
import { agingBucketNames, invoiceBalanceCents, localDateOf } from '@seamwright/domain';
import type { AgingBucketName } from '@seamwright/domain';
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { notFound } from '../../errors.js';
import { findOwnCompany } from '../company/company.repository.js';
import { findCustomer } from '../customers/customers.repository.js';
import type { StatementDocumentEntry, StatementDocumentInput } from '../estimate-document/index.js';
import { creditNoteReference, invoiceReference } from '../invoices/invoice-view.js';
import { agingReport } from './aging.service.js';
import { selectStatementInvoices, selectStatementMovements } from './receivables.repository.js';

export const agingBucketLabels: Record<AgingBucketName, string> = {
  current: 'Current',
  days1to30: '1–30 days',
  days31to60: '31–60 days',
  days61to90: '61–90 days',
  over90: 'Over 90 days',
};

const methodLabels: Record<string, string> = {
  cheque: 'Cheque',
  bank_transfer: 'Bank transfer',
  cash: 'Cash',
  card: 'Card',
};

interface Entry extends Omit<StatementDocumentEntry, 'balanceCents'> {
  order: number;
}

/** 404 for another company's customer (or an unknown one). */
export async function buildStatement(
  ctx: RequestContext,
  sequelize: Sequelize,
  customerId: string,
  now = new Date(),
): Promise<StatementDocumentInput> {
  const [company, customer] = await Promise.all([
    findOwnCompany(ctx),
    findCustomer(ctx, customerId),
  ]);
  if (!company || !customer) throw notFound('Customer');
  const asOf = localDateOf(now, company.timeZone);
  const [invoices, movements, aging] = await Promise.all([
    selectStatementInvoices(ctx, sequelize, customerId, asOf),
    selectStatementMovements(ctx, sequelize, customerId, asOf),
    agingReport(ctx, sequelize, asOf, customerId),
  ]);
  const entries: Entry[] = [
    ...invoices.map((i) => ({
      date: i.issuedOn,
      order: 0,
      label: `Invoice ${invoiceReference(i.number)} (due ${i.dueDate})`,
      chargeCents: i.totalCents,
      creditCents: 0,
    })),
    ...movements.map((m) => ({
      date: m.day,
      order: 1,
      label:
        m.kind === 'payment'
          ? `Payment on ${invoiceReference(m.invoiceNumber)} (${methodLabels[m.method ?? ''] ?? m.method ?? ''})`
          : `Credit ${creditNoteReference(m.creditNumber ?? 0)} on ${invoiceReference(m.invoiceNumber)}`,
      chargeCents: 0,
      creditCents: m.cents,
    })),
  ].sort((a, b) => a.date.localeCompare(b.date) || a.order - b.order);
  let running = 0;
  const withBalance = entries.map(({ order: _order, ...entry }) => {
    running += entry.chargeCents - entry.creditCents;
    return { ...entry, balanceCents: running };
  });
  const balanceCents = invoices.reduce((sum, i) => sum + invoiceBalanceCents(i), 0);
  const customerAging = aging.customers[0];
  return {
    company: { name: company.name, address: company.address, phone: null, email: null },
    customer: {
      name: customer.name,
      email: customer.email,
      billingAddress: customer.billingAddress,
    },
    issuedOn: asOf,
    currency: company.currency,
    entries: withBalance,
    aging: agingBucketNames.map((name) => ({
      label: agingBucketLabels[name],
      cents: customerAging?.buckets[name] ?? 0,
    })),
    balanceCents,
  };
}
