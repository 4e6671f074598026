import { queryOptions, useQuery } from '@tanstack/react-query';
import { clubResponse } from '@shared/schemas/club';
import { api } from '@/lib/api';

/** Cache keys for the club this site serves. */
export const clubKeys = {
  all: ['club'] as const,
  detail: () => [...clubKeys.all, 'detail'] as const,
};

/** The club with its members; null when the site has no club set up yet. */
export function fetchClub(signal?: AbortSignal) {
  return api.get('/api/club', { schema: clubResponse, signal }).then((r) => r.club);
}

/** Query options for the club, shared by the home page and the route loader that prefetches it. */
export function clubQueryOptions() {
  return queryOptions({ queryKey: clubKeys.detail(), queryFn: ({ signal }) => fetchClub(signal), staleTime: 5 * 60_000 });
}

/** The club shown on the home page. */
export function useClub() {
  return useQuery(clubQueryOptions());
}
