import { ImportTrialSchema, type ImportMapping, type ImportTrial } from '@porestack/types';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

export function trialImport(orgId: string, uploadId: string, mapping: ImportMapping): Promise<ImportTrial> {
  return api.post(apiPaths.uploadTrial(orgId, uploadId), { mapping }, ImportTrialSchema);
}

export const importTrialQueryOptions = (orgId: string, uploadId: string, mapping: ImportMapping | null) =>
  queryOptions({
    queryKey: ['orgs', orgId, 'uploads', uploadId, 'trial', mapping],
    queryFn: () => trialImport(orgId, uploadId, mapping as ImportMapping),
    enabled: mapping !== null,
    staleTime: Infinity,
  });

/** The first increment as a mapping would import it; read again whenever the mapping changes. */
export function useImportTrial(orgId: string, uploadId: string, mapping: ImportMapping | null) {
  return useQuery({ ...importTrialQueryOptions(orgId, uploadId, mapping), placeholderData: keepPreviousData });
}
