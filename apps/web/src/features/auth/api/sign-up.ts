import { SessionSchema, type Session, type SignUp } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api, forgetCsrfToken } from '../../../lib/api-client';
import { sessionQueryOptions } from './get-session';

export async function signUp(input: SignUp): Promise<Session> {
  const session = await api.post(apiPaths.signUp, input, SessionSchema);
  forgetCsrfToken();
  return session;
}

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (session) => {
      queryClient.clear();
      queryClient.setQueryData(sessionQueryOptions().queryKey, session);
    },
  });
}
