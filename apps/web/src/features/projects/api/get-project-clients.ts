import { ProjectClientsSchema, type ProjectClients } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

/** Who the project is shared with: client members and pending client invitations. */
export function getProjectClients(orgId: string, projectId: string): Promise<ProjectClients> {
  return api.get(apiPaths.projectClients(orgId, projectId), ProjectClientsSchema);
}

export const projectClientsQueryOptions = (orgId: string, projectId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'projects', projectId, 'clients'], queryFn: () => getProjectClients(orgId, projectId) });

export function useProjectClients(orgId: string, projectId: string) {
  return useQuery(projectClientsQueryOptions(orgId, projectId));
}
