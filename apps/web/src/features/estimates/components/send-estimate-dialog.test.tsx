import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { SendEstimateDialog } from './send-estimate-dialog';

function renderDialog(customerEmail: string | null, sent: (string | undefined)[]) {
  render(
    <SendEstimateDialog
      isOpen
      customerEmail={customerEmail}
      version={2}
      onClose={() => undefined}
      onSend={(to) => {
        sent.push(to);
        return Promise.resolve();
      }}
    />,
  );
}

describe('SendEstimateDialog', () => {
  it('starts with the customer’s e-mail and sends without `to` when it is kept', async () => {
    const sent: (string | undefined)[] = [];
    renderDialog('corwin@example.test', sent);
    expect(screen.getByLabelText<HTMLInputElement>('Customer’s e-mail').value).toBe(
      'corwin@example.test',
    );
    fireEvent.click(screen.getByRole('button', { name: 'Send estimate' }));
    await waitFor(() => expect(sent).toEqual([undefined]));
  });

  it('sends to another address for this sending when it is changed', async () => {
    const sent: (string | undefined)[] = [];
    renderDialog('corwin@example.test', sent);
    fireEvent.change(screen.getByLabelText('Customer’s e-mail'), {
      target: { value: 'office@example.test' },
    });
    fireEvent.click(screen.getByRole('button', { name: 'Send estimate' }));
    await waitFor(() => expect(sent).toEqual(['office@example.test']));
  });

  it('asks for an address when the customer has none', async () => {
    const sent: (string | undefined)[] = [];
    renderDialog(null, sent);
    fireEvent.click(screen.getByRole('button', { name: 'Send estimate' }));
    expect(await screen.findByText(/Type an e-mail address/)).toBeTruthy();
    expect(sent).toEqual([]);
  });
});
