import { useId, useState } from 'react';
import type { EstimatingSettingsView } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { ApiError } from '../../../lib/api-client';
import { useUpdateEstimatingSettings } from '../api/estimating-settings';

const percentText = (basisPoints: number) => (basisPoints / 100).toFixed(2);
/** "8.25" → 825 basis points (whole basis points only). */
const toBasisPoints = (text: string) => Math.round(Number(text) * 100);

/** Markup, tax rate and deposit, in percent on screen and basis points on the wire. */
export function RatesForm({
  settings,
  canManage,
}: {
  settings: EstimatingSettingsView;
  canManage: boolean;
}) {
  const id = useId();
  const update = useUpdateEstimatingSettings();
  const [markup, setMarkup] = useState(percentText(settings.markupBasisPoints));
  const [tax, setTax] = useState(percentText(settings.taxRateBasisPoints));
  const deposit = settings.depositRule;
  const [depositPercent, setDepositPercent] = useState(
    deposit.kind === 'percent' ? percentText(deposit.basisPoints) : '',
  );
  const [message, setMessage] = useState<string | null>(null);

  async function save() {
    setMessage(null);
    try {
      await update.mutateAsync({
        markupBasisPoints: toBasisPoints(markup),
        taxRateBasisPoints: toBasisPoints(tax),
        ...(depositPercent !== ''
          ? { depositRule: { kind: 'percent', basisPoints: toBasisPoints(depositPercent) } }
          : {}),
      });
      setMessage('Saved.');
    } catch (failure) {
      setMessage(failure instanceof ApiError ? failure.message : 'Not saved');
    }
  }

  const field = (label: string, value: string, set: (v: string) => void, name: string) => (
    <div className="flex flex-col gap-1">
      <label htmlFor={`${id}-${name}`} className="text-sm font-semibold">
        {label}
      </label>
      <input
        id={`${id}-${name}`}
        value={value}
        inputMode="decimal"
        readOnly={!canManage}
        className="w-28 rounded border border-line-strong px-2 py-1"
        onChange={(event) => set(event.target.value)}
      />
    </div>
  );

  return (
    <form
      className="flex flex-wrap items-end gap-4 rounded-lg border border-line bg-white p-4"
      onSubmit={(event) => {
        event.preventDefault();
        void save();
      }}
    >
      {field('Markup (%)', markup, setMarkup, 'markup')}
      {field('Tax rate (%)', tax, setTax, 'tax')}
      {deposit.kind === 'percent' || canManage
        ? field('Deposit (% of the estimate)', depositPercent, setDepositPercent, 'deposit')
        : null}
      {canManage ? (
        <Button type="submit" isBusy={update.isPending}>
          Save rates
        </Button>
      ) : null}
      {message ? <p role="status">{message}</p> : null}
    </form>
  );
}
