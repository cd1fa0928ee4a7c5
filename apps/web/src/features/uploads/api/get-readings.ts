import { ReadingsPageSchema, type ReadingsPage } from '@porestack/types';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

/** One page of a test's readings, in test order (increment, then time). */
export function getReadingsPage(orgId: string, testId: string, offset: number, limit: number): Promise<ReadingsPage> {
  return api.get(`${apiPaths.testReadings(orgId, testId)}?offset=${offset}&limit=${limit}`, ReadingsPageSchema);
}

export const readingsPageKey = (orgId: string, testId: string, offset: number, limit: number) =>
  ['orgs', orgId, 'tests', testId, 'readings', { offset, limit }] as const;
