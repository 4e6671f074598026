import { useParams, type LoaderFunctionArgs } from 'react-router';
import { transcriptQueryOptions } from '@/features/captions/api/captions-api';
import { TranscriptPage } from '@/features/captions/components/transcript-page';
import { tourQueryOptions, useTour } from '@/features/tours/api/tours-api';
import { TourLoadState } from '@/features/tours/components/tour-load-state';
import { TourNotFound } from '@/features/tours/components/tour-not-found';
import { queryClient } from '@/lib/query-client';
import { positiveIntParam } from '@/lib/route-params';

/** Starts fetching the tour and its transcript while the page's code loads. */
export function tourTranscriptLoader({ params, request }: LoaderFunctionArgs) {
  const id = positiveIntParam(params.tourId);
  if (id) {
    void queryClient.prefetchQuery(tourQueryOptions(id));
    void queryClient.prefetchQuery(transcriptQueryOptions(id, new URL(request.url).searchParams.get('lang')));
  }
  return null;
}

function TranscriptForTour({ id }: { id: number }) {
  const tour = useTour(id);
  if (!tour.isSuccess) return <TourLoadState query={tour} width="max-w-3xl" />;
  return <TranscriptPage tour={tour.data} />;
}

/** /tours/:tourId/transcript, public for published tours. */
export function TourTranscriptRoute() {
  const id = positiveIntParam(useParams().tourId);
  return id ? <TranscriptForTour key={id} id={id} /> : <TourNotFound />;
}
