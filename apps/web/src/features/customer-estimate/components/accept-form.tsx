import type { EstimateAcceptanceView, PublicEstimateView } from '@seamwright/shared';
import { Form, SubmitButton, TextField } from '../../../components/ui/form';
import { useAcceptEstimate } from '../api/public-estimate';
import { acceptSchemaFor, deadLinkOf, type DeadLink } from '../utils/answer-state';
import { formatMoney } from '../../../lib/plain-words';
import { TierChoice } from './tier-choice';

interface Props {
  token: string;
  view: PublicEstimateView;
  onAccepted: (answer: EstimateAcceptanceView) => void;
  onDeadLink: (dead: DeadLink) => void;
}

/** Accepting: the option (when there are several), the full name typed, and what it means. */
export function AcceptForm({ token, view, onAccepted, onDeadLink }: Props) {
  const accept = useAcceptEstimate(token);
  const tierIds = view.tiers.map((tier) => tier.id);
  const only = view.tiers.length === 1 ? view.tiers[0] : undefined;
  return (
    <section
      aria-labelledby="accept-heading"
      className="rounded-lg border-2 border-moss-700 bg-moss-50 p-4 sm:p-6"
    >
      <h2 id="accept-heading" className="text-2xl font-bold">
        Accept this estimate
      </h2>
      <Form
        aria-labelledby="accept-heading"
        className="mt-4"
        schema={acceptSchemaFor(tierIds)}
        defaultValues={{ name: '', tierId: view.chosenTierId ?? '' }}
        onSubmit={async (values) => {
          try {
            onAccepted(await accept.mutateAsync(values));
          } catch (error) {
            const dead = deadLinkOf(error);
            if (!dead) throw error; // field and form errors show in the form
            onDeadLink(dead);
          }
        }}
      >
        {view.tiers.length > 1 ? <TierChoice tiers={view.tiers} currency={view.currency} /> : null}
        <p>
          By accepting, you agree to have {view.company.name} do the work described above
          {only
            ? ` for ${formatMoney(only.totalCents, view.currency)}`
            : ' for the total of the option you choose'}
          , at these prices and on these terms. Typing your full name counts as your signature.
        </p>
        <TextField name="name" label="Your full name" autoComplete="name" />
        <SubmitButton busyLabel="Accepting…">Accept estimate</SubmitButton>
      </Form>
    </section>
  );
}
