// Payments, credit notes and pay links of invoices (migration 0014).
import type { RequestContext } from '../../context.js';
import { CreditNoteModel, InvoiceLinkModel, PaymentModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

export type PaymentRow = PaymentModel['_attributes'];
export type CreditNoteRow = CreditNoteModel['_attributes'];
export type InvoiceLinkRow = InvoiceLinkModel['_attributes'];

const paymentOf = (row: PaymentRow): PaymentRow => ({
  ...row,
  amountCents: Number(row.amountCents),
  refundedCents: Number(row.refundedCents),
});
const creditOf = (row: CreditNoteRow): CreditNoteRow => ({
  ...row,
  amountCents: Number(row.amountCents),
});

export async function createPayment(
  ctx: RequestContext,
  values: Omit<PaymentRow, 'id' | 'companyId' | 'createdAt' | 'refundedCents'>,
  tx: Tx,
): Promise<PaymentRow> {
  return paymentOf(await scoped(ctx, PaymentModel).create(values, tx));
}

export async function findPaymentByIntent(
  ctx: RequestContext,
  paymentIntentId: string,
  tx?: Tx,
): Promise<PaymentRow | null> {
  const [row] = await scoped(ctx, PaymentModel).findAll({
    where: { processorPaymentIntentId: paymentIntentId },
    // A locking read sees the latest committed row, whatever the transaction read before.
    ...(tx ? { tx, lock: true } : {}),
  });
  return row ? paymentOf(row) : null;
}

export async function listPaymentsOfInvoice(ctx: RequestContext, invoiceId: string) {
  const rows = await scoped(ctx, PaymentModel).findAll({
    where: { invoiceId },
    order: [
      ['receivedOn', 'ASC'],
      ['createdAt', 'ASC'],
    ],
  });
  return rows.map(paymentOf);
}

export async function createCreditNote(
  ctx: RequestContext,
  values: Omit<CreditNoteRow, 'id' | 'companyId' | 'createdAt'>,
  tx: Tx,
): Promise<CreditNoteRow> {
  return creditOf(await scoped(ctx, CreditNoteModel).create(values, tx));
}

export async function listCreditNotesOfInvoice(ctx: RequestContext, invoiceId: string) {
  const rows = await scoped(ctx, CreditNoteModel).findAll({
    where: { invoiceId },
    order: [['number', 'ASC']],
  });
  return rows.map(creditOf);
}

export function createInvoiceLink(
  ctx: RequestContext,
  values: { invoiceId: string; tokenHash: string; expiresAt: Date },
  tx: Tx,
): Promise<InvoiceLinkRow> {
  return scoped(ctx, InvoiceLinkModel).create({ ...values, revokedAt: null }, tx);
}

export function listLinksOfInvoice(ctx: RequestContext, invoiceId: string) {
  return scoped(ctx, InvoiceLinkModel).findAll({
    where: { invoiceId },
    order: [['createdAt', 'ASC']],
  });
}

/** Revokes the invoice's open links (a void invoice cannot be paid); returns how many. */
export async function revokeInvoiceLinks(
  ctx: RequestContext,
  invoiceId: string,
  now: Date,
  tx: Tx,
): Promise<number> {
  const links = scoped(ctx, InvoiceLinkModel);
  const open = await links.findAll({ where: { invoiceId, revokedAt: null }, tx, lock: true });
  for (const link of open) await links.update(link.id, { revokedAt: now }, tx);
  return open.length;
}

/**
 * Unscoped on purpose: the customer has no account, so the token (whose hash only the e-mailed
 * link can produce) is what identifies the company. Revoked and expired links are returned too,
 * so the caller can tell them apart (404 / 410).
 */
export async function unsafeFindInvoiceLinkByTokenHash(
  tokenHash: string,
): Promise<InvoiceLinkRow | null> {
  const row = await InvoiceLinkModel.findOne({
    where: { tokenHash },
    unscopedReason: 'the invoice link token identifies the company',
  });
  return row ? row.get({ plain: true }) : null;
}
