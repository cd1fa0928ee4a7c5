import { ProjectDetailSchema, type ProjectDetail } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

export function getProject(orgId: string, projectId: string): Promise<ProjectDetail> {
  return api.get(apiPaths.project(orgId, projectId), ProjectDetailSchema);
}

export const projectQueryOptions = (orgId: string, projectId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'projects', projectId], queryFn: () => getProject(orgId, projectId) });

export function useProject(orgId: string, projectId: string) {
  return useQuery(projectQueryOptions(orgId, projectId));
}
