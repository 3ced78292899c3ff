import type { PublicEstimateTier } from '@seamwright/shared';
import { useBoundField } from '../../../components/ui/form/fields';
import { formatMoney } from '../../../lib/plain-words';

/** The labelled radio group for the option the customer takes, bound to the form's `tierId`. */
export function TierChoice({
  tiers,
  currency,
}: {
  tiers: readonly PublicEstimateTier[];
  currency: string;
}) {
  const { registration, error } = useBoundField('tierId');
  return (
    <fieldset
      className="flex flex-col gap-2"
      aria-describedby={error ? 'tier-choice-error' : undefined}
    >
      <legend className="mb-2 text-lg font-semibold">Which option do you choose?</legend>
      {tiers.map((tier) => (
        <label
          key={tier.id}
          className="flex min-h-14 cursor-pointer items-center gap-3 rounded-lg border-2 border-line bg-white px-4 py-3 has-[:checked]:border-moss-700 has-[:checked]:bg-moss-50"
        >
          <input
            type="radio"
            value={tier.id}
            className="h-6 w-6 shrink-0 accent-moss-700"
            {...registration}
          />
          <span className="flex-1 font-semibold">{tier.name}</span>
          <span className="tabular-nums">{formatMoney(tier.totalCents, currency)}</span>
        </label>
      ))}
      {error ? (
        <p id="tier-choice-error" className="font-semibold text-brick-700" role="alert">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}
