import { IssuedReportSchema } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { versionReportQueryOptions } from './get-version-report';

/** A lab manager asks again for a report whose generation failed. */
export function useRetryReport(orgId: string, recordId: string, version: number) {
  const client = useQueryClient();
  const options = versionReportQueryOptions(orgId, recordId, version);
  return useMutation({
    mutationFn: () => api.post(apiPaths.versionReportRetry(orgId, recordId, version), {}, IssuedReportSchema),
    onSuccess: (report) => client.setQueryData(options.queryKey, report),
  });
}
