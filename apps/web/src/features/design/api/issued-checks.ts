import { IssuedCheckSchema, type IssuedCheck } from '@porestack/types';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';
import { designKeys } from './design-keys';

/** The issued state of one revision and its PDF summary; a 404 means the revision has not been issued. */
export function useIssuedCheck(orgId: string, projectId: string, checkId: string, revision: number) {
  return useQuery({
    queryKey: designKeys.issued(orgId, projectId, checkId, revision),
    queryFn: (): Promise<IssuedCheck> => api.get(apiPaths.checkReport(orgId, projectId, checkId, revision), IssuedCheckSchema),
    // 404 is an answer (not issued), not a failure to retry.
    retry: (count, error) => !(error instanceof ApiError && error.status === 404) && count < 2,
    // While the worker prints it, follow its state; a settled report does not change.
    refetchInterval: (query) => (query.state.data?.report.state === 'queued' || query.state.data?.report.state === 'running' ? 1500 : false),
  });
}

export function useIssueRevision(orgId: string, projectId: string, checkId: string, revision: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => api.post(apiPaths.checkIssue(orgId, projectId, checkId, revision), {}, IssuedCheckSchema),
    onSuccess: (issued) => client.setQueryData(designKeys.issued(orgId, projectId, checkId, revision), issued),
  });
}

export function useRetryIssuedReport(orgId: string, projectId: string, checkId: string, revision: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => api.post(apiPaths.checkReportRetry(orgId, projectId, checkId, revision), {}, IssuedCheckSchema),
    onSuccess: (issued) => client.setQueryData(designKeys.issued(orgId, projectId, checkId, revision), issued),
  });
}
