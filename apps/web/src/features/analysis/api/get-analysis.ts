import { AnalysisSchema, type Analysis } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';

/** The stored analysis, or null while the test has none yet (the API answers 404). */
export async function getAnalysis(orgId: string, testId: string): Promise<Analysis | null> {
  try {
    return await api.get(apiPaths.testAnalysis(orgId, testId), AnalysisSchema);
  } catch (error) {
    if (error instanceof ApiError && error.status === 404) return null;
    throw error;
  }
}

export const analysisQueryOptions = (orgId: string, testId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'tests', testId, 'analysis'], queryFn: () => getAnalysis(orgId, testId) });

export function useAnalysis(orgId: string, testId: string) {
  return useQuery(analysisQueryOptions(orgId, testId));
}
