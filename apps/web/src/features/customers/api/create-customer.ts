import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateCustomerInput, CustomerView, ItemResponse } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { customerKeys } from './customer-keys';

/** `POST /api/customers`. */
export async function createCustomer(input: CreateCustomerInput): Promise<CustomerView> {
  const body = await api.post<ItemResponse<CustomerView>>('/customers', input);
  return body.data;
}

export function useCreateCustomer() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCustomer,
    onSuccess: async (customer) => {
      queryClient.setQueryData(customerKeys.detail(customer.id), customer);
      await queryClient.invalidateQueries({ queryKey: customerKeys.lists() });
    },
  });
}
