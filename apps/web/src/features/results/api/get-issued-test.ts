import { IssuedTestSummarySchema, type IssuedTestSummary } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

/** One approved version as issued: sample, specimen, parameters and the approved analysis' curves. */
export function getIssuedTest(orgId: string, recordId: string, version: number): Promise<IssuedTestSummary> {
  return api.get(apiPaths.issuedTestSummary(orgId, recordId, version), IssuedTestSummarySchema);
}

export const issuedTestQueryOptions = (orgId: string, recordId: string, version: number) =>
  queryOptions({
    queryKey: ['orgs', orgId, 'soil-records', recordId, 'versions', version, 'summary'],
    queryFn: () => getIssuedTest(orgId, recordId, version),
    // An approved version never changes.
    staleTime: Infinity,
  });

export function useIssuedTest(orgId: string, recordId: string, version: number) {
  return useQuery(issuedTestQueryOptions(orgId, recordId, version));
}
