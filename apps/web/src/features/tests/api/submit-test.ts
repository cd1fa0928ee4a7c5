import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

export async function submitTest(orgId: string, testId: string): Promise<void> {
  await api.post<unknown>(apiPaths.testSubmit(orgId, testId));
}

export function useSubmitTest(orgId: string, testId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => submitTest(orgId, testId),
    // The test, every list of tests and the review queue all change.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['orgs', orgId, 'tests'] }),
        queryClient.invalidateQueries({ queryKey: ['orgs', orgId, 'review-queue'] }),
      ]),
  });
}
