import type { Approval, ChangeRequest } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { reviewQueueQueryOptions } from './get-review-queue';

export type Decision = { kind: 'approve'; body: Approval } | { kind: 'request-changes'; body: ChangeRequest };

export async function decideReview(orgId: string, testId: string, decision: Decision): Promise<void> {
  const path = decision.kind === 'approve' ? apiPaths.testApprove(orgId, testId) : apiPaths.testRequestChanges(orgId, testId);
  await api.post<unknown>(path, decision.body);
}

/**
 * Approve, or send back with a comment; the queue, the test and the soil records all change.
 * `onDecided` runs at the hook level, before the caches refetch: the refetched test status
 * unmounts the decision panel, and callbacks given to `mutate()` do not run once it is gone.
 */
export function useDecideReview(orgId: string, { onDecided }: { onDecided?: (decision: Decision) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ testId, decision }: { testId: string; decision: Decision }) => decideReview(orgId, testId, decision),
    onSuccess: (_result, { decision }) => onDecided?.(decision),
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: reviewQueueQueryOptions(orgId).queryKey }),
        queryClient.invalidateQueries({ queryKey: ['orgs', orgId, 'tests'] }),
        queryClient.invalidateQueries({ queryKey: ['orgs', orgId, 'soil-records'] }),
      ]),
  });
}
