import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';

/**
 * A list page's state kept in the URL (so it survives a reload and can be shared): the parsed
 * params and an `update` that writes a change back. Any change but the page itself starts
 * again at page 1; typing in the search box (`typedKey`) replaces the history entry instead of
 * adding one per keystroke.
 */
export function useUrlListParams<P extends { page: number }>(
  parse: (search: URLSearchParams) => P,
  toSearch: (params: P) => URLSearchParams,
  typedKey: keyof P,
) {
  const [searchParams, setSearchParams] = useSearchParams();
  const params = useMemo(() => parse(searchParams), [parse, searchParams]);
  const update = useCallback(
    (change: Partial<P>) => {
      const next = { ...params, page: 1, ...change };
      setSearchParams(toSearch(next), { replace: !('page' in change) && typedKey in change });
    },
    [params, setSearchParams, toSearch, typedKey],
  );
  return { params, update };
}
