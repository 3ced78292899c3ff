import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateInvitationInput, InvitationView, ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { teamKeys } from './team-keys';

/** `POST /api/invitations`: e-mails a link to join the company with a role. */
export async function createInvitation(input: CreateInvitationInput): Promise<InvitationView> {
  const body = await api.post<ItemResponse<InvitationView>>('/invitations', input);
  return body.data;
}

export function useCreateInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.invitations() }),
  });
}
