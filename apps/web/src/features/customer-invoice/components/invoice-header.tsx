import type { PublicInvoiceView } from '@seamwright/shared';
import { formatDay } from '../../../lib/plain-words';

const kindWords: Record<PublicInvoiceView['kind'], string> = {
  deposit: 'Deposit invoice',
  progress: 'Progress invoice',
  final: 'Invoice',
};

/** Who the invoice is from, for whom, for which work, and when it is due. */
export function InvoiceHeader({ view }: { view: PublicInvoiceView }) {
  const { company } = view;
  return (
    <header className="flex flex-col gap-4">
      <div>
        <p className="text-xl font-bold text-moss-800">{company.name}</p>
        {company.address ? (
          <address className="mt-1 not-italic text-ink-muted">{company.address}</address>
        ) : null}
      </div>
      <div>
        <h1 tabIndex={-1} className="text-3xl font-bold">
          {kindWords[view.kind]} {view.reference}
        </h1>
        <p className="mt-1 text-lg">{view.jobTitle}</p>
      </div>
      <dl className="grid grid-cols-1 gap-x-6 gap-y-2 rounded-lg bg-sand-100 p-4 sm:grid-cols-2">
        <div>
          <dt className="font-semibold">For</dt>
          <dd>{view.customer.name}</dd>
        </div>
        <div>
          <dt className="font-semibold">Where</dt>
          <dd className="whitespace-pre-line">{view.siteAddress}</dd>
        </div>
        <div>
          <dt className="font-semibold">Issued</dt>
          <dd>{formatDay(view.issuedOn)}</dd>
        </div>
        <div>
          <dt className="font-semibold">Due</dt>
          <dd data-testid="due-date">{formatDay(view.dueDate)}</dd>
        </div>
      </dl>
    </header>
  );
}
