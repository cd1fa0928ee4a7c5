import { MemberSchema, type Member, type Role } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { auditQueryOptions } from './get-audit';
import { membersQueryOptions } from './get-members';

/** The API may answer with the updated member or with no body; either way the list is refetched. */
export async function updateMemberRole(orgId: string, userId: string, role: Role): Promise<Member | undefined> {
  const body = await api.patch<unknown>(apiPaths.member(orgId, userId), { role });
  return body === undefined ? undefined : MemberSchema.parse(body);
}

export function useUpdateMemberRole(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) => updateMemberRole(orgId, userId, role),
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: membersQueryOptions(orgId).queryKey }),
        queryClient.invalidateQueries({ queryKey: auditQueryOptions(orgId).queryKey }),
      ]),
  });
}
