import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { InvitationView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { teamKeys } from './team-keys';

/** `GET /api/invitations`: invitations of the active company not yet accepted. */
export async function getInvitations(signal?: AbortSignal): Promise<InvitationView[]> {
  const body = await api.get<{ data: InvitationView[] }>('/invitations', { signal });
  return body.data.filter((invitation) => invitation.acceptedAt === null);
}

export function invitationsQueryOptions() {
  return queryOptions({
    queryKey: teamKeys.invitations(),
    queryFn: ({ signal }) => getInvitations(signal),
  });
}

export function useInvitations(): InvitationView[] {
  return useSuspenseQuery(invitationsQueryOptions()).data;
}
