import { useMutation } from '@tanstack/react-query';
import type { LoginInput } from '@seamwright/shared';
import { api, refreshCsrfToken } from '../../../lib/api-client';
import { queryClient } from '../../../lib/query-client';
import { authPaths } from '../../../config/api-paths';

export async function signIn(input: LoginInput): Promise<void> {
  await api.post(authPaths.signIn, input);
}

/** A new session: fresh CSRF token and nothing cached from whoever was here before. */
export function useSignIn() {
  return useMutation({
    mutationFn: signIn,
    onSuccess: async () => {
      queryClient.clear();
      await refreshCsrfToken();
    },
  });
}
