import { useWatch } from 'react-hook-form';
import type { EstimateView, UpdateEstimateInput } from '@seamwright/shared';
import { Form, SubmitButton, TextAreaField, TextField } from '../../../components/ui/form';
import { useBoundField } from '../../../components/ui/form/fields';
import { formatCents } from '../../../lib/money';
import { percentText } from '../utils/estimate-words';
import { termsDefaults, termsPatchOf, termsSchema } from '../utils/terms-values';

/** "30 % of the total" or "$500.00". */
export function depositRuleText(rule: EstimateView['depositRule'], currency: string): string {
  return rule.kind === 'percent'
    ? `${percentText(rule.basisPoints)} of the total`
    : `${formatCents(rule.cents, currency)} fixed`;
}

function DepositFields() {
  const { registration } = useBoundField('depositKind');
  const kind = useWatch({ name: 'depositKind' }) as 'percent' | 'amount';
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="font-semibold">Deposit</legend>
      <div className="flex flex-wrap gap-4">
        <label className="flex min-h-11 items-center gap-2">
          <input
            type="radio"
            value="percent"
            className="h-5 w-5 accent-moss-700"
            {...registration}
          />
          A percent of the total
        </label>
        <label className="flex min-h-11 items-center gap-2">
          <input
            type="radio"
            value="amount"
            className="h-5 w-5 accent-moss-700"
            {...registration}
          />
          A fixed amount
        </label>
      </div>
      {kind === 'amount' ? (
        <TextField name="depositAmount" label="Deposit amount" inputMode="decimal" />
      ) : (
        <TextField name="depositPercent" label="Deposit (%)" inputMode="decimal" />
      )}
    </fieldset>
  );
}

/** Validity, deposit rule and notes: a form while the estimate is a draft, else the words. */
export function EstimateTerms({
  estimate,
  currency,
  formatDay,
  onPatch,
}: {
  estimate: EstimateView;
  currency: string;
  /** A calendar date as people read it. */
  formatDay: (isoDate: string) => string;
  onPatch?: (input: UpdateEstimateInput) => Promise<EstimateView>;
}) {
  if (!onPatch)
    return (
      <dl className="grid gap-3 rounded-lg border border-line bg-white p-4 sm:grid-cols-2">
        <div>
          <dt className="font-semibold">Valid until</dt>
          <dd>{estimate.validUntil ? formatDay(estimate.validUntil) : 'No date given'}</dd>
        </div>
        <div>
          <dt className="font-semibold">Deposit</dt>
          <dd>{depositRuleText(estimate.depositRule, currency)}</dd>
        </div>
        <div className="sm:col-span-2">
          <dt className="font-semibold">Notes</dt>
          <dd className="whitespace-pre-line">{estimate.notes ?? 'None'}</dd>
        </div>
      </dl>
    );
  return (
    <Form
      schema={termsSchema}
      defaultValues={termsDefaults(estimate)}
      aria-label="Terms of the estimate"
      className="rounded-lg border border-line bg-white p-4"
      onSubmit={async (values, methods) => {
        // The same form takes the saved terms (what was typed stays through other edits).
        methods.reset(termsDefaults(await onPatch(termsPatchOf(values))));
      }}
    >
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField name="validUntil" label="Valid until" type="date" />
        <DepositFields />
      </div>
      <TextAreaField
        name="notes"
        label="Notes for the customer"
        hint="Printed on the estimate, such as access or what the price leaves out."
      />
      <div>
        <SubmitButton busyLabel="Saving…">Save terms</SubmitButton>
      </div>
    </Form>
  );
}
