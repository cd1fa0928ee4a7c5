import { BoreholeSchema, type Borehole } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

const BoreholesSchema = BoreholeSchema.array();

export function getBoreholes(orgId: string, projectId: string): Promise<Borehole[]> {
  return api.get(apiPaths.boreholes(orgId, projectId), BoreholesSchema);
}

export const boreholesQueryOptions = (orgId: string, projectId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'projects', projectId, 'boreholes'], queryFn: () => getBoreholes(orgId, projectId) });

export function useBoreholes(orgId: string, projectId: string) {
  return useQuery(boreholesQueryOptions(orgId, projectId));
}
