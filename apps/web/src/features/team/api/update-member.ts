import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateMemberInput } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { teamKeys } from './team-keys';

/** `PATCH /api/members/:id`: change someone's role. */
export async function updateMember(memberId: string, input: UpdateMemberInput): Promise<void> {
  await api.patch(`/members/${encodeURIComponent(memberId)}`, input);
}

export function useUpdateMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ memberId, input }: { memberId: string; input: UpdateMemberInput }) =>
      updateMember(memberId, input),
    onSettled: () => queryClient.invalidateQueries({ queryKey: teamKeys.members() }),
  });
}
