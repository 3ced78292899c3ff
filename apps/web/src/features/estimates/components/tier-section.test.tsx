import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import type { EstimateView, UpdateEstimateInput } from '@seamwright/shared';
import { testSession, WithSession } from '../../../test/session-fixture';
import { sampleEstimate } from '../test/sample-estimate';
import { TierSection } from './tier-section';

const estimate = sampleEstimate();
const tier = estimate.tiers[0]!;

function renderTier(onPatch?: (input: UpdateEstimateInput) => Promise<EstimateView>) {
  render(
    <WithSession me={testSession()}>
      <TierSection
        tier={tier}
        tierCount={1}
        currency="USD"
        taxRateBasisPoints={825}
        onPatch={onPatch}
      />
    </WithSession>,
  );
}

describe('TierSection', () => {
  it('shows the lines, where each came from, and the server’s totals', () => {
    renderTier();
    const table = screen.getByRole('table', { name: 'Lines of Standard' });
    const turf = within(table).getByRole('row', { name: /Landscape turf/ });
    expect(turf.textContent).toContain('600 sq ft');
    expect(turf.textContent).toContain('$2.40');
    expect(turf.textContent).toContain('$1,440.00');
    expect(turf.textContent).toContain('From the takeoff');
    // The rule on demand, and the takeoff's own figures beside a line changed by hand.
    expect(
      within(turf).getAllByText('Ordered area of the saved plans, priced per sq ft.').length,
    ).toBe(2);
    const tape = within(table).getByRole('row', { name: /Seam tape/ });
    expect(tape.textContent).toContain('Changed by hand');
    expect(tape.textContent).toContain('Takeoff said 2 rolls at $45.00');
    // Totals as sent by the server (sample-estimate.ts works them by hand).
    expect(screen.getByText('Total').nextSibling?.textContent).toBe('$1,607.51');
    expect(screen.getByText('Deposit due at acceptance').nextSibling?.textContent).toBe('$482.25');
    // Read-only: no inputs, no remove buttons.
    expect(screen.queryByRole('textbox')).toBeNull();
    expect(screen.queryByRole('button', { name: /Remove/ })).toBeNull();
  });

  it('saves only the changed line, as a quantity the server prices again', async () => {
    const sent: UpdateEstimateInput[] = [];
    renderTier((input) => {
      sent.push(input);
      return Promise.resolve(estimate);
    });
    fireEvent.change(screen.getByLabelText('Quantity of Landscape turf'), {
      target: { value: '650' },
    });
    fireEvent.click(screen.getByRole('button', { name: 'Save line changes' }));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(sent[0]).toEqual({ lines: { update: [{ id: tier.lines[0]!.id, quantity: 650 }] } });
    // The form then shows what the server saved (this fake answers the sample unchanged).
    await waitFor(() =>
      expect(screen.getByLabelText<HTMLInputElement>('Quantity of Landscape turf').value).toBe(
        '600',
      ),
    );
  });

  it('says what is wrong with a typed quantity and sends nothing', async () => {
    const sent: UpdateEstimateInput[] = [];
    renderTier((input) => {
      sent.push(input);
      return Promise.resolve(estimate);
    });
    fireEvent.change(screen.getByLabelText('Unit price of Seam tape'), {
      target: { value: 'forty' },
    });
    fireEvent.click(screen.getByRole('button', { name: 'Save line changes' }));
    expect(await screen.findByText('Type an amount such as 2.76 or 1,250')).toBeTruthy();
    expect(sent).toEqual([]);
  });

  it('shows the server’s refusal of a typed line in the form, keeping what was typed', async () => {
    renderTier(() => Promise.reject(new Error('This estimate was sent; make a new version')));
    const form = screen.getByRole('form', { name: 'Add a line to Standard' });
    fireEvent.change(within(form).getByLabelText('Item'), { target: { value: 'Delivery' } });
    fireEvent.change(within(form).getByLabelText('Unit'), { target: { value: 'trip' } });
    fireEvent.change(within(form).getByLabelText('Unit price'), { target: { value: '95' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Add line' }));
    await waitFor(() => expect(within(form).getByRole('alert')).toBeTruthy());
    expect(within(form).getByLabelText<HTMLInputElement>('Item').value).toBe('Delivery');
  });
});
