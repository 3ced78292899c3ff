import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ItemResponse, RollView, UpdateRollInput } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { stockKeys } from './stock-keys';

/** `PATCH /api/rolls/:id`: lot, location, length left, notes, archived. */
export async function updateRoll(id: string, input: UpdateRollInput): Promise<RollView> {
  return (await api.patch<ItemResponse<RollView>>(`/rolls/${encodeURIComponent(id)}`, input)).data;
}

export function useUpdateRoll(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateRollInput) => updateRoll(id, input),
    onSuccess: async (roll) => {
      queryClient.setQueryData(stockKeys.detail(id), roll);
      await queryClient.invalidateQueries({ queryKey: stockKeys.all, refetchType: 'active' });
    },
  });
}
