import { UploadSchema, type Upload } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

const UploadsSchema = UploadSchema.array();

export function getUploads(orgId: string, testId: string): Promise<Upload[]> {
  return api.get(apiPaths.testUploads(orgId, testId), UploadsSchema);
}

const inProgress = (uploads: readonly Upload[] | undefined) => uploads?.some((u) => u.status === 'importing' || u.status === 'stored') ?? false;

export const uploadsQueryOptions = (orgId: string, testId: string) =>
  queryOptions({
    queryKey: ['orgs', orgId, 'tests', testId, 'uploads'],
    queryFn: () => getUploads(orgId, testId),
    refetchInterval: (query) => (inProgress(query.state.data) ? 1500 : false),
  });

export function useUploads(orgId: string, testId: string) {
  return useQuery(uploadsQueryOptions(orgId, testId));
}
