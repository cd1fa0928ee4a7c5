import { IssuedReportSchema, type IssuedReport } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';

export function getVersionReport(orgId: string, recordId: string, version: number): Promise<IssuedReport> {
  return api.get(apiPaths.versionReport(orgId, recordId, version), IssuedReportSchema);
}

export const versionReportQueryOptions = (orgId: string, recordId: string, version: number) =>
  queryOptions({
    queryKey: ['orgs', orgId, 'soil-records', recordId, 'versions', version, 'report'],
    queryFn: () => getVersionReport(orgId, recordId, version),
    // 404 means no report was ever issued for this version: an answer, not a failure to retry.
    retry: (count, error) => !(error instanceof ApiError && error.status === 404) && count < 2,
    // While the worker prints it, follow its state; a settled report does not change.
    refetchInterval: (query) => (query.state.data?.state === 'queued' || query.state.data?.state === 'running' ? 1500 : false),
  });

export function useVersionReport(orgId: string, recordId: string, version: number) {
  return useQuery(versionReportQueryOptions(orgId, recordId, version));
}
