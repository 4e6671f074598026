import { lazy, Suspense, type ReactNode } from 'react';
import { Link, useSearchParams } from 'react-router';
import type { TourDto } from '@shared/schemas/tours';
import { buttonClasses } from '@/components/button';
import { ErrorState } from '@/components/error-state';
import { useDocumentTitle } from '@/components/page';
import { Loading } from '@/components/spinner';
import { isApiError } from '@/lib/api';
import { isBusy, useTour } from '../api/tours-api';
import { richTextClasses } from '../lib/rich-text';
import { parseStartTime } from '../lib/start-time';
import { TourMeta } from './tour-meta';
import { TourNotFound } from './tour-not-found';

const TourPlayer = lazy(() => import('./tour-player'));

function PlayerPlaceholder({ tour, children }: { tour: TourDto; children?: ReactNode }) {
  return (
    <div className="relative aspect-video overflow-hidden rounded-lg bg-ink">
      {tour.posterUrl && <img src={tour.posterUrl} alt="" className="absolute inset-0 size-full object-contain opacity-60" />}
      <div className="absolute inset-0 grid place-items-center p-6 text-center text-card">{children}</div>
    </div>
  );
}

function PlayerArea({ tour, startAt }: { tour: TourDto; startAt: number | null }) {
  if (tour.renditions.length === 0) {
    const busy = isBusy(tour.state, tour.job);
    return (
      <PlayerPlaceholder tour={tour}>
        <div className="max-w-sm space-y-3">
          <p className="text-lg font-bold">{busy ? 'The video is still being prepared.' : tour.state === 'failed' ? 'The video could not be prepared.' : 'This tour has no video yet.'}</p>
          {tour.canEdit && (
            <Link to={`/tours/${tour.id}/edit`} className={buttonClasses('secondary', 'sm')}>
              {busy ? 'See the progress' : 'Open the tour’s settings'}
            </Link>
          )}
        </div>
      </PlayerPlaceholder>
    );
  }
  return (
    <Suspense
      fallback={
        <PlayerPlaceholder tour={tour}>
          <Loading label="Loading the player…" />
        </PlayerPlaceholder>
      }
    >
      <TourPlayer title={tour.title} renditions={tour.renditions} posterUrl={tour.posterUrl} thumbStrip={tour.thumbStrip} startAt={startAt} />
    </Suspense>
  );
}

function PrivateBanner({ tour }: { tour: TourDto }) {
  return (
    <div role="note" className="mb-6 flex flex-wrap items-center justify-between gap-3 rounded-md border-l-4 border-ochre bg-ochre-wash px-4 py-3">
      <p>
        <strong>Not published.</strong> Only you, moderators and admins can see this tour until it is published.
      </p>
      {tour.canEdit && (
        <Link to={`/tours/${tour.id}/edit`} className={buttonClasses('secondary', 'sm')}>
          Edit and publish
        </Link>
      )}
    </div>
  );
}

function TourView({ tour }: { tour: TourDto }) {
  const [params] = useSearchParams();
  const startAt = parseStartTime(params.get('t'));
  useDocumentTitle(tour.title);

  return (
    <article className="mx-auto w-full max-w-6xl px-4 py-6 sm:px-6 sm:py-10">
      {tour.state !== 'published' && <PrivateBanner tour={tour} />}
      <header className="mb-5 flex flex-wrap items-start justify-between gap-x-6 gap-y-2">
        <div className="min-w-0">
          <h1 className="text-2xl text-moss-deep sm:text-3xl">{tour.title}</h1>
          <TourMeta tour={tour} className="mt-1" />
        </div>
        {tour.canEdit && (
          <Link to={`/tours/${tour.id}/edit`} className={buttonClasses('quiet', 'sm')}>
            Edit tour
          </Link>
        )}
      </header>

      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_19rem]">
        <section aria-label="Video" className="min-w-0 lg:col-start-1">
          {/* key: a different tour gets a fresh player rather than a reused one. */}
          <PlayerArea key={tour.id} tour={tour} startAt={startAt} />
        </section>

        <aside aria-labelledby="tree-card-heading" className="self-start rounded-lg border border-dashed border-edge bg-card p-5 lg:col-start-2 lg:row-span-3 lg:row-start-1">
          <h2 id="tree-card-heading" className="text-lg text-bark">
            Tree card
          </h2>
          <p className="mt-2 text-ink-soft">Tree cards appear here when the author adds stops: the name, how to say it and how the tree grows.</p>
        </aside>

        <section aria-labelledby="trail-heading" className="rounded-lg border border-dashed border-edge bg-card p-5 lg:col-start-1">
          <h2 id="trail-heading" className="text-lg text-bark">
            Trail
          </h2>
          <p className="mt-2 text-ink-soft">The trail of stops along the walk appears here once the author marks the trees in the video.</p>
        </section>

        <section aria-labelledby="about-heading" className="lg:col-start-1">
          <h2 id="about-heading" className="text-xl text-moss-deep">
            About this tour
          </h2>
          {tour.descriptionHtml ? (
            // Sanitised by the server with its allow-list (structure, emphasis and http(s)/mail links only).
            <div className={`mt-3 ${richTextClasses}`} dangerouslySetInnerHTML={{ __html: tour.descriptionHtml }} />
          ) : (
            <p className="mt-3 text-ink-soft">The author has not written a description yet.</p>
          )}
        </section>
      </div>
    </article>
  );
}

/** The tour page: the player with its own controls, room for the tree card and the trail, and the details. */
export function WatchPage({ tourId }: { tourId: number }) {
  const tour = useTour(tourId);
  if (tour.isPending) {
    return (
      <div className="mx-auto max-w-6xl px-4 sm:px-6">
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
  return <TourView tour={tour.data} />;
}
