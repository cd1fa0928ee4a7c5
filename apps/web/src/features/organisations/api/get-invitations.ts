import { InvitationSchema, type Invitation } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

const InvitationsSchema = InvitationSchema.array();

/** Invitations not yet accepted, revoked or expired. */
export function getInvitations(orgId: string): Promise<Invitation[]> {
  return api.get(apiPaths.invitations(orgId), InvitationsSchema);
}

export const invitationsQueryOptions = (orgId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'invitations'], queryFn: () => getInvitations(orgId) });

export function useInvitations(orgId: string) {
  return useQuery(invitationsQueryOptions(orgId));
}
