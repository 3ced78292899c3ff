import { useMutation } from '@tanstack/react-query';
import type { SwitchCompanyInput } from '@seamwright/shared';
import { api, refreshCsrfToken } from '../../../lib/api-client';
import { queryClient } from '../../../lib/query-client';

/** `POST /api/me/company`: make another of the user's companies the active one. */
export async function switchCompany(input: SwitchCompanyInput): Promise<void> {
  await api.post('/me/company', input);
}

/** After a switch nothing cached belongs to the new company: drop it all. */
export function useSwitchCompany(onSwitched: () => void) {
  return useMutation({
    mutationFn: switchCompany,
    onSuccess: async () => {
      await refreshCsrfToken();
      queryClient.clear();
      onSwitched();
    },
  });
}
