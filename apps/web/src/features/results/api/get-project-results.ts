import { ProjectResultsSchema, type ProjectResults } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

/** A project's approved results: boreholes, samples and each test's current approved version. */
export function getProjectResults(orgId: string, projectId: string): Promise<ProjectResults> {
  return api.get(apiPaths.projectResults(orgId, projectId), ProjectResultsSchema);
}

export const projectResultsQueryOptions = (orgId: string, projectId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'projects', projectId, 'results'], queryFn: () => getProjectResults(orgId, projectId) });

export function useProjectResults(orgId: string, projectId: string) {
  return useQuery(projectResultsQueryOptions(orgId, projectId));
}
