import { MemberSchema, type Member, type Role } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { SESSION_QUERY_KEY } from '../../../lib/query-client';
import { auditQueryOptions } from './get-audit';
import { membersQueryOptions } from './get-members';

/** Sends the member's whole new set of roles. The API may answer with the updated member or with no body; either way the list is refetched. */
export async function updateMemberRoles(orgId: string, userId: string, roles: readonly Role[]): Promise<Member | undefined> {
  const body = await api.patch<unknown>(apiPaths.member(orgId, userId), { roles });
  return body === undefined ? undefined : MemberSchema.parse(body);
}

export function useUpdateMemberRoles(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, roles }: { userId: string; roles: readonly Role[] }) => updateMemberRoles(orgId, userId, roles),
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: membersQueryOptions(orgId).queryKey }),
        queryClient.invalidateQueries({ queryKey: auditQueryOptions(orgId).queryKey }),
        // The session carries the signed-in person's own roles (navigation, role gates).
        queryClient.invalidateQueries({ queryKey: SESSION_QUERY_KEY }),
      ]),
  });
}
