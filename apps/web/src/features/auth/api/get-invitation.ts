import { InvitationPreviewSchema, type InvitationPreview } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

export function getInvitation(token: string): Promise<InvitationPreview> {
  return api.get(apiPaths.invitation(token), InvitationPreviewSchema);
}

/** Not under ['orgs', …]: the invitee is not a member yet, and the token is all we know. */
export const invitationQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['invitations', token], queryFn: () => getInvitation(token), staleTime: Infinity });

export function useInvitation(token: string) {
  return useQuery(invitationQueryOptions(token));
}
