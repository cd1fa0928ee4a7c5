import { JobRunSchema, type ImportRequest, type JobRun } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { importProfilesQueryOptions } from './get-import-profiles';

/** The API answers with the job, or with `{ job }`; either way the job is what the page follows. */
const JobAnswer = {
  parse: (value: unknown): JobRun => {
    const body = value as { job?: unknown } | undefined;
    return JobRunSchema.parse(body && typeof body === 'object' && 'job' in body ? body.job : value);
  },
};

export function startImport(orgId: string, uploadId: string, body: ImportRequest): Promise<JobRun> {
  return api.post(apiPaths.uploadImport(orgId, uploadId), body, JobAnswer);
}

export function useStartImport(orgId: string, testId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ uploadId, body }: { uploadId: string; body: ImportRequest }) => startImport(orgId, uploadId, body),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['orgs', orgId, 'tests', testId] }),
        queryClient.invalidateQueries({ queryKey: importProfilesQueryOptions(orgId).queryKey }),
      ]),
  });
}
