import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import type { EstimateView } from '@seamwright/shared';
import { Button, buttonClasses } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { paths } from '../../../config/paths';
import { estimatePdfUrl } from '../api/estimate-pdf';
import { useReviseEstimate } from '../api/revise-estimate';
import { useSendEstimate } from '../api/send-estimate';
import { SendEstimateDialog } from './send-estimate-dialog';

/**
 * The estimate's page actions: its PDF, "Send to customer" for a draft, and "Make a new
 * version" for a sent one (a sent version never changes).
 */
export function EstimateActions({
  estimate,
  canWrite,
  customerEmail,
  onChanged,
}: {
  estimate: EstimateView;
  canWrite: boolean;
  customerEmail: string | null;
  /** The job changed too (its status, its activity); the route refreshes it. */
  onChanged: () => void;
}) {
  const [sending, setSending] = useState(false);
  const send = useSendEstimate(estimate.id);
  const revise = useReviseEstimate(estimate.id);
  const navigate = useNavigate();
  return (
    <>
      <a href={estimatePdfUrl(estimate.id)} download className={buttonClasses('secondary')}>
        Download PDF
      </a>
      {canWrite && estimate.status === 'draft' ? (
        <Button onClick={() => setSending(true)}>Send to customer</Button>
      ) : null}
      {canWrite && estimate.status === 'sent' ? (
        <Button
          isBusy={revise.isPending}
          onClick={() =>
            revise.mutate(undefined, {
              onSuccess: (next) => {
                onChanged();
                void navigate(paths.estimate(next.id));
              },
            })
          }
        >
          Make a new version
        </Button>
      ) : null}
      {revise.isError ? <FormAlert>{revise.error.message}</FormAlert> : null}
      <SendEstimateDialog
        isOpen={sending}
        customerEmail={customerEmail}
        version={estimate.version}
        onClose={() => setSending(false)}
        onSend={async (to) => {
          await send.mutateAsync(to);
          onChanged();
        }}
      />
    </>
  );
}
