import { HomePage } from '@/features/club/components/home-page';
import { clubQueryOptions } from '@/features/club/api/club-api';
import { queryClient } from '@/lib/query-client';

/** Fetches the club while the page's code is still being set up. */
export function homeLoader() {
  void queryClient.prefetchQuery(clubQueryOptions());
  return null;
}

/** The home page. */
export function HomeRoute() {
  return <HomePage />;
}
