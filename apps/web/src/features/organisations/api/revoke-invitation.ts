import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { auditQueryOptions } from './get-audit';
import { invitationsQueryOptions } from './get-invitations';

export function revokeInvitation(orgId: string, invitationId: string): Promise<void> {
  return api.delete(apiPaths.orgInvitation(orgId, invitationId));
}

export function useRevokeInvitation(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) => revokeInvitation(orgId, invitationId),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: invitationsQueryOptions(orgId).queryKey }),
        queryClient.invalidateQueries({ queryKey: auditQueryOptions(orgId).queryKey }),
      ]),
  });
}
