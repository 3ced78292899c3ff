import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ItemResponse, ReceiveDeliveryInput, RollView } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { stockKeys } from './stock-keys';

/** `POST /api/rolls/deliveries`: every roll of one lot, or none of them. */
export async function receiveDelivery(input: ReceiveDeliveryInput): Promise<RollView[]> {
  return (await api.post<ItemResponse<RollView[]>>('/rolls/deliveries', input)).data;
}

export function useReceiveDelivery() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: receiveDelivery,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: stockKeys.all }),
  });
}
