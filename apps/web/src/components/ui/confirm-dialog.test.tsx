import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { ConfirmDialog } from './confirm-dialog';

/** A list of things, each with a Delete button that asks first. */
function Things() {
  const [things, setThings] = useState(['Gate', 'Hose bib', 'Side path']);
  const [asking, setAsking] = useState<string | null>(null);
  return (
    <>
      <h2 id="things-heading" tabIndex={-1}>
        Things
      </h2>
      <ul>
        {things.map((thing) => (
          <li key={thing}>
            <button type="button" onClick={() => setAsking(thing)}>
              Delete {thing}
            </button>
          </li>
        ))}
      </ul>
      <ConfirmDialog
        isOpen={asking !== null}
        title={`Delete ${asking ?? ''}?`}
        confirmLabel="Delete"
        fallbackFocus={() => document.getElementById('things-heading')}
        onCancel={() => setAsking(null)}
        onConfirm={() => {
          setThings((all) => all.filter((t) => t !== asking));
          setAsking(null);
        }}
      >
        It goes for good.
      </ConfirmDialog>
    </>
  );
}

function open(name: string): HTMLElement {
  const trigger = screen.getByRole('button', { name });
  trigger.focus();
  fireEvent.click(trigger);
  return trigger;
}

describe('ConfirmDialog', () => {
  it('gives focus back to the button that opened it when cancelled', async () => {
    render(<Things />);
    const trigger = open('Delete Hose bib');
    const keep = await screen.findByRole('button', { name: 'Keep it', hidden: true });
    keep.focus();
    fireEvent.click(keep);
    await waitFor(() => expect(document.activeElement).toBe(trigger));
  });

  it('sends focus to the list heading when the item it asked about is gone', async () => {
    render(<Things />);
    open('Delete Gate');
    fireEvent.click(await screen.findByRole('button', { name: 'Delete', hidden: true }));
    await waitFor(() => expect(screen.queryByRole('button', { name: 'Delete Gate' })).toBeNull());
    expect(document.activeElement).toBe(document.getElementById('things-heading'));
  });
});
