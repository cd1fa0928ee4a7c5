import {
  CharacteristicSetDetailSchema,
  CharacteristicSetSummarySchema,
  SetStatisticsSchema,
  type CharacteristicSetDetail,
  type CharacteristicSetInput,
  type CharacteristicSetSummary,
  type SetStatistics,
} from '@porestack/types';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { designKeys } from './design-keys';

export function useCharacteristicSets(orgId: string, projectId: string) {
  return useQuery({
    queryKey: designKeys.sets(orgId, projectId),
    queryFn: (): Promise<CharacteristicSetSummary[]> => api.get(apiPaths.characteristicSets(orgId, projectId), CharacteristicSetSummarySchema.array()),
  });
}

export function useCharacteristicSet(orgId: string, projectId: string, setId: string, revision: number | null) {
  return useQuery({
    queryKey: designKeys.set(orgId, projectId, setId, revision),
    queryFn: (): Promise<CharacteristicSetDetail> =>
      api.get(`${apiPaths.characteristicSet(orgId, projectId, setId)}${revision === null ? '' : `?revision=${revision}`}`, CharacteristicSetDetailSchema),
    enabled: setId !== '',
  });
}

/** n, mean, bounds and Schneider's values of the versions picked, before anything is saved. */
export function useSetStatistics(orgId: string, projectId: string, versionIds: readonly string[]) {
  const sorted = [...versionIds].sort();
  return useQuery({
    queryKey: [...designKeys.sets(orgId, projectId), 'statistics', sorted],
    queryFn: (): Promise<SetStatistics> => api.post(apiPaths.setStatistics(orgId, projectId), { versionIds: sorted }, SetStatisticsSchema),
    enabled: sorted.length > 0,
    placeholderData: (previous) => previous,
  });
}

/** Saves a new set (setId null) or its next revision. */
export function useSaveCharacteristicSet(orgId: string, projectId: string, setId: string | null) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: CharacteristicSetInput) =>
      setId === null
        ? api.post(apiPaths.characteristicSets(orgId, projectId), body, CharacteristicSetDetailSchema)
        : api.post(apiPaths.characteristicSetRevisions(orgId, projectId, setId), body, CharacteristicSetDetailSchema),
    onSuccess: () => {
      // Not awaited: the page moves on with the saved answer while the lists refresh behind it.
      void client.invalidateQueries({ queryKey: designKeys.sets(orgId, projectId) });
    },
  });
}
