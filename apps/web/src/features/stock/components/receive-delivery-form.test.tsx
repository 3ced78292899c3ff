import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { MemoryRouter } from 'react-router-dom';
import { testSession, WithSession } from '../../../test/session-fixture';
import { ReceiveDeliveryForm } from './receive-delivery-form';

const productId = '9f8e7d6c-0000-4000-8000-000000000001';

function json(body: unknown, status = 200): Response {
  return new Response(JSON.stringify(body), {
    status,
    headers: { 'content-type': status >= 400 ? 'application/problem+json' : 'application/json' },
  });
}

const turf = {
  id: productId,
  kind: 'turf',
  key: 'turf-a',
  name: 'Landscape turf',
  unit: 'sq ft',
  packSize: null,
  priceMillicents: 240000,
  isStarter: false,
  attributes: {
    pileHeightIn: 1.75,
    rollWidthsFt: [15, 12],
    maxRollLengthFt: 100,
    recommendedInfill: null,
    infillRateLbPerSqFt: null,
  },
  createdAt: '2026-03-01T00:00:00.000Z',
  updatedAt: '2026-03-01T00:00:00.000Z',
};

/** The price book answers the turf; the delivery answers `delivery(body)`. */
function stubFetch(delivery: (body: unknown) => Response) {
  const sent: unknown[] = [];
  vi.stubGlobal('fetch', (url: string, init: RequestInit = {}) => {
    if (url.endsWith('/auth/csrf')) return Promise.resolve(json({ data: { token: 't' } }));
    if (url.startsWith('/api/price-book'))
      return Promise.resolve(json({ data: [turf], meta: { page: 1, pageSize: 100, total: 1 } }));
    const body = typeof init.body === 'string' ? (JSON.parse(init.body) as unknown) : undefined;
    sent.push(body);
    return Promise.resolve(delivery(body));
  });
  return sent;
}

function show(onReceived = vi.fn()) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <WithSession me={testSession()}>
        <MemoryRouter>
          <ReceiveDeliveryForm onReceived={onReceived} onCancel={vi.fn()} />
        </MemoryRouter>
      </WithSession>
    </QueryClientProvider>,
  );
  return onReceived;
}

const fill = (label: string, value: string) =>
  fireEvent.change(screen.getByLabelText(label), { target: { value } });

afterEach(() => vi.unstubAllGlobals());

describe('ReceiveDeliveryForm', () => {
  it('sends every roll in feet and puts a server 400 on the row it names', async () => {
    const sent = stubFetch(() =>
      json(
        {
          type: 'about:blank',
          title: 'Some fields need attention',
          status: 400,
          code: 'VALIDATION_FAILED',
          detail: 'rolls.1.widthFt: Landscape turf comes in 15 ft or 12 ft widths',
          errors: [
            { path: 'rolls.1.widthFt', message: 'Landscape turf comes in 15 ft or 12 ft widths' },
          ],
        },
        400,
      ),
    );
    const onReceived = show();
    const form = await screen.findByRole('form', { name: 'Receive a delivery' });
    // The only turf product is chosen already, and its widths are on offer.
    expect(screen.getByLabelText<HTMLSelectElement>('Turf product').value).toBe(productId);
    fill('Dye lot', 'LT-9');
    fill('Roll 1 length', '100');
    fireEvent.click(within(form).getByRole('button', { name: 'Add a roll' }));
    fill('Roll 2 width', '12');
    fill('Roll 2 length', `82' 6"`);
    expect(screen.getByRole('complementary', { name: /Caution: Heavy rolls/ })).toBeTruthy();
    fireEvent.click(within(form).getByRole('button', { name: 'Save delivery' }));

    const message = await screen.findByText(`Landscape turf comes in 15' 0" or 12' 0" widths`);
    expect(message.id).toBe(`${screen.getByLabelText('Roll 2 width').id}-error`);
    expect(onReceived).not.toHaveBeenCalled();
    expect(sent).toEqual([
      {
        turfProductId: productId,
        dyeLot: 'LT-9',
        location: null,
        receivedOn: expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/) as unknown,
        rolls: [
          { widthFt: 15, lengthFt: 100 },
          { widthFt: 12, lengthFt: 82.5 },
        ],
      },
    ]);
    expect(screen.getByLabelText<HTMLInputElement>('Roll 2 length').value).toBe(`82' 6"`);
  });

  it('adds and removes rows, keeping at least one', async () => {
    stubFetch(() => json({ data: [] }, 201));
    show();
    const form = await screen.findByRole('form', { name: 'Receive a delivery' });
    const remove = (n: number) =>
      within(form).getByRole<HTMLButtonElement>('button', { name: `Remove roll ${n}` });
    expect(remove(1).disabled).toBe(true);
    fireEvent.click(within(form).getByRole('button', { name: 'Add a roll' }));
    fireEvent.click(within(form).getByRole('button', { name: 'Add a roll' }));
    expect(screen.getByLabelText('Roll 3 length')).toBeTruthy();
    fireEvent.click(remove(2));
    expect(screen.queryByLabelText('Roll 3 length')).toBeNull();
    expect(remove(1).disabled).toBe(false);
  });
});
