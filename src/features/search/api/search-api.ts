import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { searchResponseSchema, type SearchResponse } from '@shared/schemas/search';
import { api } from '@/lib/api';
import { searchKeys } from './search-keys';

/** One page of the grouped search: cultivar records, tours and caption moments. */
export function fetchSearch(q: string, page: number, signal?: AbortSignal): Promise<SearchResponse> {
  return api.get('/api/search', { query: { q, page }, schema: searchResponseSchema, signal });
}

/** Query options for a search; the previous page stays on screen while the next one loads. */
export function searchQueryOptions(q: string, page: number) {
  return queryOptions({
    queryKey: searchKeys.results(q, page),
    queryFn: ({ signal }) => fetchSearch(q, page, signal),
    placeholderData: keepPreviousData,
  });
}

/** The results for the search in the address; nothing is asked for an empty search. */
export function useSearch(q: string, page: number) {
  return useQuery({ ...searchQueryOptions(q, page), enabled: q.trim() !== '' });
}
