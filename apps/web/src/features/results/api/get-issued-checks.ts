import { IssuedCheckSchema, type IssuedCheck } from '@porestack/types';
import { useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

/** The project's issued settlement check revisions, newest first, as its clients read them. */
export function useIssuedChecks(orgId: string, projectId: string) {
  return useQuery({
    queryKey: ['orgs', orgId, 'projects', projectId, 'issued-checks'],
    queryFn: (): Promise<IssuedCheck[]> => api.get(apiPaths.issuedChecks(orgId, projectId), IssuedCheckSchema.array()),
  });
}
