import type { PasswordResetConfirm } from '@porestack/types';
import { useMutation } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

export async function confirmPasswordReset(input: PasswordResetConfirm): Promise<void> {
  await api.post(apiPaths.passwordResetConfirm, input);
}

export function useConfirmPasswordReset() {
  return useMutation({ mutationFn: confirmPasswordReset });
}
