import { ProjectShareOutcomeSchema, type ProjectShareCreate, type ProjectShareOutcome } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { projectClientsQueryOptions } from './get-project-clients';

/** Shares the project with a client member at once, or invites the address as a client with it. */
export function shareProject(orgId: string, projectId: string, input: ProjectShareCreate): Promise<ProjectShareOutcome> {
  return api.post(apiPaths.projectClients(orgId, projectId), input, ProjectShareOutcomeSchema);
}

export function useShareProject(orgId: string, projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ProjectShareCreate) => shareProject(orgId, projectId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectClientsQueryOptions(orgId, projectId).queryKey }),
  });
}
