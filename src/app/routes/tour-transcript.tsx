import { useParams, type LoaderFunctionArgs } from 'react-router';
import { ErrorState } from '@/components/error-state';
import { Loading } from '@/components/spinner';
import { transcriptQueryOptions } from '@/features/captions/api/captions-api';
import { TranscriptPage } from '@/features/captions/components/transcript-page';
import { tourQueryOptions, useTour } from '@/features/tours/api/tours-api';
import { TourNotFound } from '@/features/tours/components/tour-not-found';
import { isApiError } from '@/lib/api';
import { queryClient } from '@/lib/query-client';

/** The tour id from the address, or null for anything that is not a positive whole number. */
function tourIdOf(raw: string | undefined): number | null {
  if (!raw || !/^\d{1,9}$/.test(raw)) return null;
  const id = Number(raw);
  return id >= 1 ? id : null;
}

/** Starts fetching the tour and its transcript while the page's code loads. */
export function tourTranscriptLoader({ params, request }: LoaderFunctionArgs) {
  const id = tourIdOf(params.tourId);
  if (id) {
    void queryClient.prefetchQuery(tourQueryOptions(id));
    void queryClient.prefetchQuery(transcriptQueryOptions(id, new URL(request.url).searchParams.get('lang')));
  }
  return null;
}

function TranscriptForTour({ id }: { id: number }) {
  const tour = useTour(id);
  if (tour.isPending) {
    return (
      <div className="mx-auto max-w-3xl px-4 sm:px-6">
        <Loading label="Loading the tour…" />
      </div>
    );
  }
  if (tour.isError) {
    if (isApiError(tour.error) && tour.error.status === 404) return <TourNotFound />;
    return (
      <div className="mx-auto max-w-3xl px-4 sm:px-6">
        <ErrorState title="The tour could not be loaded" error={tour.error} onRetry={() => void tour.refetch()} />
      </div>
    );
  }
  return <TranscriptPage tour={tour.data} />;
}

/** /tours/:tourId/transcript, public for published tours. */
export function TourTranscriptRoute() {
  const id = tourIdOf(useParams().tourId);
  return id ? <TranscriptForTour key={id} id={id} /> : <TourNotFound />;
}
