import { ProjectDetailSchema, type ProjectCreate, type ProjectDetail } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { projectsQueryOptions } from './get-projects';

export function createProject(orgId: string, body: ProjectCreate): Promise<ProjectDetail> {
  return api.post(apiPaths.projects(orgId), body, ProjectDetailSchema);
}

export function useCreateProject(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ProjectCreate) => createProject(orgId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectsQueryOptions(orgId).queryKey }),
  });
}
