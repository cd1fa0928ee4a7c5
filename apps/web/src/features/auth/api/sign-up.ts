import { SessionSchema, SignUpSentSchema, type Session, type SignUp, type SignUpConfirm, type SignUpSent } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api, forgetCsrfToken } from '../../../lib/api-client';
import { sessionQueryOptions } from './get-session';

/** Answers 202 with the same words whether or not the address has an account: the e-mail says which. */
export async function signUp(input: SignUp): Promise<SignUpSent> {
  return api.post(apiPaths.signUp, input, SignUpSentSchema);
}

export function useSignUp() {
  return useMutation({ mutationFn: signUp });
}

/** The e-mailed link's step: creates the account and its organisation, signed in. */
export async function confirmSignUp(input: SignUpConfirm): Promise<Session> {
  const session = await api.post(apiPaths.signUpConfirm, input, SessionSchema);
  forgetCsrfToken();
  return session;
}

export function useConfirmSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: confirmSignUp,
    onSuccess: (session) => {
      queryClient.clear();
      queryClient.setQueryData(sessionQueryOptions().queryKey, session);
    },
  });
}
