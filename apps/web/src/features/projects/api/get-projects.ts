import { ProjectSummarySchema, type ProjectSummary } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

const ProjectsSchema = ProjectSummarySchema.array();

export function getProjects(orgId: string): Promise<ProjectSummary[]> {
  return api.get(apiPaths.projects(orgId), ProjectsSchema);
}

export const projectsQueryOptions = (orgId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'projects'], queryFn: () => getProjects(orgId) });

export function useProjects(orgId: string) {
  return useQuery(projectsQueryOptions(orgId));
}
