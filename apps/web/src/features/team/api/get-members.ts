import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { MemberView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { teamKeys } from './team-keys';

/** `GET /api/members`: everyone in the active company (owner only). */
export async function getMembers(signal?: AbortSignal): Promise<MemberView[]> {
  const body = await api.get<{ data: MemberView[] }>('/members', {
    query: { pageSize: 100 },
    signal,
  });
  return body.data;
}

export function membersQueryOptions() {
  return queryOptions({
    queryKey: teamKeys.members(),
    queryFn: ({ signal }) => getMembers(signal),
  });
}

export function useMembers(): MemberView[] {
  return useSuspenseQuery(membersQueryOptions()).data;
}
