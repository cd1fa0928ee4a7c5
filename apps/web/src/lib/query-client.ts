import { QueryCache, QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-error';

/** The session query's key; kept here so the 401 handler can clear it without importing a feature. */
export const SESSION_QUERY_KEY = ['session'] as const;

export function createQueryClient(): QueryClient {
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      onError: (error, query) => {
        // A 401 anywhere means the session ended: drop it, and the guards send the person to sign-in.
        if (error instanceof ApiError && error.status === 401 && query.queryKey[0] !== SESSION_QUERY_KEY[0]) {
          client.setQueryData(SESSION_QUERY_KEY, null);
        }
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        // Retrying a 4xx only repeats the same answer; retry once for network trouble and 5xx.
        retry: (failureCount, error) =>
          failureCount < 1 && (!(error instanceof ApiError) || error.status === 0 || error.status >= 500),
      },
    },
  });
  return client;
}
