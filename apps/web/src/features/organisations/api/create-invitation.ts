import { InvitationSchema, type Invitation, type InvitationCreate } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { auditQueryOptions } from './get-audit';
import { invitationsQueryOptions } from './get-invitations';

export function createInvitation(orgId: string, input: InvitationCreate): Promise<Invitation> {
  return api.post(apiPaths.invitations(orgId), input, InvitationSchema);
}

export function useCreateInvitation(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InvitationCreate) => createInvitation(orgId, input),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: invitationsQueryOptions(orgId).queryKey }),
        queryClient.invalidateQueries({ queryKey: auditQueryOptions(orgId).queryKey }),
      ]),
  });
}
