import { HomeOverviewSchema, type HomeOverview } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

/** What the member's home page shows: a section for each role they hold. */
export function getHome(orgId: string): Promise<HomeOverview> {
  return api.get(apiPaths.home(orgId), HomeOverviewSchema);
}

export const homeQueryOptions = (orgId: string) => queryOptions({ queryKey: ['orgs', orgId, 'home'], queryFn: () => getHome(orgId) });

export function useHome(orgId: string) {
  return useQuery(homeQueryOptions(orgId));
}
