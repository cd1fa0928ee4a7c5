import {
  CheckRevisionSchema,
  FootingImportResultSchema,
  FootingSettlementResultSchema,
  RevisionComparisonSchema,
  RunCheckAnswerSchema,
  SettlementCheckDetailSchema,
  SettlementCheckSummarySchema,
  SizingAnswerSchema,
  type CheckRevision,
  type FootingImportResult,
  type FootingSettlementResult,
  type RevisionComparison,
  type RunCheckAnswer,
  type SettlementCheckCreate,
  type SettlementCheckDetail,
  type SettlementCheckSummary,
  type SettlementCheckUpdate,
  type SizingAnswer,
  type SizingApply,
  type SizingRequest,
} from '@porestack/types';
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { designKeys } from './design-keys';

export function useChecks(orgId: string, projectId: string) {
  return useQuery({
    queryKey: designKeys.checks(orgId, projectId),
    queryFn: (): Promise<SettlementCheckSummary[]> => api.get(apiPaths.checks(orgId, projectId), SettlementCheckSummarySchema.array()),
  });
}

export function useCheck(orgId: string, projectId: string, checkId: string) {
  return useQuery({
    queryKey: designKeys.check(orgId, projectId, checkId),
    queryFn: (): Promise<SettlementCheckDetail> => api.get(apiPaths.check(orgId, projectId, checkId), SettlementCheckDetailSchema),
    // While a large run is with the worker, look again every two seconds.
    refetchInterval: (query) => (query.state.data?.pendingJobId ? 2000 : false),
  });
}

export function useCreateCheck(orgId: string, projectId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: SettlementCheckCreate) => api.post(apiPaths.checks(orgId, projectId), body, SettlementCheckDetailSchema),
    onSuccess: () => {
      // Not awaited: the page moves on with the saved answer while the lists refresh behind it.
      void client.invalidateQueries({ queryKey: designKeys.checks(orgId, projectId) });
    },
  });
}

/** Saves the draft (schedule, options, ground model, name). */
export function useUpdateCheck(orgId: string, projectId: string, checkId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: SettlementCheckUpdate) => api.patch(apiPaths.check(orgId, projectId, checkId), body, SettlementCheckDetailSchema),
    onSuccess: (detail) => client.setQueryData(designKeys.check(orgId, projectId, checkId), detail),
  });
}

function useRunMutation<Body>(orgId: string, projectId: string, checkId: string, send: (body: Body) => Promise<RunCheckAnswer>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: () => {
      // Not awaited: the page moves on with the saved answer while the lists refresh behind it.
      void client.invalidateQueries({ queryKey: designKeys.checks(orgId, projectId) });
    },
  });
}

export function useRunCheck(orgId: string, projectId: string, checkId: string) {
  return useRunMutation(orgId, projectId, checkId, (body: { reason?: string }) => api.post(apiPaths.checkRuns(orgId, projectId, checkId), body, RunCheckAnswerSchema));
}

export function useRerunWithNewer(orgId: string, projectId: string, checkId: string) {
  return useRunMutation(orgId, projectId, checkId, (_body: void) => api.post(apiPaths.checkRerunNewer(orgId, projectId, checkId), {}, RunCheckAnswerSchema));
}

export function useApplySizing(orgId: string, projectId: string, checkId: string) {
  return useRunMutation(orgId, projectId, checkId, (body: SizingApply) => api.post(apiPaths.checkSizingApply(orgId, projectId, checkId), body, RunCheckAnswerSchema));
}

export function useSizing(orgId: string, projectId: string, checkId: string) {
  return useMutation({ mutationFn: (body: SizingRequest): Promise<SizingAnswer> => api.post(apiPaths.checkSizing(orgId, projectId, checkId), body, SizingAnswerSchema) });
}

/** A stored run without each footing's sublayers (those come per footing). */
export function useCheckRevision(orgId: string, projectId: string, checkId: string, revision: number | null) {
  return useQuery({
    queryKey: designKeys.revision(orgId, projectId, checkId, revision ?? 0),
    queryFn: (): Promise<CheckRevision> => api.get(apiPaths.checkRevision(orgId, projectId, checkId, revision ?? 0), CheckRevisionSchema),
    enabled: revision !== null,
    staleTime: Infinity,
    placeholderData: keepPreviousData,
  });
}

export function useFootingResult(orgId: string, projectId: string, checkId: string, revision: number | null, footingId: string | null) {
  return useQuery({
    queryKey: designKeys.footing(orgId, projectId, checkId, revision ?? 0, footingId ?? ''),
    queryFn: (): Promise<FootingSettlementResult> => api.get(apiPaths.checkFooting(orgId, projectId, checkId, revision ?? 0, footingId ?? ''), FootingSettlementResultSchema),
    enabled: revision !== null && footingId !== null,
    staleTime: Infinity,
  });
}

export function useRevisionComparison(orgId: string, projectId: string, checkId: string, a: number | null, b: number | null) {
  return useQuery({
    queryKey: [...designKeys.check(orgId, projectId, checkId), 'compare', a, b],
    queryFn: (): Promise<RevisionComparison> => api.get(apiPaths.checkCompare(orgId, projectId, checkId, a ?? 0, b ?? 0), RevisionComparisonSchema),
    enabled: a !== null && b !== null && a !== b,
    staleTime: Infinity,
  });
}

/** Reads pasted rows (tabs from a spreadsheet, or CSV) the way an import does; nothing is saved. */
export function pasteFootings(orgId: string, projectId: string, text: string): Promise<FootingImportResult> {
  return api.post(apiPaths.footingPaste(orgId, projectId), { text }, FootingImportResultSchema);
}

/** Reads a CSV or XLSX schedule; nothing is saved. */
export function importFootings(orgId: string, projectId: string, file: File): Promise<FootingImportResult> {
  const form = new FormData();
  form.append('file', file);
  return api.upload(apiPaths.footingImport(orgId, projectId), form, FootingImportResultSchema);
}
