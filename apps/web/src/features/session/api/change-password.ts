import { useMutation } from '@tanstack/react-query';
import type { ChangePasswordInput } from '@seamwright/shared';
import { api } from '../../../lib/api-client';

/** `POST /api/me/password`: this session stays signed in; every other one ends. */
export async function changePassword(input: ChangePasswordInput): Promise<void> {
  await api.post('/me/password', input);
}

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
