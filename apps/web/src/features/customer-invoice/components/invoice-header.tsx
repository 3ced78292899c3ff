import type { PublicInvoiceView } from '@seamwright/shared';
import { FactGrid } from '../../../components/ui/fact-grid';
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
      <FactGrid
        facts={[
          { label: 'For', value: view.customer.name },
          { label: 'Where', value: view.siteAddress },
          { label: 'Issued', value: formatDay(view.issuedOn) },
          { label: 'Due', value: formatDay(view.dueDate), testId: 'due-date' },
        ]}
      />
    </header>
  );
}
