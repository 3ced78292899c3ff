import type { EstimateView, UpdateEstimateInput } from '@seamwright/shared';
import { formatDate } from '../../../lib/format';
import { useTurfChoices } from '../api/get-turf-products';
import { useUpdateEstimate } from '../api/update-estimate';
import { AddTierForm } from './add-tier-form';
import { EstimateStatusBadge } from './estimate-status';
import { EstimateTerms } from './estimate-terms';
import { TierSection } from './tier-section';

/** A calendar date (`2026-04-30`) as people read it; it has no time zone to move it. */
const formatDay = (isoDate: string) => formatDate(`${isoDate}T12:00:00Z`, 'UTC');

function ReadOnlyNotice({ estimate }: { estimate: EstimateView }) {
  if (estimate.status === 'draft') return null;
  const why =
    estimate.status === 'superseded'
      ? 'A newer version replaced this one; it stays as it was sent.'
      : 'This version was sent and stays as the customer saw it. To change anything, make a new version.';
  return <p className="rounded-md border border-line bg-sand-100 px-4 py-3">{why}</p>;
}

/**
 * Everything on an estimate's page below its heading: status, warnings, each option's lines
 * and totals, the terms and the rounding rule. While a draft (and the user may write) every
 * edit PATCHes and what is shown afterwards is the server's answer.
 */
export function EstimatePage({
  estimate,
  currency,
  timeZone,
  canWrite,
  onChanged,
}: {
  estimate: EstimateView;
  currency: string;
  timeZone: string;
  canWrite: boolean;
  onChanged: () => void;
}) {
  const update = useUpdateEstimate(estimate.id);
  const editable = canWrite && estimate.status === 'draft';
  const turfProducts = useTurfChoices(editable);
  const onPatch = editable
    ? async (input: UpdateEstimateInput) => {
        const next = await update.mutateAsync(input);
        onChanged();
        return next;
      }
    : undefined;
  return (
    <div className="flex max-w-5xl flex-col gap-8">
      <div className="flex flex-col gap-3">
        <p className="flex flex-wrap items-center gap-2">
          <EstimateStatusBadge status={estimate.status} />
          <span className="text-ink-muted">
            · version {estimate.version} · made {formatDate(estimate.createdAt, timeZone)}
            {estimate.sentAt ? ` · sent ${formatDate(estimate.sentAt, timeZone)}` : ''}
          </span>
        </p>
        <ReadOnlyNotice estimate={estimate} />
        {estimate.warnings.length > 0 ? (
          <section
            aria-labelledby="estimate-warnings"
            className="rounded-lg border-2 border-caution-500 bg-caution-50 p-4"
          >
            <h2 id="estimate-warnings" className="font-bold text-caution-800">
              {/* A sent version cannot change any more: say what the warnings are, not what to do. */}
              {estimate.status === 'draft'
                ? 'Check before sending'
                : 'Lines priced at 0 in this version'}
            </h2>
            <ul className="mt-2 list-disc pl-5">
              {estimate.warnings.map((warning) => (
                <li key={warning}>{warning}</li>
              ))}
            </ul>
          </section>
        ) : null}
      </div>
      {estimate.tiers.map((tier) => (
        <TierSection
          key={tier.id}
          tier={tier}
          tierCount={estimate.tiers.length}
          currency={currency}
          taxRateBasisPoints={estimate.taxRateBasisPoints}
          onPatch={onPatch}
        />
      ))}
      {onPatch ? (
        <AddTierForm tiers={estimate.tiers} turfProducts={turfProducts} onPatch={onPatch} />
      ) : null}
      <section aria-labelledby="estimate-terms" className="flex flex-col gap-3">
        <h2 id="estimate-terms" className="text-xl font-bold">
          Terms
        </h2>
        <EstimateTerms
          estimate={estimate}
          currency={currency}
          formatDay={formatDay}
          onPatch={onPatch}
        />
      </section>
      <p className="max-w-prose text-sm text-ink-muted">
        <span className="font-semibold">How the figures are rounded: </span>
        {estimate.roundingRule}
      </p>
    </div>
  );
}
