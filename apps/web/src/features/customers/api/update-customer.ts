import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CustomerView, ItemResponse, UpdateCustomerInput } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { customerKeys } from './customer-keys';

/** `PATCH /api/customers/:id` — also archives (`{ archived: true }`) and restores. */
export async function updateCustomer(
  id: string,
  input: UpdateCustomerInput,
): Promise<CustomerView> {
  const body = await api.patch<ItemResponse<CustomerView>>(
    `/customers/${encodeURIComponent(id)}`,
    input,
  );
  return body.data;
}

export function useUpdateCustomer(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateCustomerInput) => updateCustomer(id, input),
    onSuccess: async (customer) => {
      queryClient.setQueryData(customerKeys.detail(id), customer);
      await queryClient.invalidateQueries({ queryKey: customerKeys.lists() });
    },
  });
}
