import { MemberSchema, type Member } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

const MembersSchema = MemberSchema.array();

export function getMembers(orgId: string): Promise<Member[]> {
  return api.get(apiPaths.members(orgId), MembersSchema);
}

export const membersQueryOptions = (orgId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'members'], queryFn: () => getMembers(orgId) });

export function useMembers(orgId: string) {
  return useQuery(membersQueryOptions(orgId));
}
