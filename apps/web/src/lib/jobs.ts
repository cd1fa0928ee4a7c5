import { JobRunSchema, type JobRun } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../config/paths';
import { api } from './api-client';

/**
 * Background jobs (import, analysis) are followed the same way from several features, so the
 * query lives here rather than in one feature that the others would have to import.
 */
export function getJob(orgId: string, jobId: string): Promise<JobRun> {
  return api.get(apiPaths.job(orgId, jobId), JobRunSchema);
}

export const isJobRunning = (job: JobRun | undefined): boolean => job !== undefined && (job.state === 'queued' || job.state === 'running');

/** Polled every second while the job is queued or running; the page stays usable meanwhile. */
export const jobQueryOptions = (orgId: string, jobId: string) =>
  queryOptions({
    queryKey: ['orgs', orgId, 'jobs', jobId],
    queryFn: () => getJob(orgId, jobId),
    refetchInterval: (query) => (query.state.data === undefined || isJobRunning(query.state.data) ? 1000 : false),
    staleTime: 0,
  });

export function useJob(orgId: string, jobId: string | null) {
  return useQuery({ ...jobQueryOptions(orgId, jobId ?? 'none'), enabled: jobId !== null });
}
