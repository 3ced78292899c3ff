import { useMutation } from '@tanstack/react-query';
import type { SignupInput } from '@seamwright/shared';
import { api, refreshCsrfToken } from '../../../lib/api-client';
import { queryClient } from '../../../lib/query-client';
import { authPaths } from '../../../config/api-paths';

/** Creates the company and its owner, and signs the owner in. */
export async function signUp(input: SignupInput): Promise<void> {
  await api.post(authPaths.signUp, input);
}

export function useSignUp() {
  return useMutation({
    mutationFn: signUp,
    onSuccess: async () => {
      queryClient.clear();
      await refreshCsrfToken();
    },
  });
}
