import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { whereToSeeResponseSchema, type WhereToSeeResponse } from '@shared/schemas/watch';
import { api } from '@/lib/api';
import { whereToSeeKeys } from './where-to-see-keys';

/** Moments per page of "where to see it". */
export const WHERE_TO_SEE_PAGE_SIZE = 12;

/** Every stop of a published tour that shows the record, in order of tour date. */
export function fetchWhereToSee(slug: string, order: 'oldest' | 'newest', page: number, signal?: AbortSignal): Promise<WhereToSeeResponse> {
  return api.get(`/api/cultivars/${encodeURIComponent(slug)}/moments`, { query: { order, page, pageSize: WHERE_TO_SEE_PAGE_SIZE }, schema: whereToSeeResponseSchema, signal });
}

/** Query options for one page of "where to see it". */
export function whereToSeeQueryOptions(slug: string, order: 'oldest' | 'newest', page: number) {
  return queryOptions({
    queryKey: whereToSeeKeys.list(slug, order, page),
    queryFn: ({ signal }) => fetchWhereToSee(slug, order, page, signal),
    placeholderData: keepPreviousData,
  });
}

/** A page of "where to see it". */
export function useWhereToSee(slug: string, order: 'oldest' | 'newest', page: number) {
  return useQuery(whereToSeeQueryOptions(slug, order, page));
}
