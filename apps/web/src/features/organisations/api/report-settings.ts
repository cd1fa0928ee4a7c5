import { ReportSettingsViewSchema, type ReportSettings, type ReportSettingsView } from '@porestack/types';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

export const reportSettingsQueryOptions = (orgId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'report-settings'], queryFn: () => api.get(apiPaths.reportSettings(orgId), ReportSettingsViewSchema) });

export function useReportSettings(orgId: string) {
  return useQuery(reportSettingsQueryOptions(orgId));
}

export function useUpdateReportSettings(orgId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (settings: ReportSettings): Promise<ReportSettingsView> => api.put(apiPaths.reportSettings(orgId), settings, ReportSettingsViewSchema),
    onSuccess: (view) => client.setQueryData(reportSettingsQueryOptions(orgId).queryKey, view),
  });
}
