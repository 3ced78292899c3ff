import { useEffect, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useDocumentTitle } from '../../../lib/page-title';
import { usePublicInvoice } from '../api/public-invoice';
import {
  checkoutReturnOf,
  confirmPollMs,
  confirmWindowMs,
  payPanelStateOf,
} from '../utils/pay-state';
import { InvoiceAmounts } from './invoice-amounts';
import { InvoiceHeader } from './invoice-header';
import { PayPanel } from './pay-panel';

/**
 * The homeowner's invoice, opened from the e-mail's link: who, what for, what is left to pay,
 * and the way to pay it. Coming back from the processor's page, it waits for the server to
 * hear of the payment (by webhook) before it says "paid".
 */
export function CustomerInvoicePage({ token }: { token: string }) {
  const [search] = useSearchParams();
  const returned = checkoutReturnOf(search);
  const [windowOver, setWindowOver] = useState(false);
  // The balance when the customer left to pay; a lower one is the server's confirmation.
  const balanceAtReturn = balanceBeforePaying(search);
  const waiting = returned === 'done' && !windowOver;
  const query = usePublicInvoice(token, waiting ? confirmPollMs : false);
  const view = query.data;
  useDocumentTitle(view ? `Invoice from ${view.company.name}` : 'Invoice');
  useEffect(() => {
    if (returned !== 'done') return;
    const timer = setTimeout(() => setWindowOver(true), confirmWindowMs);
    return () => clearTimeout(timer);
  }, [returned]);
  if (query.error) throw query.error;
  if (!view) return null;
  const state = payPanelStateOf(view, returned, windowOver, balanceAtReturn);
  return (
    <div className="min-h-dvh bg-sand-100 px-3 py-6 sm:px-6 sm:py-10">
      <main className="mx-auto flex w-full max-w-3xl flex-col gap-8 rounded-xl border border-line bg-white p-4 shadow-sm sm:p-8">
        <InvoiceHeader view={view} />
        <PayPanel token={token} view={view} state={state} />
        <InvoiceAmounts view={view} />
      </main>
    </div>
  );
}

/**
 * The balance before paying travels in the return URL (`owed=`, set by the checkout route), so
 * a webhook that landed before the page loaded still reads as a change. Without it, only a
 * balance of zero counts as confirmed.
 */
function balanceBeforePaying(search: URLSearchParams): number | null {
  const owed = Number(search.get('owed'));
  return Number.isInteger(owed) && owed > 0 ? owed : null;
}
