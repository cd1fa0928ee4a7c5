import { TestDetailSchema, type TestDetail } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

export function getTest(orgId: string, testId: string): Promise<TestDetail> {
  return api.get(apiPaths.test(orgId, testId), TestDetailSchema);
}

/** Key of one test; its analysis, uploads, readings and reviews sit under it. */
export const testQueryOptions = (orgId: string, testId: string) =>
  queryOptions({
    queryKey: ['orgs', orgId, 'tests', testId],
    queryFn: () => getTest(orgId, testId),
    // While an import or analysis runs the status moves on its own; look again every two seconds.
    refetchInterval: (query) =>
      query.state.data && (query.state.data.pendingJobId !== null || query.state.data.status === 'readings_uploaded') ? 2000 : false,
  });

export function useTest(orgId: string, testId: string) {
  return useQuery(testQueryOptions(orgId, testId));
}
