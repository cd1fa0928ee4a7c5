import { SampleSchema, type Sample, type SampleCreate } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { samplesQueryOptions } from './get-samples';

export function createSample(orgId: string, boreholeId: string, body: SampleCreate): Promise<Sample> {
  return api.post(apiPaths.samples(orgId, boreholeId), body, SampleSchema);
}

export function useCreateSample(orgId: string, boreholeId: string, projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SampleCreate) => createSample(orgId, boreholeId, body),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: samplesQueryOptions(orgId, boreholeId).queryKey }),
        queryClient.invalidateQueries({ queryKey: ['orgs', orgId, 'projects', projectId, 'boreholes'] }),
      ]),
  });
}
