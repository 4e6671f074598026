import type { LoaderFunctionArgs } from 'react-router';
import { publicToursQueryOptions } from '@/features/tours/api/tours-api';
import { TOURS_PAGE_SIZE, TourListPage } from '@/features/tours/components/tour-list-page';
import { filtersFromParams, listParams } from '@/features/tours/lib/browse-filters';
import { pageFromParams } from '@/lib/route-params';
import { queryClient } from '@/lib/query-client';

/** Fetches the page of tours the address asks for (with its browse filters) while the page's code is set up. */
export function toursLoader({ request }: LoaderFunctionArgs) {
  const params = new URL(request.url).searchParams;
  void queryClient.prefetchQuery(publicToursQueryOptions(listParams(filtersFromParams(params), pageFromParams(params), TOURS_PAGE_SIZE)));
  return null;
}

/** /tours, the public list. */
export function ToursRoute() {
  return <TourListPage />;
}
