import type { InfiniteData, UseSuspenseInfiniteQueryResult } from '@tanstack/react-query';
import type { ListResponse } from '@seamwright/shared';

/** The largest page the API serves; lists that show "everything" ask for this many at a time. */
export const largestPageSize = 100;

/** The next page number after `last`, or undefined once every row has been fetched. */
export function nextPageOf(last: ListResponse<unknown>): number | undefined {
  const { page, pageSize, total } = last.meta;
  return page * pageSize < total ? page + 1 : undefined;
}

/** A list read a page at a time, with what the screen needs to say how much is left. */
export interface PagedList<T> {
  items: T[];
  total: number;
  hasMore: boolean;
  isLoadingMore: boolean;
  loadMore: () => void;
}

export function toPagedList<T>(
  result: UseSuspenseInfiniteQueryResult<InfiniteData<ListResponse<T>>>,
): PagedList<T> {
  const pages = result.data.pages;
  return {
    items: pages.flatMap((page) => page.data),
    total: pages.at(-1)?.meta.total ?? 0,
    hasMore: result.hasNextPage,
    isLoadingMore: result.isFetchingNextPage,
    loadMore: () => void result.fetchNextPage(),
  };
}
