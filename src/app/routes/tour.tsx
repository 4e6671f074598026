import { useParams, type LoaderFunctionArgs } from 'react-router';
import { tourQueryOptions } from '@/features/tours/api/tours-api';
import { watchQueryOptions } from '@/features/tours/api/watch-api';
import { TourEditPage } from '@/features/tours/components/tour-edit-page';
import { TourNotFound } from '@/features/tours/components/tour-not-found';
import { WatchPage } from '@/features/tours/components/watch-page';
import { queryClient } from '@/lib/query-client';
import { RequireUser } from '../guards';

/** An id from the address (tour or stop), or null for anything that is not a positive whole number. */
function tourIdOf(raw: string | undefined): number | null {
  if (!raw || !/^\d{1,9}$/.test(raw)) return null;
  const id = Number(raw);
  return id >= 1 ? id : null;
}

/** Fetches the tour while the page's code is set up (both the tour page and its edit page). */
export function tourLoader({ params }: LoaderFunctionArgs) {
  const id = tourIdOf(params.tourId);
  if (id) void queryClient.prefetchQuery(tourQueryOptions(id));
  return null;
}

/** Fetches the tour page's one response (tour, stops with tree cards, caption tracks) while its code is set up. */
export function watchLoader({ params }: LoaderFunctionArgs) {
  const id = tourIdOf(params.tourId);
  if (id) void queryClient.prefetchQuery(watchQueryOptions(id));
  return null;
}

/** /tours/:tourId, the tour page, and /tours/:tourId/stops/:stopId, the same page opened at a stop. */
export function TourRoute() {
  const params = useParams();
  const id = tourIdOf(params.tourId);
  const stopId = params.stopId === undefined ? null : tourIdOf(params.stopId);
  if (!id || (params.stopId !== undefined && !stopId)) return <TourNotFound />;
  // Keyed by tour only: moving between stops of one tour keeps its player.
  return <WatchPage key={id} tourId={id} stopId={stopId} />;
}

/** /tours/:tourId/edit, for the author, moderators and admins (the server enforces it). */
export function TourEditRoute() {
  const id = tourIdOf(useParams().tourId);
  if (!id) return <TourNotFound />;
  return <RequireUser>{() => <TourEditPage key={id} tourId={id} />}</RequireUser>;
}
