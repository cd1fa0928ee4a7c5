import { TestDetailSchema, type TestCreate, type TestDetail } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

export function createTest(orgId: string, sampleId: string, body: TestCreate): Promise<TestDetail> {
  return api.post(apiPaths.sampleTests(orgId, sampleId), body, TestDetailSchema);
}

export function useCreateTest(orgId: string, sampleId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: TestCreate) => createTest(orgId, sampleId, body),
    // Every list of tests (all, by project, by sample) sits under this prefix.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['orgs', orgId, 'tests', 'list'] }),
  });
}
