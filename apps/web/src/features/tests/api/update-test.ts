import { TestDetailSchema, type TestDetail, type TestUpdate } from '@porestack/types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { testQueryOptions } from './get-test';

/** The API answers `{ test, job }`: the saved test, and the re-analysis it started (if any). */
const UpdatedParser = {
  parse: (value: unknown): TestDetail => TestDetailSchema.parse((value as { test?: unknown } | undefined)?.test ?? value),
};

export function updateTest(orgId: string, testId: string, body: TestUpdate): Promise<TestDetail> {
  return api.patch(apiPaths.test(orgId, testId), body, UpdatedParser);
}

export function useUpdateTest(orgId: string, testId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: TestUpdate) => updateTest(orgId, testId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: testQueryOptions(orgId, testId).queryKey }),
  });
}
