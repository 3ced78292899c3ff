import { useMutation } from '@tanstack/react-query';
import { api, refreshCsrfToken } from '../../../lib/api-client';
import { queryClient } from '../../../lib/query-client';
import { authPaths } from '../../../config/api-paths';

/** Ends the session. */
export async function signOut(): Promise<void> {
  await api.post(authPaths.signOut);
}

export function useSignOut(onSignedOut: () => void) {
  return useMutation({
    mutationFn: signOut,
    // Even if the server call fails the user wants out: clear what we hold either way.
    onSettled: async () => {
      queryClient.clear();
      await refreshCsrfToken();
      onSignedOut();
    },
  });
}
