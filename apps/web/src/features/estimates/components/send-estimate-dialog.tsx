import { useEffect, useId, useRef } from 'react';
import { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { Form, SubmitButton, TextField } from '../../../components/ui/form';

const sendSchema = z.object({
  to: z.email({ error: 'Type an e-mail address such as name@example.com' }),
});

/**
 * "Send to customer": the e-mail address starts as the customer's and may be changed for this
 * sending. A native modal <dialog> (focus trapped, Escape closes), like ConfirmDialog.
 */
export function SendEstimateDialog({
  isOpen,
  customerEmail,
  version,
  onSend,
  onClose,
}: {
  isOpen: boolean;
  customerEmail: string | null;
  version: number;
  /** `to` is given only when it differs from the customer's own address. */
  onSend: (to: string | undefined) => Promise<unknown>;
  onClose: () => void;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  // Syncing with the browser's own dialog API is what effects are for (no data fetching).
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (isOpen && !dialog.open) dialog.showModal?.();
    if (!isOpen && dialog.open) dialog.close();
  }, [isOpen]);
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(event) => {
        event.preventDefault();
        onClose();
      }}
      className="m-auto w-[min(30rem,calc(100vw-2rem))] rounded-lg border border-line bg-white p-6 text-ink shadow-xl backdrop:bg-ink/40"
    >
      <h2 id={titleId} className="text-xl font-bold">
        Send version {version} to the customer
      </h2>
      <p className="mt-2 text-ink-muted">
        The e-mail carries the estimate as a PDF and a private link where the customer can pick an
        option and accept. Once sent, this version cannot change.
      </p>
      {isOpen ? (
        <Form
          schema={sendSchema}
          defaultValues={{ to: customerEmail ?? '' }}
          aria-label="Send the estimate"
          className="mt-4"
          onSubmit={async (values) => {
            await onSend(values.to === customerEmail ? undefined : values.to);
            onClose();
          }}
        >
          <TextField
            name="to"
            label="Customer’s e-mail"
            type="email"
            autoComplete="off"
            hint={customerEmail ? 'Change it to send this once to another address.' : undefined}
          />
          <div className="flex flex-wrap justify-end gap-2">
            <Button variant="secondary" onClick={onClose}>
              Cancel
            </Button>
            <SubmitButton busyLabel="Sending…">Send estimate</SubmitButton>
          </div>
        </Form>
      ) : null}
    </dialog>
  );
}
