import { useEffect, useRef, useState } from 'react';
import { declineEstimateInputSchema } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { Form, SubmitButton, TextAreaField } from '../../../components/ui/form';
import { useDeclineEstimate } from '../api/public-estimate';
import { deadLinkOf, type DeadLink } from '../utils/answer-state';

interface Props {
  token: string;
  companyName: string;
  onDeclined: (at: string) => void;
  onDeadLink: (dead: DeadLink) => void;
}

/** Saying no, with an optional reason; behind a button so it is never pressed by mistake. */
export function DeclineForm({ token, companyName, onDeclined, onDeadLink }: Props) {
  const [isOpen, setIsOpen] = useState(false);
  const decline = useDeclineEstimate(token);
  // The button and the form take each other's place: focus goes with them, never to the page.
  const wasOpened = useRef(false);
  const area = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (isOpen) area.current?.querySelector('textarea')?.focus();
    else if (wasOpened.current) area.current?.querySelector('button')?.focus();
    wasOpened.current ||= isOpen;
  }, [isOpen]);
  return (
    <section aria-labelledby="decline-heading" className="flex flex-col gap-3">
      <h2 id="decline-heading" className="text-xl font-bold">
        Not going ahead?
      </h2>
      <div ref={area}>
        {isOpen ? (
          <Form
            aria-labelledby="decline-heading"
            schema={declineEstimateInputSchema}
            defaultValues={{ reason: '' }}
            onSubmit={async (values) => {
              try {
                onDeclined((await decline.mutateAsync(values)).declinedAt);
              } catch (error) {
                const dead = deadLinkOf(error);
                if (!dead) throw error;
                onDeadLink(dead);
              }
            }}
          >
            <TextAreaField
              name="reason"
              label="Why not? (you can leave this empty)"
              hint={`${companyName} will see what you write here.`}
              rows={3}
            />
            <div className="flex flex-wrap gap-3">
              <SubmitButton busyLabel="Sending…">Decline estimate</SubmitButton>
              <Button variant="secondary" onClick={() => setIsOpen(false)}>
                Keep it open
              </Button>
            </div>
          </Form>
        ) : (
          <div>
            <Button variant="secondary" onClick={() => setIsOpen(true)}>
              Decline this estimate
            </Button>
          </div>
        )}
      </div>
    </section>
  );
}
