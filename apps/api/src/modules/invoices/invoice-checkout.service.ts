// Paying an invoice online: the customer's pay page asks for a checkout, the processor's hosted
// page takes the card, and the processor's signed webhook (not the customer's return to our
// page) records the payment. Nothing is written here: an abandoned or declined checkout leaves
// no trace on the invoice, and an unreachable processor is a 503 with nothing recorded.
import type { ServiceDeps } from '../../deps.js';
import { AppError } from '../../errors.js';
import { createCheckoutSession, processorProblem } from '../processor/index.js';
import { findInvoiceByToken } from './public-invoices.service.js';

/** The customer's pay link page, where the processor sends them back. */
function payPageUrl(deps: ServiceDeps, token: string): string {
  return `${deps.env.appUrl}/i/${encodeURIComponent(token)}`;
}

/**
 * A checkout for what is left to pay on the invoice the link names. 404/410 as the public view;
 * 409 when nothing is owed. The return URL carries the balance at the start (`owed`), so the
 * page can tell the webhook's confirmation from an old figure.
 */
export async function startInvoiceCheckout(
  deps: ServiceDeps,
  token: string,
): Promise<{ url: string }> {
  const { companyId, invoiceId, document } = await findInvoiceByToken(token);
  const { invoice, company, customer } = document;
  if (invoice.status === 'draft' || invoice.status === 'void')
    throw new AppError('CONFLICT', 'This invoice cannot be paid online');
  const owed = invoice.balanceCents;
  if (owed <= 0) throw new AppError('CONFLICT', 'This invoice is already paid in full.');
  const page = payPageUrl(deps, token);
  try {
    const session = await createCheckoutSession(deps.env.processor, {
      amountCents: owed,
      currency: invoice.currency,
      description: `Invoice ${invoice.reference} · ${company.name}`,
      customerEmail: customer.email,
      successUrl: `${page}?checkout=done&owed=${owed}&session={CHECKOUT_SESSION_ID}`,
      cancelUrl: `${page}?checkout=cancelled`,
      metadata: { companyId, invoiceId },
    });
    deps.logger.info({ companyId, invoiceId, session: session.id }, 'checkout started');
    return { url: session.url };
  } catch (error) {
    throw processorProblem(error) ?? error;
  }
}
