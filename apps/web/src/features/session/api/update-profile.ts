import { useMutation } from '@tanstack/react-query';
import type { ItemResponse, MeView, UpdateProfileInput } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { queryClient } from '../../../lib/query-client';
import { sessionKeys } from './session-keys';

/** `PATCH /api/me`: the signed-in person's own name; answers the session with it. */
export async function updateProfile(input: UpdateProfileInput): Promise<MeView> {
  const body = await api.patch<ItemResponse<MeView>>('/me', input);
  return body.data;
}

/** The answer replaces the session, so the name in the menu changes at once. */
export function useUpdateProfile() {
  return useMutation({
    mutationFn: updateProfile,
    onSuccess: (me) => queryClient.setQueryData(sessionKeys.me(), me),
  });
}
