import type { PublicEstimateView } from '@seamwright/shared';
import { FactGrid } from '../../../components/ui/fact-grid';
import { formatDay } from '../../../lib/plain-words';

/** Who the estimate is from, for whom and where, and how long its prices hold. */
export function EstimateHeader({ view }: { view: PublicEstimateView }) {
  const { company } = view;
  return (
    <header className="flex flex-col gap-4">
      <div>
        <p className="text-xl font-bold text-moss-800">{company.name}</p>
        <address className="mt-1 flex flex-col not-italic text-ink-muted">
          {company.address ? <span>{company.address}</span> : null}
          {company.phone ? (
            <a className="min-h-11 py-2 sm:min-h-0 sm:py-0" href={`tel:${company.phone}`}>
              {company.phone}
            </a>
          ) : null}
          {company.email ? (
            <a
              className="min-h-11 break-all py-2 sm:min-h-0 sm:py-0"
              href={`mailto:${company.email}`}
            >
              {company.email}
            </a>
          ) : null}
        </address>
      </div>
      <div>
        <h1 tabIndex={-1} className="text-3xl font-bold">
          Your estimate
        </h1>
        <p className="mt-1 text-lg">{view.jobTitle}</p>
      </div>
      <FactGrid
        facts={[
          { label: 'For', value: view.customer.name },
          { label: 'Where', value: view.siteAddress },
          {
            label: 'Estimate',
            value: `${view.number}${view.version > 1 ? `, version ${view.version}` : ''}, sent ${formatDay(view.issuedOn)}`,
          },
          { label: 'Prices good until', value: formatDay(view.validUntil), testId: 'valid-until' },
        ]}
      />
    </header>
  );
}
