import { describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { QueryClientProvider } from '@tanstack/react-query';
import { queryClient } from '../../../lib/query-client';
import { viewFixture } from '../../../test/public-estimate-fixture';
import { CustomerEstimatePage } from './customer-estimate-page';

function renderPage(view = viewFixture()) {
  return render(
    <QueryClientProvider client={queryClient}>
      <CustomerEstimatePage token="test-token" view={view} />
    </QueryClientProvider>,
  );
}

describe('the customer estimate page', () => {
  it('asks which option before accepting when there are several', async () => {
    renderPage();
    const group = screen.getByRole('group', { name: 'Which option do you choose?' });
    expect(
      within(group)
        .getAllByRole('radio')
        .map((radio) => radio.getAttribute('value')),
    ).toEqual(['t-good', 't-best']);
    expect(within(group).getByRole('radio', { name: /Best/ })).toBeTruthy();
    fireEvent.input(screen.getByLabelText('Your full name'), {
      target: { value: 'Osric Fennimore' },
    });
    fireEvent.click(screen.getByRole('button', { name: 'Accept estimate' }));
    // Refused in the browser: nothing is sent until an option is chosen.
    await waitFor(() => expect(screen.getByText('Choose one of the options')).toBeTruthy());
    expect(screen.queryByTestId('answer-panel')).toBeNull();
  });

  it('shows one option without a choice, with its total in the statement', () => {
    const view = viewFixture();
    renderPage(viewFixture({ tiers: view.tiers.slice(0, 1) }));
    expect(screen.queryByRole('group', { name: 'Which option do you choose?' })).toBeNull();
    expect(screen.getByRole('heading', { level: 2, name: 'The price' })).toBeTruthy();
    expect(screen.getByText(/do the work described above for \$8,160\.00/)).toBeTruthy();
  });

  it('shows the answer instead of the forms once accepted, with the end of the right to cancel', () => {
    renderPage(
      viewFixture({
        status: 'accepted',
        chosenTierId: 't-best',
        answer: {
          kind: 'accepted',
          at: '2026-03-05T16:00:00.000Z',
          cancellationEndsAt: '2026-03-09T06:00:00.000Z',
        },
      }),
    );
    expect(screen.getByRole('heading', { name: /Thank you/ })).toBeTruthy();
    // Only the option taken is shown once accepted.
    expect(screen.getByRole('heading', { level: 2, name: 'What you accepted: Best' })).toBeTruthy();
    expect(screen.queryByRole('heading', { level: 3, name: 'Good' })).toBeNull();
    expect(screen.getByTestId('cancellation-ends').textContent).toMatch(
      /March 9, 2026|March 8, 2026/,
    );
    expect(screen.queryByRole('button', { name: 'Accept estimate' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Decline this estimate' })).toBeNull();
  });

  it('says a newer version exists when this one was replaced', () => {
    renderPage(viewFixture({ status: 'superseded' }));
    expect(
      screen.getByRole('heading', { name: 'There is a newer version of this estimate' }),
    ).toBeTruthy();
    expect(screen.queryByLabelText('Your full name')).toBeNull();
  });
});

describe('declining', () => {
  it('opens behind a button, with an optional reason, and can be put away', () => {
    renderPage();
    fireEvent.click(screen.getByRole('button', { name: 'Decline this estimate' }));
    const reason = screen.getByLabelText('Why not? (you can leave this empty)');
    expect(reason.tagName).toBe('TEXTAREA');
    expect(document.activeElement).toBe(reason);
    expect(screen.getByRole('button', { name: 'Decline estimate' })).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Keep it open' }));
    expect(screen.queryByLabelText('Why not? (you can leave this empty)')).toBeNull();
    expect(document.activeElement).toBe(
      screen.getByRole('button', { name: 'Decline this estimate' }),
    );
  });
});

describe('the right to cancel', () => {
  it('prints the notice when accepting here is covered, and nothing when it is not', () => {
    renderPage(
      viewFixture({
        cancellation: {
          applies: true,
          detail: null,
          notice: {
            heading: 'Notice of your right to cancel',
            statement: 'You may cancel this sale within three business days.',
            paragraphs: ['Send or deliver a signed and dated copy of this notice.'],
            formLines: ['I hereby cancel this transaction.', 'Signature: ________'],
            endsOnText: 'The right to cancel ends at midnight on March 9, 2026.',
          },
        },
      }),
    );
    const notice = screen.getByRole('region', { name: 'Notice of your right to cancel' });
    expect(notice.textContent).toContain('The right to cancel ends at midnight on March 9, 2026.');
    expect(notice.textContent).toContain('I hereby cancel this transaction.');
    cleanup();
    renderPage();
    expect(screen.queryByRole('region', { name: 'Notice of your right to cancel' })).toBeNull();
  });
});
