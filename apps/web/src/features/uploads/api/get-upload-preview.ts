import { UploadPreviewSchema, type UploadPreview } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

export function getUploadPreview(orgId: string, uploadId: string): Promise<UploadPreview> {
  return api.get(apiPaths.uploadPreview(orgId, uploadId), UploadPreviewSchema);
}

export const uploadPreviewQueryOptions = (orgId: string, uploadId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'uploads', uploadId, 'preview'], queryFn: () => getUploadPreview(orgId, uploadId), staleTime: Infinity });

export function useUploadPreview(orgId: string, uploadId: string) {
  return useQuery(uploadPreviewQueryOptions(orgId, uploadId));
}
