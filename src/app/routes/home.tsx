import { HomePage } from '@/features/club/components/home-page';
import { clubQueryOptions } from '@/features/club/api/club-api';
import { publicToursQueryOptions, usePublishedTourCount } from '@/features/tours/api/tours-api';
import { queryClient } from '@/lib/query-client';

/** Fetches the club (and whether any tour is published) while the page's code is still being set up. */
export function homeLoader() {
  void queryClient.prefetchQuery(clubQueryOptions());
  void queryClient.prefetchQuery(publicToursQueryOptions({ page: 1, pageSize: 1 }));
  return null;
}

/** The home page, told by the tours feature how many walks can be watched. */
export function HomeRoute() {
  const published = usePublishedTourCount();
  return <HomePage publishedTours={published.data} />;
}
