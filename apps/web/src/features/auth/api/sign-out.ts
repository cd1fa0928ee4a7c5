import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api, forgetCsrfToken } from '../../../lib/api-client';
import { sessionQueryOptions } from './get-session';

export async function signOut(): Promise<void> {
  await api.post(apiPaths.signOut);
  forgetCsrfToken();
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      queryClient.clear();
      queryClient.setQueryData(sessionQueryOptions().queryKey, null);
    },
  });
}
