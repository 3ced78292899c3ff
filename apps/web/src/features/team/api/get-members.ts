import { infiniteQueryOptions, useSuspenseInfiniteQuery } from '@tanstack/react-query';
import type { ListResponse, MemberView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { largestPageSize, nextPageOf, toPagedList, type PagedList } from '../../../lib/paged-list';
import { teamKeys } from './team-keys';

/** `GET /api/members`: one page of the people in the active company (owner only). */
export function getMembersPage(
  page: number,
  signal?: AbortSignal,
): Promise<ListResponse<MemberView>> {
  return api.get<ListResponse<MemberView>>('/members', {
    query: { page, pageSize: largestPageSize },
    signal,
  });
}

export function membersQueryOptions() {
  return infiniteQueryOptions({
    queryKey: teamKeys.members(),
    queryFn: ({ pageParam, signal }) => getMembersPage(pageParam, signal),
    initialPageParam: 1,
    getNextPageParam: nextPageOf,
  });
}

export function useMembers(): PagedList<MemberView> {
  return toPagedList(useSuspenseInfiniteQuery(membersQueryOptions()));
}
