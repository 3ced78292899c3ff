import { useMutation } from '@tanstack/react-query';
import type { AcceptInvitationInput } from '@seamwright/shared';
import { api, refreshCsrfToken } from '../../../lib/api-client';
import { queryClient } from '../../../lib/query-client';

/** `POST /api/invitations/:token/accept`: joins the company and signs the user in. */
export async function acceptInvitation(token: string, input: AcceptInvitationInput): Promise<void> {
  await api.post(`/invitations/${encodeURIComponent(token)}/accept`, input);
}

export function useAcceptInvitation(token: string) {
  return useMutation({
    mutationFn: (input: AcceptInvitationInput) => acceptInvitation(token, input),
    onSuccess: async () => {
      queryClient.clear();
      await refreshCsrfToken();
    },
  });
}
