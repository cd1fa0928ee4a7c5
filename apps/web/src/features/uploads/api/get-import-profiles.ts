import { ImportProfileSchema, type ImportProfile } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

const ProfilesSchema = ImportProfileSchema.array();

export function getImportProfiles(orgId: string): Promise<ImportProfile[]> {
  return api.get(apiPaths.importProfiles(orgId), ProfilesSchema);
}

export const importProfilesQueryOptions = (orgId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'import-profiles'], queryFn: () => getImportProfiles(orgId) });

export function useImportProfiles(orgId: string) {
  return useQuery(importProfilesQueryOptions(orgId));
}
