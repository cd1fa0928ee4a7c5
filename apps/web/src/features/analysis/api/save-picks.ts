import type { JobRun, PicksUpdate } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { JobAnswer } from './job-answer';

/** Saves the overrides with their reason; the server re-runs the analysis as a job. */
export function savePicks(orgId: string, testId: string, body: PicksUpdate): Promise<JobRun | null> {
  return api.put(apiPaths.testPicks(orgId, testId), body, JobAnswer);
}

export function useSavePicks(orgId: string, testId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: PicksUpdate) => savePicks(orgId, testId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['orgs', orgId, 'tests', testId] }),
  });
}
