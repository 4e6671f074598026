import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { hasRole } from '@shared/schemas/common';
import { buttonClasses } from '@/components/button';
import { Page } from '@/components/page';
import { tracksQueryOptions } from '@/features/captions/api/captions-api';
import { CaptionsWorkspace } from '@/features/captions/components/captions-workspace';
import { stopsQueryOptions } from '@/features/stops/api/stops-api';
import { StopsPanel } from '@/features/stops/components/stops-panel';
import { StopsTimeline } from '@/features/stops/components/stops-timeline';
import { tourQueryOptions, useTour } from '@/features/tours/api/tours-api';
import { TourLoadState } from '@/features/tours/components/tour-load-state';
import { TourNotFound } from '@/features/tours/components/tour-not-found';
import { queryClient } from '@/lib/query-client';
import { positiveIntParam } from '@/lib/route-params';
import { RequireUser } from '../guards';

/** Starts fetching the tour, its caption tracks and its stops while the editor's code loads. */
export function tourCaptionsLoader({ params }: LoaderFunctionArgs) {
  const id = positiveIntParam(params.tourId);
  if (id) {
    void queryClient.prefetchQuery(tourQueryOptions(id));
    void queryClient.prefetchQuery(tracksQueryOptions(id));
    void queryClient.prefetchQuery(stopsQueryOptions(id));
  }
  return null;
}

function NotAnEditor({ tourId }: { tourId: number }) {
  return (
    <Page title="You cannot edit these captions" width="medium">
      <p>Only the tour’s author, moderators and admins can change its captions and stops.</p>
      <div className="mt-6 flex flex-wrap gap-3">
        <Link to={`/tours/${tourId}`} className={buttonClasses('primary')}>
          Watch the tour
        </Link>
        <Link to={`/tours/${tourId}/transcript`} className={buttonClasses('secondary')}>
          Read the transcript
        </Link>
      </div>
    </Page>
  );
}

function CaptionsForTour({ tourId }: { tourId: number }) {
  const tour = useTour(tourId);
  if (!tour.isSuccess) return <TourLoadState query={tour} width="max-w-7xl" />;
  if (!tour.data.canEdit) return <NotAnEditor tourId={tourId} />;
  return (
    <CaptionsWorkspace
      tour={tour.data}
      renderTimeline={(ctx) => <StopsTimeline tourId={ctx.tourId} durationMs={ctx.durationMs} playheadMs={ctx.playheadMs} cues={ctx.cues} seek={ctx.seek} />}
      renderStops={(ctx) => <StopsPanel tourId={ctx.tourId} durationMs={ctx.durationMs} playheadMs={ctx.playheadMs} seek={ctx.seek} cue={ctx.selectedCue} lang={ctx.lang} />}
    />
  );
}

/** /tours/:tourId/captions, the captions and stops editor; editors only (the server enforces it). */
export function TourCaptionsRoute() {
  const id = positiveIntParam(useParams().tourId);
  if (!id) return <TourNotFound />;
  return (
    <RequireUser>
      {(user) => (hasRole(user.role, 'author') ? <CaptionsForTour key={id} tourId={id} /> : <NotAnEditor tourId={id} />)}
    </RequireUser>
  );
}
