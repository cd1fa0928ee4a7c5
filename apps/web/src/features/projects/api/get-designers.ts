import { ProjectDesignerSchema, type ProjectDesigner } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

/** The organisation's members with the designer role: who can be told about a project's new versions. */
export function getDesigners(orgId: string): Promise<ProjectDesigner[]> {
  return api.get(apiPaths.designers(orgId), ProjectDesignerSchema.array());
}

export const designersQueryOptions = (orgId: string) => queryOptions({ queryKey: ['orgs', orgId, 'designers'], queryFn: () => getDesigners(orgId) });

export function useDesigners(orgId: string) {
  return useQuery(designersQueryOptions(orgId));
}
