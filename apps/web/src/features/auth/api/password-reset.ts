import { useMutation } from '@tanstack/react-query';
import type { PasswordResetComplete, PasswordResetRequest } from '@seamwright/shared';
import { api } from '../../../lib/api-client';
import { authPaths } from '../../../config/api-paths';

/** Asks for a reset link; the server answers the same whether or not the e-mail is known. */
export async function requestPasswordReset(input: PasswordResetRequest): Promise<void> {
  await api.post(authPaths.passwordReset, input);
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}

export async function completePasswordReset(
  token: string,
  input: PasswordResetComplete,
): Promise<void> {
  await api.post(authPaths.passwordResetComplete(token), input);
}

export function useCompletePasswordReset(token: string) {
  return useMutation({
    mutationFn: (input: PasswordResetComplete) => completePasswordReset(token, input),
  });
}
