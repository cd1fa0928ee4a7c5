import { SoilRecordSummarySchema, type SoilRecordSummary } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

const RecordsSchema = SoilRecordSummarySchema.array();

export function getSoilRecords(orgId: string): Promise<SoilRecordSummary[]> {
  return api.get(apiPaths.soilRecords(orgId), RecordsSchema);
}

export const soilRecordsQueryOptions = (orgId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'soil-records'], queryFn: () => getSoilRecords(orgId) });

export function useSoilRecords(orgId: string) {
  return useQuery(soilRecordsQueryOptions(orgId));
}
