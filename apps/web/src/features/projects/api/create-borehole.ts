import { BoreholeSchema, type Borehole, type BoreholeCreate } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { boreholesQueryOptions } from './get-boreholes';
import { projectsQueryOptions } from './get-projects';

export function createBorehole(orgId: string, projectId: string, body: BoreholeCreate): Promise<Borehole> {
  return api.post(apiPaths.boreholes(orgId, projectId), body, BoreholeSchema);
}

export function useCreateBorehole(orgId: string, projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: BoreholeCreate) => createBorehole(orgId, projectId, body),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: boreholesQueryOptions(orgId, projectId).queryKey }),
        queryClient.invalidateQueries({ queryKey: projectsQueryOptions(orgId).queryKey, exact: true }),
      ]),
  });
}
