import type { LoaderFunctionArgs } from 'react-router';
import { searchQueryOptions } from '@/features/search/api/search-api';
import { SearchPage } from '@/features/search/components/search-page';
import { searchParamsOf } from '@/features/search/lib/search-view';
import { queryClient } from '@/lib/query-client';

/** Starts the search in the address while the page's code is set up. */
export function searchLoader({ request }: LoaderFunctionArgs) {
  const { q, page } = searchParamsOf(new URL(request.url).searchParams);
  if (q) void queryClient.prefetchQuery(searchQueryOptions(q, page));
  return null;
}

/** /search?q=&page=, open to everyone. */
export function SearchRoute() {
  return <SearchPage />;
}
