import { queryOptions, useMutation, useQuery, useQueryClient, type Query } from '@tanstack/react-query';
import { useCallback } from 'react';
import { meResponse, type PublicUser } from '@shared/schemas/auth';
import { accountKeys } from '@/features/accounts/api/account-keys';
import { api } from './api';

/** Who is signed in, or null; every screen that shows or hides controls by role reads this. */
export function fetchMe(signal?: AbortSignal): Promise<PublicUser | null> {
  return api.get('/api/auth/me', { schema: meResponse, signal }).then((r) => r.user);
}

/** Query options for the session, shared by the hook and by route loaders that prefetch it. */
export function meQueryOptions() {
  return queryOptions({
    queryKey: accountKeys.me(),
    queryFn: ({ signal }) => fetchMe(signal),
    staleTime: 60_000,
  });
}

/** The current user (data is null when signed out, undefined while the first answer is on its way). */
export function useMe() {
  return useQuery(meQueryOptions());
}

function isMeQuery(query: Query): boolean {
  const key = query.queryKey;
  const me = accountKeys.me();
  return key.length === me.length && key.every((part, i) => part === me[i]);
}

/**
 * Records a new session in the cache after sign-in, e-mail confirmation or sign-out. Everything
 * else cached belonged to the previous session, so it is reset (dropped, and refetched if on screen).
 */
export function useApplySession(): (user: PublicUser | null) => void {
  const queryClient = useQueryClient();
  return useCallback(
    (user: PublicUser | null) => {
      queryClient.setQueryData(accountKeys.me(), user);
      void queryClient.resetQueries({ predicate: (q) => !isMeQuery(q) });
    },
    [queryClient],
  );
}

/** Signs out from the header or the account page; the caller decides where to go next. */
export function useSignOut() {
  const applySession = useApplySession();
  return useMutation({
    mutationFn: () => api.post<void>('/api/auth/sign-out', undefined, { sessionChange: true }),
    onSuccess: () => applySession(null),
  });
}
