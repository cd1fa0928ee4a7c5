import { SessionSchema, type InvitationAccept, type Session } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api, forgetCsrfToken } from '../../../lib/api-client';
import { sessionQueryOptions } from './get-session';

export async function acceptInvitation(token: string, input: InvitationAccept): Promise<Session> {
  const session = await api.post(apiPaths.invitationAccept(token), input, SessionSchema);
  forgetCsrfToken();
  return session;
}

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InvitationAccept) => acceptInvitation(token, input),
    onSuccess: (session) => {
      queryClient.clear();
      queryClient.setQueryData(sessionQueryOptions().queryKey, session);
    },
  });
}
