import { TestSummarySchema, type TestSummary } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

const TestsSchema = TestSummarySchema.array();

/** The project's tests, to list under each sample. Keyed under 'tests' so any test change refreshes it. */
export function getProjectTests(orgId: string, projectId: string): Promise<TestSummary[]> {
  return api.get(`${apiPaths.tests(orgId)}?projectId=${encodeURIComponent(projectId)}`, TestsSchema);
}

export const projectTestsQueryOptions = (orgId: string, projectId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'tests', 'list', { projectId }], queryFn: () => getProjectTests(orgId, projectId) });

export function useProjectTests(orgId: string, projectId: string) {
  return useQuery(projectTestsQueryOptions(orgId, projectId));
}
