import {
  GroundModelDetailSchema,
  GroundModelSummarySchema,
  GroundModelPreviewSchema,
  type GroundModelContentInput,
  type GroundModelCreate,
  type GroundModelDetail,
  type GroundModelPreview,
  type GroundModelSummary,
} from '@porestack/types';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { designKeys } from './design-keys';

export function useGroundModels(orgId: string, projectId: string) {
  return useQuery({
    queryKey: designKeys.groundModels(orgId, projectId),
    queryFn: (): Promise<GroundModelSummary[]> => api.get(apiPaths.groundModels(orgId, projectId), GroundModelSummarySchema.array()),
  });
}

export const groundModelQueryOptions = (orgId: string, projectId: string, modelId: string, revision: number | null) =>
  queryOptions({
    queryKey: designKeys.groundModel(orgId, projectId, modelId, revision),
    queryFn: (): Promise<GroundModelDetail> => api.get(`${apiPaths.groundModel(orgId, projectId, modelId)}${revision === null ? '' : `?revision=${revision}`}`, GroundModelDetailSchema),
  });

export function useGroundModel(orgId: string, projectId: string, modelId: string, revision: number | null) {
  return useQuery({ ...groundModelQueryOptions(orgId, projectId, modelId, revision), enabled: modelId !== '' });
}

/** Saves a new ground model (modelId null) or its next revision. */
export function useSaveGroundModel(orgId: string, projectId: string, modelId: string | null) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: GroundModelCreate) =>
      modelId === null
        ? api.post(apiPaths.groundModels(orgId, projectId), body, GroundModelDetailSchema)
        : api.post(apiPaths.groundModelRevisions(orgId, projectId, modelId), body, GroundModelDetailSchema),
    onSuccess: () => {
      // Not awaited: the page moves on with the saved answer while the lists refresh behind it.
      void client.invalidateQueries({ queryKey: designKeys.groundModels(orgId, projectId) });
    },
  });
}


/** The resolved values, stresses, errors and warnings of a ground model being edited, without saving it. */
export function previewGroundModel(orgId: string, projectId: string, body: GroundModelContentInput): Promise<GroundModelPreview> {
  return api.post(apiPaths.groundModelPreview(orgId, projectId), body, GroundModelPreviewSchema);
}
