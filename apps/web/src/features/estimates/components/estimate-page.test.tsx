import { describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { MemoryRouter } from 'react-router-dom';
import type { EstimateView } from '@seamwright/shared';
import { testSession, WithSession } from '../../../test/session-fixture';
import { estimateKeys } from '../api/estimate-keys';
import { sampleEstimate } from '../test/sample-estimate';
import { EstimateActions } from './estimate-actions';
import { EstimatePage } from './estimate-page';

function renderPage(estimate: EstimateView, canWrite = true) {
  // The turf list the option form offers, already fetched (no API in component tests).
  const client = new QueryClient({ defaultOptions: { queries: { staleTime: Infinity } } });
  client.setQueryData(estimateKeys.turfProducts(), []);
  render(
    <QueryClientProvider client={client}>
      <MemoryRouter>
        <WithSession me={testSession()}>
          <EstimateActions
            estimate={estimate}
            canWrite={canWrite}
            customerEmail="corwin@example.test"
            onChanged={() => undefined}
          />
          <EstimatePage
            estimate={estimate}
            currency="USD"
            timeZone="America/Denver"
            canWrite={canWrite}
            onChanged={() => undefined}
          />
        </WithSession>
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

describe('EstimatePage', () => {
  it('lets a draft be edited and sent, with its PDF and the rounding rule', () => {
    renderPage(sampleEstimate({ warnings: ['Power broom rental: no price in the price book'] }));
    expect(screen.getByRole('button', { name: 'Send to customer' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Make a new version' })).toBeNull();
    expect(screen.getByRole('link', { name: 'Download PDF' }).getAttribute('href')).toBe(
      '/api/estimates/00000000-0000-4000-8000-0000000e0001/pdf',
    );
    expect(screen.getByLabelText('Quantity of Landscape turf')).toBeTruthy();
    expect(screen.getByRole('form', { name: 'Terms of the estimate' })).toBeTruthy();
    expect(screen.getByRole('region', { name: 'Check before sending' }).textContent).toContain(
      'Power broom rental',
    );
    expect(screen.getByText(/each line \(quantity × unit price\) is rounded half-up/)).toBeTruthy();
  });

  it('shows a sent version read-only, with "Make a new version" instead of sending', () => {
    renderPage(sampleEstimate({ status: 'sent', sentAt: '2026-12-02T16:00:00.000Z' }));
    expect(screen.getByText(/This version was sent/)).toBeTruthy();
    expect(screen.getByText(/sent Dec 2, 2026/)).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Make a new version' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Send to customer' })).toBeNull();
    expect(screen.queryByRole('textbox')).toBeNull();
    expect(screen.queryByRole('form')).toBeNull();
    expect(screen.getByText('30 % of the total')).toBeTruthy();
    expect(screen.getByText('Dec 31, 2026')).toBeTruthy();
  });

  it('shows a draft read-only to someone who may only read estimates', () => {
    renderPage(sampleEstimate(), false);
    expect(screen.queryByRole('button', { name: 'Send to customer' })).toBeNull();
    expect(screen.queryByRole('textbox')).toBeNull();
    expect(screen.getByRole('link', { name: 'Download PDF' })).toBeTruthy();
  });
});
