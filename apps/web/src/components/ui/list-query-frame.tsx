import type { ReactNode } from 'react';
import { Loading } from './loading';
import { ErrorPanel } from './region-error';

interface ListQuery {
  isPending: boolean;
  isError: boolean;
  error: Error | null;
  refetch: () => Promise<unknown>;
}

/**
 * A list's filters above what its query has so far: a loading line or the error with a retry,
 * or null once the data is there (the caller renders the table or the empty state).
 */
export function listQueryFrame(query: ListQuery, filters: ReactNode, loadingLabel: string) {
  if (query.isPending)
    return (
      <>
        {filters}
        <Loading label={loadingLabel} />
      </>
    );
  if (query.isError && query.error)
    return (
      <>
        {filters}
        <ErrorPanel error={query.error} onRetry={() => void query.refetch()} />
      </>
    );
  return null;
}
