import type { JobRun } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { JobAnswer } from './job-answer';

export function rerunAnalysis(orgId: string, testId: string): Promise<JobRun | null> {
  return api.post(apiPaths.testAnalysis(orgId, testId), {}, JobAnswer);
}

export function useRerunAnalysis(orgId: string, testId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => rerunAnalysis(orgId, testId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['orgs', orgId, 'tests', testId] }),
  });
}
