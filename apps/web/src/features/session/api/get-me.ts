import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { ItemResponse, MeView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { sessionKeys } from './session-keys';

/** `GET /api/me`: who is signed in, the active company, the role and every membership. */
export async function getMe(): Promise<MeView> {
  const body = await api.get<ItemResponse<MeView>>('/me');
  return body.data;
}

export function meQueryOptions() {
  return queryOptions({ queryKey: sessionKeys.me(), queryFn: getMe, staleTime: 60_000 });
}

export function useMe(): MeView {
  return useSuspenseQuery(meQueryOptions()).data;
}
