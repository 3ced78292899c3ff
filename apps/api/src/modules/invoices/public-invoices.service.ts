// The customer's pay page (no account: the e-mailed token is the credential). The checkout
// route (built with the processor) uses findInvoiceByToken to reach the invoice.
import type { PublicInvoiceView } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { AppError, notFound } from '../../errors.js';
import { hashToken } from '../../tokens.js';
import { getInvoiceDocument } from './invoice-document-input.js';
import type { InvoiceDocument } from './invoice-document-input.js';
import { unsafeFindInvoiceLinkByTokenHash } from './invoice-money.repository.js';
import { INVOICE_ROUNDING_RULE } from '@seamwright/domain';

/** A token as createOneTimeToken makes it (32 bytes, base64url); anything else is unknown. */
const tokenShape = /^[A-Za-z0-9_-]{43}$/;

export interface InvoiceByToken {
  /** The company's context for the customer's request: no user, only this invoice is read. */
  ctx: RequestContext;
  companyId: string;
  invoiceId: string;
  linkId: string;
  document: InvoiceDocument;
}

/**
 * The invoice a pay link names, with the company's context. Unknown, malformed, tampered or
 * revoked tokens (and a voided invoice, whose links are revoked) are 404; an expired link is
 * 410 TOKEN_INVALID.
 */
export async function findInvoiceByToken(token: string, now = new Date()): Promise<InvoiceByToken> {
  const link = tokenShape.test(token)
    ? await unsafeFindInvoiceLinkByTokenHash(hashToken(token))
    : null;
  if (!link || link.revokedAt) throw notFound('Invoice');
  if (link.expiresAt.getTime() <= now.getTime())
    throw new AppError(
      'TOKEN_INVALID',
      'This invoice link has expired: ask the company for a new one',
    );
  const ctx: RequestContext = { userId: '', companyId: link.companyId, role: 'bookkeeper' };
  const document = await getInvoiceDocument(ctx, link.invoiceId);
  return { ctx, companyId: link.companyId, invoiceId: link.invoiceId, linkId: link.id, document };
}

export function toPublicInvoiceView(doc: InvoiceDocument): PublicInvoiceView {
  const { invoice } = doc;
  return {
    company: { name: doc.company.name, address: doc.company.address, phone: null, email: null },
    customer: { name: doc.customer.name },
    jobTitle: invoice.jobTitle,
    siteAddress: doc.siteAddress,
    number: invoice.number,
    reference: invoice.reference,
    kind: invoice.kind,
    status: invoice.status,
    issuedOn: invoice.issuedOn,
    dueDate: invoice.dueDate,
    currency: invoice.currency,
    lines: invoice.lines.map((l) => ({
      label: l.label,
      quantity: l.quantity,
      unit: l.unit,
      unitPriceCents: l.unitPriceCents,
      amountCents: l.amountCents,
    })),
    subtotalCents: invoice.subtotalCents,
    taxCents: invoice.taxCents,
    totalCents: invoice.totalCents,
    paidCents: invoice.paidCents - invoice.refundedCents,
    creditedCents: invoice.creditedCents,
    balanceCents: invoice.balanceCents,
    roundingRule: INVOICE_ROUNDING_RULE.sentence,
  };
}
