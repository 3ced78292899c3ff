import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { InvitationPreview, ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { invitationKeys } from './invitation-keys';

/** `GET /api/invitations/:token`: the public view of an invitation before it is accepted. */
export async function getInvitationPreview(token: string): Promise<InvitationPreview> {
  const body = await api.get<ItemResponse<InvitationPreview>>(
    `/invitations/${encodeURIComponent(token)}`,
  );
  return body.data;
}

export function invitationPreviewQueryOptions(token: string) {
  return queryOptions({
    queryKey: invitationKeys.preview(token),
    queryFn: () => getInvitationPreview(token),
    staleTime: Infinity,
  });
}

export function useInvitationPreview(token: string): InvitationPreview {
  return useSuspenseQuery(invitationPreviewQueryOptions(token)).data;
}
