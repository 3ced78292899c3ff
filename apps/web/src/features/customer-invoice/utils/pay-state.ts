import type { PublicInvoiceView } from '@seamwright/shared';
import { ApiError } from '../../../lib/api-error';

/** What the processor's page said when it sent the customer back (our own return URLs). */
export type CheckoutReturn = 'done' | 'cancelled' | null;

export function checkoutReturnOf(search: URLSearchParams): CheckoutReturn {
  const value = search.get('checkout');
  return value === 'done' || value === 'cancelled' ? value : null;
}

/** How long the page keeps asking whether a returned payment has been confirmed. */
export const confirmWindowMs = 60_000;
export const confirmPollMs = 2_000;

export type PayPanelState =
  | { kind: 'paid' }
  | { kind: 'confirming' }
  | { kind: 'unconfirmed' }
  | { kind: 'open'; balanceCents: number; cancelled: boolean };

/**
 * What the pay panel shows. A customer sent back after paying sees "confirming" until the
 * server has the processor's word (the webhook), or until the window passes; the amount is
 * never shown as paid on the page's own say-so.
 */
export function payPanelStateOf(
  view: PublicInvoiceView,
  returned: CheckoutReturn,
  confirmWindowOver: boolean,
  balanceAtReturn: number | null,
): PayPanelState {
  if (view.balanceCents <= 0 || view.status === 'paid') return { kind: 'paid' };
  if (returned === 'done') {
    const moved = balanceAtReturn !== null && view.balanceCents < balanceAtReturn;
    if (!moved) return confirmWindowOver ? { kind: 'unconfirmed' } : { kind: 'confirming' };
  }
  return { kind: 'open', balanceCents: view.balanceCents, cancelled: returned === 'cancelled' };
}

/** A link the page cannot use, in the customer's terms. */
export type DeadInvoiceLink = 'unknown' | 'expired';

export function deadInvoiceLinkOf(error: unknown): DeadInvoiceLink | null {
  if (!(error instanceof ApiError)) return null;
  if (error.status === 404) return 'unknown';
  if (error.status === 410) return 'expired';
  return null;
}

export const deadInvoiceLinkWords: Record<DeadInvoiceLink, { title: string; text: string }> = {
  unknown: {
    title: 'This invoice link does not work',
    text: 'The link may be mistyped, or the company may have cancelled the invoice or sent a newer link. Check your e-mail for a newer message, or contact the company.',
  },
  expired: {
    title: 'This invoice link has expired',
    text: 'Links to pay online last a limited time. Contact the company and ask for a new one.',
  },
};

/** Why starting a payment failed, in words; nothing was charged in any of these cases. */
export function checkoutProblemWords(error: unknown, companyName: string): string {
  if (error instanceof ApiError && error.status === 503)
    return `Paying online is not available at the moment. Nothing was charged. Try again in a few minutes, or contact ${companyName} to pay another way.`;
  if (error instanceof ApiError && error.status === 409)
    return `${error.detail} Nothing was charged.`;
  if (error instanceof ApiError && error.status === 429)
    return 'Too many attempts from here in a short time. Wait a minute and try again. Nothing was charged.';
  return `The payment could not be started. Nothing was charged. Try again, or contact ${companyName}.`;
}
