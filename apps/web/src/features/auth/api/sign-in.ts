import { useMutation } from '@tanstack/react-query';
import type { LoginInput, ItemResponse, MeView } from '@seamwright/shared';
import { api, refreshCsrfToken } from '../../../lib/api-client';
import { queryClient, sessionMeKey } from '../../../lib/query-client';
import { authPaths } from '../../../config/api-paths';

export async function signIn(input: LoginInput): Promise<MeView> {
  const body = await api.post<ItemResponse<MeView>>(authPaths.signIn, input);
  return body.data;
}

/** A new session: fresh CSRF token and nothing cached from whoever was here before. */
export function useSignIn() {
  return useMutation({
    mutationFn: signIn,
    onSuccess: async (me) => {
      queryClient.clear();
      // The answer is the new session; seed it so the next page does not ask again.
      queryClient.setQueryData(sessionMeKey, me);
      await refreshCsrfToken();
    },
  });
}
