import type { PublicEstimateView } from '@seamwright/shared';
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
          <dt className="font-semibold">Estimate</dt>
          <dd>
            {view.number}
            {view.version > 1 ? `, version ${view.version}` : ''}, sent {formatDay(view.issuedOn)}
          </dd>
        </div>
        <div>
          <dt className="font-semibold">Prices good until</dt>
          <dd data-testid="valid-until">{formatDay(view.validUntil)}</dd>
        </div>
      </dl>
    </header>
  );
}
