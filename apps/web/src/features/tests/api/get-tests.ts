import { TestSummarySchema, type TestListQuery, type TestSummary } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

const TestsSchema = TestSummarySchema.array();

export function getTests(orgId: string, filters: TestListQuery): Promise<TestSummary[]> {
  const query = new URLSearchParams(Object.entries(filters).filter((entry): entry is [string, string] => typeof entry[1] === 'string' && entry[1] !== ''));
  const search = query.toString();
  return api.get(`${apiPaths.tests(orgId)}${search ? `?${search}` : ''}`, TestsSchema);
}

export const testsQueryOptions = (orgId: string, filters: TestListQuery = {}) =>
  queryOptions({ queryKey: ['orgs', orgId, 'tests', 'list', filters], queryFn: () => getTests(orgId, filters) });

export function useTests(orgId: string, filters: TestListQuery) {
  return useQuery(testsQueryOptions(orgId, filters));
}
