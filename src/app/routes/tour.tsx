import { useParams, type LoaderFunctionArgs } from 'react-router';
import { tourQueryOptions } from '@/features/tours/api/tours-api';
import { watchQueryOptions } from '@/features/tours/api/watch-api';
import { TourEditPage } from '@/features/tours/components/tour-edit-page';
import { TourNotFound } from '@/features/tours/components/tour-not-found';
import { WatchPage } from '@/features/tours/components/watch-page';
import { queryClient } from '@/lib/query-client';
import { positiveIntParam } from '@/lib/route-params';
import { RequireUser } from '../guards';

/** Fetches the tour while the page's code is set up (both the tour page and its edit page). */
export function tourLoader({ params }: LoaderFunctionArgs) {
  const id = positiveIntParam(params.tourId);
  if (id) void queryClient.prefetchQuery(tourQueryOptions(id));
  return null;
}

/** Fetches the tour page's one response (tour, stops with tree cards, caption tracks) while its code is set up. */
export function watchLoader({ params }: LoaderFunctionArgs) {
  const id = positiveIntParam(params.tourId);
  if (id) void queryClient.prefetchQuery(watchQueryOptions(id));
  return null;
}

/** /tours/:tourId, the tour page, and /tours/:tourId/stops/:stopId, the same page opened at a stop. */
export function TourRoute() {
  const params = useParams();
  const id = positiveIntParam(params.tourId);
  const stopId = params.stopId === undefined ? null : positiveIntParam(params.stopId);
  if (!id || (params.stopId !== undefined && !stopId)) return <TourNotFound />;
  // Keyed by tour only: moving between stops of one tour keeps its player.
  return <WatchPage key={id} tourId={id} stopId={stopId} />;
}

/** /tours/:tourId/edit, for the author, moderators and admins (the server enforces it). */
export function TourEditRoute() {
  const id = positiveIntParam(useParams().tourId);
  if (!id) return <TourNotFound />;
  return <RequireUser>{() => <TourEditPage key={id} tourId={id} />}</RequireUser>;
}
