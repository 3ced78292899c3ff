import { useMutation } from '@tanstack/react-query';
import type { AcceptInvitationInput, ItemResponse, MeView } from '@seamwright/shared';
import { api, refreshCsrfToken } from '../../../lib/api-client';
import { queryClient, sessionMeKey } from '../../../lib/query-client';

/** `POST /api/invitations/:token/accept`: joins the company and signs the user in. */
export async function acceptInvitation(
  token: string,
  input: AcceptInvitationInput,
): Promise<MeView> {
  const body = await api.post<ItemResponse<MeView>>(
    `/invitations/${encodeURIComponent(token)}/accept`,
    input,
  );
  return body.data;
}

export function useAcceptInvitation(token: string) {
  return useMutation({
    mutationFn: (input: AcceptInvitationInput) => acceptInvitation(token, input),
    onSuccess: async (me) => {
      queryClient.clear();
      // The answer is the new session; seed it so the next page does not ask again.
      queryClient.setQueryData(sessionMeKey, me);
      await refreshCsrfToken();
    },
  });
}
