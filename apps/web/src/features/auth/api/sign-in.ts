import { SessionSchema, type Session, type SignIn } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api, forgetCsrfToken } from '../../../lib/api-client';
import { sessionQueryOptions } from './get-session';

export async function signIn(input: SignIn): Promise<Session> {
  const session = await api.post(apiPaths.signIn, input, SessionSchema);
  forgetCsrfToken();
  return session;
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (session) => {
      // Nothing cached before sign-in belongs to this person.
      queryClient.clear();
      queryClient.setQueryData(sessionQueryOptions().queryKey, session);
    },
  });
}
