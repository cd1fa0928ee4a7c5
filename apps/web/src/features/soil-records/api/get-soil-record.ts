import { SoilRecordDetailSchema, type SoilRecordDetail } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

export function getSoilRecord(orgId: string, recordId: string): Promise<SoilRecordDetail> {
  return api.get(apiPaths.soilRecord(orgId, recordId), SoilRecordDetailSchema);
}

export const soilRecordQueryOptions = (orgId: string, recordId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'soil-records', recordId], queryFn: () => getSoilRecord(orgId, recordId) });

export function useSoilRecord(orgId: string, recordId: string) {
  return useQuery(soilRecordQueryOptions(orgId, recordId));
}
