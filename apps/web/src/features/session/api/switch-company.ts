import { useMutation } from '@tanstack/react-query';
import type { ItemResponse, MeView, SwitchCompanyInput } from '@seamwright/shared';
import { api, refreshCsrfToken } from '../../../lib/api-client';
import { queryClient } from '../../../lib/query-client';
import { sessionKeys } from './session-keys';

/** `POST /api/me/company`: make another of the user's companies the active one. */
export async function switchCompany(input: SwitchCompanyInput): Promise<MeView> {
  const body = await api.post<ItemResponse<MeView>>('/me/company', input);
  return body.data;
}

/**
 * After a switch nothing cached belongs to the new company: every query is dropped except the
 * session itself, which is overwritten with the answer. (Dropping the session query too would
 * leave the mounted layout watching a query that is no longer in the cache, showing the old
 * company's name.)
 */
export function useSwitchCompany(onSwitched: () => void) {
  return useMutation({
    mutationFn: switchCompany,
    onSuccess: async (me) => {
      const meKey = JSON.stringify(sessionKeys.me());
      queryClient.removeQueries({ predicate: (query) => JSON.stringify(query.queryKey) !== meKey });
      queryClient.setQueryData(sessionKeys.me(), me);
      await refreshCsrfToken();
      onSwitched();
    },
  });
}
