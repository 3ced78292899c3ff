import { useMutation } from '@tanstack/react-query';
import type { SignupInput, ItemResponse, MeView } from '@seamwright/shared';
import { api, refreshCsrfToken } from '../../../lib/api-client';
import { queryClient, sessionMeKey } from '../../../lib/query-client';
import { authPaths } from '../../../config/api-paths';

/** Creates the company and its owner, and signs the owner in. */
export async function signUp(input: SignupInput): Promise<MeView> {
  const body = await api.post<ItemResponse<MeView>>(authPaths.signUp, input);
  return body.data;
}

export function useSignUp() {
  return useMutation({
    mutationFn: signUp,
    onSuccess: async (me) => {
      queryClient.clear();
      // The answer is the new session; seed it so the next page does not ask again.
      queryClient.setQueryData(sessionMeKey, me);
      await refreshCsrfToken();
    },
  });
}
