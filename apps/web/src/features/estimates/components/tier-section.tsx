import { useState } from 'react';
import { z } from 'zod';
import type {
  EstimateLine,
  EstimateTier,
  EstimateView,
  UpdateEstimateInput,
} from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Form, SubmitButton, TextField } from '../../../components/ui/form';
import { AddLineForm } from './add-line-form';
import { TierLinesTable } from './tier-lines-table';
import { TierTotals } from './tier-totals';

const renameSchema = z.object({
  name: z.string().trim().min(1, 'Give the option a name').max(80, 'At most 80 characters'),
});

interface TierSectionProps {
  tier: EstimateTier;
  /** Shown as a heading only when the estimate offers more than one option. */
  tierCount: number;
  currency: string;
  taxRateBasisPoints: number;
  /** Given while the estimate is a draft the user may change; each call PATCHes. */
  onPatch?: (input: UpdateEstimateInput) => Promise<EstimateView>;
}

/** One tier (an option the customer can choose): its lines, totals and, in a draft, its edits. */
export function TierSection({
  tier,
  tierCount,
  currency,
  taxRateBasisPoints,
  onPatch,
}: TierSectionProps) {
  const [renaming, setRenaming] = useState(false);
  const [removingTier, setRemovingTier] = useState(false);
  const [removingLine, setRemovingLine] = useState<EstimateLine | null>(null);
  const [busy, setBusy] = useState(false);
  // A refused removal (forms show their own refusals in their alert).
  const [refusal, setRefusal] = useState<string | null>(null);
  const headingId = `tier-${tier.id}`;

  async function run(input: UpdateEstimateInput) {
    if (!onPatch) return;
    setBusy(true);
    setRefusal(null);
    try {
      await onPatch(input);
    } catch (error) {
      setRefusal(error instanceof Error ? error.message : 'Not saved. Please try again.');
    } finally {
      setBusy(false);
    }
  }

  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id={headingId} tabIndex={-1} className="text-xl font-bold">
          {tier.name}
        </h2>
        {onPatch && !renaming ? (
          <div className="flex flex-wrap gap-2 print:hidden">
            <Button variant="quiet" onClick={() => setRenaming(true)}>
              Rename<span className="sr-only"> {tier.name}</span>
            </Button>
            {tierCount > 1 ? (
              <Button variant="quietDanger" onClick={() => setRemovingTier(true)}>
                Remove option<span className="sr-only"> {tier.name}</span>
              </Button>
            ) : null}
          </div>
        ) : null}
      </div>
      <FormAlert>{refusal}</FormAlert>
      {onPatch && renaming ? (
        <Form
          schema={renameSchema}
          defaultValues={{ name: tier.name }}
          aria-label={`Rename ${tier.name}`}
          className="sm:flex-row sm:items-end"
          onSubmit={async (values) => {
            await onPatch({ tiers: { rename: [{ id: tier.id, name: values.name }] } });
            setRenaming(false);
          }}
        >
          <TextField name="name" label="Option name" />
          <div className="flex gap-2">
            <SubmitButton>Save name</SubmitButton>
            <Button variant="secondary" onClick={() => setRenaming(false)}>
              Cancel
            </Button>
          </div>
        </Form>
      ) : null}
      <TierLinesTable
        tier={tier}
        currency={currency}
        edit={
          onPatch
            ? {
                onSave: async (update) => {
                  const next = await onPatch({ lines: { update } });
                  return next.tiers.find((entry) => entry.id === tier.id)?.lines ?? tier.lines;
                },
                onRemove: setRemovingLine,
              }
            : undefined
        }
      />
      {onPatch ? (
        <AddLineForm
          tierId={tier.id}
          tierName={tier.name}
          onAdd={(line) => onPatch({ lines: { add: [line] } })}
        />
      ) : null}
      <TierTotals totals={tier} currency={currency} taxRateBasisPoints={taxRateBasisPoints} />
      <ConfirmDialog
        isOpen={removingLine !== null}
        title={`Remove ${removingLine?.label ?? 'the line'}?`}
        confirmLabel="Remove line"
        isBusy={busy}
        onCancel={() => setRemovingLine(null)}
        // The row and its button go with the line; focus goes to the option's heading.
        fallbackFocus={() => document.getElementById(headingId)}
        onConfirm={() => {
          const line = removingLine;
          if (line) void run({ lines: { remove: [line.id] } }).finally(() => setRemovingLine(null));
        }}
      >
        The totals are worked out again without it. You can add a line by hand afterwards.
      </ConfirmDialog>
      <ConfirmDialog
        isOpen={removingTier}
        title={`Remove the option ${tier.name}?`}
        confirmLabel="Remove option"
        isBusy={busy}
        onCancel={() => setRemovingTier(false)}
        onConfirm={() => {
          void run({ tiers: { remove: [tier.id] } }).finally(() => setRemovingTier(false));
        }}
      >
        Its lines go with it; the other options stay as they are.
      </ConfirmDialog>
    </section>
  );
}
