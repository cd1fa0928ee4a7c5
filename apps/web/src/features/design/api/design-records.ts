import { DesignRecordSchema, RecordVersionTraceSchema, SetRevisionTraceSchema, type DesignRecord, type RecordVersionTrace, type SetRevisionTrace } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { designKeys } from './design-keys';

/** The project's approved soil records (current versions), to pick for layers and sets. */
export function getDesignRecords(orgId: string, projectId: string): Promise<DesignRecord[]> {
  return api.get(apiPaths.designRecords(orgId, projectId), DesignRecordSchema.array());
}

export const designRecordsQueryOptions = (orgId: string, projectId: string) =>
  queryOptions({ queryKey: designKeys.records(orgId, projectId), queryFn: () => getDesignRecords(orgId, projectId) });

export function useDesignRecords(orgId: string, projectId: string) {
  return useQuery(designRecordsQueryOptions(orgId, projectId));
}

/** Where a record-sourced value came from: record → version → test → approver → readings file hash. */
export function useRecordVersionTrace(orgId: string, projectId: string, versionId: string, enabled: boolean) {
  return useQuery({
    queryKey: designKeys.trace(orgId, projectId, 'record', versionId),
    queryFn: (): Promise<RecordVersionTrace> => api.get(apiPaths.recordVersionTrace(orgId, projectId, versionId), RecordVersionTraceSchema),
    enabled,
    staleTime: Infinity,
  });
}

/** A set revision's adopted values and the versions behind them. */
export function useSetRevisionTrace(orgId: string, projectId: string, revisionId: string, enabled: boolean) {
  return useQuery({
    queryKey: designKeys.trace(orgId, projectId, 'set', revisionId),
    queryFn: (): Promise<SetRevisionTrace> => api.get(apiPaths.setRevisionTrace(orgId, projectId, revisionId), SetRevisionTraceSchema),
    enabled,
    staleTime: Infinity,
  });
}
