import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { teamKeys } from './team-keys';

/** `DELETE /api/members/:id`: takes someone out of the company (their account stays). */
export async function removeMember(memberId: string): Promise<void> {
  await api.delete(`/members/${encodeURIComponent(memberId)}`);
}

export function useRemoveMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeMember,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.members() }),
  });
}
