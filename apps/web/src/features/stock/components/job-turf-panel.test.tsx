import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import type { JobReservationView, JobStatus } from '@seamwright/shared';
import { testSession, WithSession } from '../../../test/session-fixture';
import { JobTurfPanel } from './job-turf-panel';

const jobId = '7b0e9a40-5c1d-4f8e-9a77-2d4c1e0b3a01';
const rollA = '1c2d3e4f-0000-4000-8000-00000000000a';
const rollB = '1c2d3e4f-0000-4000-8000-00000000000b';
const productId = '9f8e7d6c-0000-4000-8000-000000000001';

function json(body: unknown, status = 200): Response {
  return new Response(JSON.stringify(body), {
    status,
    headers: { 'content-type': status >= 400 ? 'application/problem+json' : 'application/json' },
  });
}

const nothing: JobReservationView = {
  jobId,
  status: null,
  dyeLot: null,
  allocations: [],
  shortFt: 0,
  products: [],
  reservedAt: null,
};

/** A job of two areas on two rolls of lot LT-7; 20 ft of 15 ft wide still to order when short. */
function held(status: 'held' | 'cut', shortFt = 0): JobReservationView {
  const allocations = [
    {
      rollId: rollA,
      dyeLot: 'LT-7',
      isRemnant: false,
      areaId: 'a1',
      areaName: 'Back lawn',
      piece: 0,
      widthFt: 15,
      lengthFt: 42.5,
    },
    {
      rollId: rollA,
      dyeLot: 'LT-7',
      isRemnant: false,
      areaId: 'a1',
      areaName: 'Back lawn',
      piece: 1,
      widthFt: 15,
      lengthFt: 30,
    },
    {
      rollId: rollB,
      dyeLot: 'LT-7',
      isRemnant: true,
      areaId: 'a2',
      areaName: 'Dog run',
      piece: 0,
      widthFt: 15,
      lengthFt: 8,
    },
  ];
  return {
    jobId,
    status,
    dyeLot: 'LT-7',
    allocations,
    shortFt,
    products: [
      {
        turfProductId: productId,
        turfProductName: 'Landscape turf',
        dyeLot: 'LT-7',
        allocations,
        shortFt,
        toOrder: shortFt > 0 ? [{ widthFt: 15, lengthFt: shortFt }] : [],
        isExhaustive: true,
      },
    ],
    reservedAt: '2026-03-04T15:00:00.000Z',
  };
}

const shortProblem = {
  type: 'about:blank',
  title: 'Conflict',
  status: 409,
  code: 'CONFLICT',
  detail:
    'Not enough turf in stock: no single dye lot of Landscape turf holds the job (best: lot LT-7); order 20 ft of 15 ft wide',
  errors: [{ path: 'stock', message: 'Not enough turf in stock: order 20 ft of 15 ft wide' }],
};

interface Call {
  method: string;
  url: string;
  body: unknown;
}

/** A fake network: `answer` gets each call to the API (the CSRF token is answered here). */
function stubFetch(answer: (call: Call) => Response) {
  const calls: Call[] = [];
  vi.stubGlobal('fetch', (url: string, init: RequestInit = {}) => {
    if (url.endsWith('/auth/csrf')) return Promise.resolve(json({ data: { token: 't' } }));
    const call = {
      method: init.method ?? 'GET',
      url,
      body: typeof init.body === 'string' ? (JSON.parse(init.body) as unknown) : undefined,
    };
    calls.push(call);
    // The lot's rolls, for where each roll is kept.
    if (call.url.startsWith('/api/rolls?'))
      return Promise.resolve(
        json({
          data: [
            { id: rollA, widthFt: 15, remainingFt: 100, location: 'Yard rack A' },
            { id: rollB, widthFt: 15, remainingFt: 8, location: null },
          ],
          meta: { page: 1, pageSize: 100, total: 2 },
        }),
      );
    return Promise.resolve(answer(call));
  });
  return calls;
}

function show(jobStatus: JobStatus, canWrite = true) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <WithSession me={testSession()}>
        <JobTurfPanel jobId={jobId} jobStatus={jobStatus} canWrite={canWrite} />
      </WithSession>
    </QueryClientProvider>,
  );
}

const writes = (calls: Call[]) => calls.filter((c) => c.method !== 'GET');

afterEach(() => vi.unstubAllGlobals());

describe('JobTurfPanel', () => {
  it('lists the held pieces with the lot, sizes in feet and inches, and the roll each comes from', async () => {
    stubFetch(() => json({ data: held('held') }));
    show('scheduled');
    expect(await screen.findByText('Landscape turf: held from dye lot LT-7')).toBeTruthy();
    const rows = screen.getByRole('table', { name: 'Pieces of Landscape turf' });
    const cells = within(rows)
      .getAllByRole('row')
      .slice(1)
      .map((row) =>
        within(row)
          .getAllByRole('cell')
          .map((cell) => cell.textContent),
      );
    expect(cells).toEqual([
      ['Back lawn', '1', `15' 0" × 42' 6"`, 'Roll 1'],
      ['Back lawn', '2', `15' 0" × 30' 0"`, 'Roll 1'],
      ['Dog run', '1', `15' 0" × 8' 0"`, 'Remnant 2'],
    ]);
    expect(await screen.findByText(/100' 0" left, Yard rack A/)).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Reserve again' })).toBeTruthy();
    expect(screen.queryByText(/To order/)).toBeNull();
  });

  it('explains a short 409 and holds what is in stock on the second button', async () => {
    let reservation = nothing;
    const calls = stubFetch((call) => {
      if (call.method === 'GET') return json({ data: reservation });
      if (!(call.body as { allowShort?: boolean }).allowShort) return json(shortProblem, 409);
      reservation = held('held', 20);
      return json({ data: reservation }, 201);
    });
    show('accepted');
    fireEvent.click(await screen.findByRole('button', { name: 'Reserve turf' }));
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain(`order 20' 0" of 15' 0" wide`);
    fireEvent.click(within(alert).getByRole('button', { name: 'Hold what is in stock' }));
    expect(await screen.findByText(/To order:/)).toBeTruthy();
    expect(screen.getByText(/20' 0" of 15' 0" wide/)).toBeTruthy();
    expect(writes(calls).map((c) => c.body)).toEqual([{}, { allowShort: true }]);
    expect(screen.queryByRole('button', { name: 'Hold what is in stock' })).toBeNull();
  });

  it('asks once before releasing, then sends DELETE', async () => {
    let released = false;
    const calls = stubFetch((call) => {
      if (call.method === 'DELETE') {
        released = true;
        return new Response(null, { status: 204 });
      }
      return json({ data: released ? nothing : held('held') });
    });
    show('scheduled');
    fireEvent.click(await screen.findByRole('button', { name: 'Release' }));
    const dialog = screen.getByRole('dialog', { hidden: true });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Keep it', hidden: true }));
    expect(writes(calls)).toEqual([]);
    fireEvent.click(screen.getByRole('button', { name: 'Release' }));
    fireEvent.click(within(dialog).getByRole('button', { name: 'Release', hidden: true }));
    expect(await screen.findByText(/No turf is held for this job yet/)).toBeTruthy();
    expect(writes(calls).map((c) => [c.method, c.url])).toEqual([
      ['DELETE', `/api/jobs/${jobId}/reservations`],
    ]);
  });

  it('takes remnants back once the job is in progress, from the rolls it was cut from', async () => {
    const calls = stubFetch((call) =>
      call.method === 'POST' ? json({ data: [{ id: 'r-new' }] }, 201) : json({ data: held('cut') }),
    );
    show('in_progress');
    const form = await screen.findByRole('form', { name: 'Return remnants' });
    expect(screen.queryByRole('button', { name: /Reserve/ })).toBeNull();
    fireEvent.change(within(form).getByLabelText('Piece 1 cut from'), { target: { value: rollA } });
    fireEvent.change(within(form).getByLabelText('Piece 1 length'), { target: { value: `6' 6"` } });
    fireEvent.click(within(form).getByRole('button', { name: 'Return remnants' }));
    expect(await screen.findByText('Back in stock: 1 remnant.')).toBeTruthy();
    expect(writes(calls)).toEqual([
      {
        method: 'POST',
        url: `/api/jobs/${jobId}/remnants`,
        body: { remnants: [{ rollId: rollA, lengthFt: 6.5 }] },
      },
    ]);
  });

  it('shows a crew lead the reservation without any buttons', async () => {
    stubFetch(() => json({ data: held('held') }));
    show('scheduled', false);
    expect(await screen.findByText('Landscape turf: held from dye lot LT-7')).toBeTruthy();
    expect(screen.queryByRole('button')).toBeNull();
  });
});
