import { JobRunSchema, UploadSchema, type JobRun, type Upload } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api, type UploadProgress } from '../../../lib/api-client';

export type UploadCreated = { upload: Upload; job: JobRun | null };

/** The answer to an upload: the stored file, and the import job when one was started at once. */
const UploadCreatedParser = {
  parse: (value: unknown): UploadCreated => {
    const body = (value ?? {}) as { upload?: unknown; job?: unknown };
    return { upload: UploadSchema.parse(body.upload), job: body.job ? JobRunSchema.parse(body.job) : null };
  },
};

export function uploadReadingsFile(orgId: string, testId: string, file: File, onProgress: (p: UploadProgress) => void, signal?: AbortSignal): Promise<UploadCreated> {
  const form = new FormData();
  form.append('file', file, file.name);
  return api.upload(apiPaths.testUploads(orgId, testId), form, UploadCreatedParser, { onProgress, ...(signal ? { signal } : {}) });
}

export function useUploadReadingsFile(orgId: string, testId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, onProgress, signal }: { file: File; onProgress: (p: UploadProgress) => void; signal?: AbortSignal }) =>
      uploadReadingsFile(orgId, testId, file, onProgress, signal),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['orgs', orgId, 'tests', testId] }),
  });
}
