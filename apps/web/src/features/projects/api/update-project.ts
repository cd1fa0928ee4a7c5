import { ProjectDetailSchema, type ProjectDetail, type ProjectUpdate } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { projectQueryOptions } from './get-project';
import { projectsQueryOptions } from './get-projects';

export function updateProject(orgId: string, projectId: string, body: ProjectUpdate): Promise<ProjectDetail> {
  return api.patch(apiPaths.project(orgId, projectId), body, ProjectDetailSchema);
}

export function useUpdateProject(orgId: string, projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ProjectUpdate) => updateProject(orgId, projectId, body),
    onSuccess: (project) => {
      queryClient.setQueryData(projectQueryOptions(orgId, projectId).queryKey, project);
      return queryClient.invalidateQueries({ queryKey: projectsQueryOptions(orgId).queryKey });
    },
  });
}
