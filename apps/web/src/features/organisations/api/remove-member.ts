import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { auditQueryOptions } from './get-audit';
import { membersQueryOptions } from './get-members';

export function removeMember(orgId: string, userId: string): Promise<void> {
  return api.delete(apiPaths.member(orgId, userId));
}

export function useRemoveMember(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => removeMember(orgId, userId),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: membersQueryOptions(orgId).queryKey }),
        queryClient.invalidateQueries({ queryKey: auditQueryOptions(orgId).queryKey }),
      ]),
  });
}
