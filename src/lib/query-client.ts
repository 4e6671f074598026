import { QueryCache, QueryClient } from '@tanstack/react-query';
import { accountKeys } from '@/features/accounts/api/account-keys';
import { ApiError } from './api';

/**
 * Retries only what a retry can fix: network trouble and server faults, twice. A 4xx answer
 * (not signed in, not allowed, not found, bad input) will be the same the next time.
 */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

/** One client per page load; a 401 from any query means the session ended, so "me" is re-read. */
export function createQueryClient(): QueryClient {
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      onError: (error, query) => {
        const isMe = query.queryKey[0] === accountKeys.all[0] && query.queryKey[1] === 'me';
        if (!isMe && error instanceof ApiError && error.status === 401) {
          void client.invalidateQueries({ queryKey: accountKeys.me() });
        }
      },
    }),
    defaultOptions: {
      queries: { staleTime: 30_000, retry: shouldRetry },
      mutations: { retry: false },
    },
  });
  return client;
}

/** The app's shared cache; route loaders prefetch into it with the features' query options. */
export const queryClient = createQueryClient();
