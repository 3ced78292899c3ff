import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { teamKeys } from './team-keys';

/** `DELETE /api/invitations/:id`: the link stops working. */
export async function revokeInvitation(invitationId: string): Promise<void> {
  await api.delete(`/invitations/${encodeURIComponent(invitationId)}`);
}

export function useRevokeInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvitation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.invitations() }),
  });
}
