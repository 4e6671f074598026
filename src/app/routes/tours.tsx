import type { LoaderFunctionArgs } from 'react-router';
import { publicToursQueryOptions } from '@/features/tours/api/tours-api';
import { TOURS_PAGE_SIZE, TourListPage } from '@/features/tours/components/tour-list-page';
import { pageFromParams } from '@/features/tours/lib/page-param';
import { queryClient } from '@/lib/query-client';

/** Fetches the page of tours the address asks for while the page's code is set up. */
export function toursLoader({ request }: LoaderFunctionArgs) {
  void queryClient.prefetchQuery(publicToursQueryOptions({ page: pageFromParams(new URL(request.url).searchParams), pageSize: TOURS_PAGE_SIZE }));
  return null;
}

/** /tours, the public list. */
export function ToursRoute() {
  return <TourListPage />;
}
