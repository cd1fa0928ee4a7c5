import { UploadPreviewSchema, type CsvDelimiter, type UploadPreview } from '@porestack/types';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

/** What the preview is asked to read the file with; unset: what the server detects. */
export type PreviewChoice = { headerRow?: number | undefined; delimiter?: CsvDelimiter | undefined };

export function getUploadPreview(orgId: string, uploadId: string, choice: PreviewChoice = {}): Promise<UploadPreview> {
  const query = new URLSearchParams();
  if (choice.headerRow !== undefined) query.set('headerRow', String(choice.headerRow));
  if (choice.delimiter !== undefined) query.set('delimiter', choice.delimiter);
  const search = query.size > 0 ? `?${query.toString()}` : '';
  return api.get(`${apiPaths.uploadPreview(orgId, uploadId)}${search}`, UploadPreviewSchema);
}

export const uploadPreviewQueryOptions = (orgId: string, uploadId: string, choice: PreviewChoice = {}) =>
  queryOptions({
    queryKey: ['orgs', orgId, 'uploads', uploadId, 'preview', choice.headerRow ?? 'detected', choice.delimiter ?? 'detected'],
    queryFn: () => getUploadPreview(orgId, uploadId, choice),
    staleTime: Infinity,
  });

/** The file's first rows read with the chosen header row and delimiter; the previous answer stays shown while the next loads. */
export function useUploadPreview(orgId: string, uploadId: string, choice: PreviewChoice = {}) {
  return useQuery({ ...uploadPreviewQueryOptions(orgId, uploadId, choice), placeholderData: keepPreviousData });
}
