import { SampleSchema, type Sample } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

const SamplesSchema = SampleSchema.array();

export function getSamples(orgId: string, boreholeId: string): Promise<Sample[]> {
  return api.get(apiPaths.samples(orgId, boreholeId), SamplesSchema);
}

export const samplesQueryOptions = (orgId: string, boreholeId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'boreholes', boreholeId, 'samples'], queryFn: () => getSamples(orgId, boreholeId) });

export function useSamples(orgId: string, boreholeId: string) {
  return useQuery(samplesQueryOptions(orgId, boreholeId));
}
