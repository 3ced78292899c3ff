import { Suspense } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/react';
import { QueryClient, QueryClientProvider, useSuspenseQuery } from '@tanstack/react-query';
import { RegionErrorBoundary } from './region-error';

/** Fails on its first call, answers on the second: a region whose first load broke. */
function flakyLoad() {
  let calls = 0;
  return vi.fn(() => {
    calls += 1;
    return calls === 1
      ? Promise.reject(new Error('network down'))
      : Promise.resolve(['14 Quarry Bend Road']);
  });
}

function SiteNames({ load }: { load: () => Promise<string[]> }) {
  const { data } = useSuspenseQuery({ queryKey: ['sites', 'test'], queryFn: load });
  return (
    <ul>
      {data.map((name) => (
        <li key={name}>{name}</li>
      ))}
    </ul>
  );
}

describe('RegionErrorBoundary', () => {
  afterEach(() => vi.restoreAllMocks());

  it('fetches again on "Try again" and shows the data', async () => {
    vi.spyOn(console, 'error').mockImplementation(() => {}); // React and the boundary log the failure
    const load = flakyLoad();
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    render(
      <QueryClientProvider client={client}>
        <RegionErrorBoundary>
          <Suspense fallback={<p>Loading</p>}>
            <SiteNames load={load} />
          </Suspense>
        </RegionErrorBoundary>
      </QueryClientProvider>,
    );

    expect(await screen.findByRole('heading', { name: 'Something went wrong' })).toBeTruthy();
    expect(load).toHaveBeenCalledTimes(1);

    fireEvent.click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('14 Quarry Bend Road')).toBeTruthy();
    expect(load).toHaveBeenCalledTimes(2);
  });
});
