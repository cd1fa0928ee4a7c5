import type { PasswordResetRequest } from '@porestack/types';
import { useMutation } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

/** Answers 202 whether or not the address has an account, so nobody can probe for accounts. */
export async function requestPasswordReset(input: PasswordResetRequest): Promise<void> {
  await api.post(apiPaths.passwordResetRequest, input);
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
