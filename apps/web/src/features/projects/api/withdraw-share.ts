import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { projectClientsQueryOptions } from './get-project-clients';

export type ShareToWithdraw = { kind: 'client'; userId: string } | { kind: 'invitation'; invitationId: string };

/** Withdraws the project from a client, or from a pending client invitation. */
export function withdrawShare(orgId: string, projectId: string, share: ShareToWithdraw): Promise<void> {
  return api.delete(
    share.kind === 'client' ? apiPaths.projectClient(orgId, projectId, share.userId) : apiPaths.projectClientInvitation(orgId, projectId, share.invitationId),
  );
}

export function useWithdrawShare(orgId: string, projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (share: ShareToWithdraw) => withdrawShare(orgId, projectId, share),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectClientsQueryOptions(orgId, projectId).queryKey }),
  });
}
