import { SessionSchema, type Session } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';
import { SESSION_QUERY_KEY } from '../../../lib/query-client';

/** The signed-in person and their memberships, or null when nobody is signed in. */
export async function getSession(): Promise<Session | null> {
  try {
    return await api.get(apiPaths.session, SessionSchema);
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export const sessionQueryOptions = () =>
  queryOptions({ queryKey: SESSION_QUERY_KEY, queryFn: getSession, staleTime: 5 * 60_000 });

export function useSessionQuery() {
  return useQuery(sessionQueryOptions());
}
