import { Link, useLocation, useSearchParams } from 'react-router';
import type { TourDto } from '@shared/schemas/tours';
import { Button, buttonClasses } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { FormSuccess } from '@/components/form-error';
import { Page } from '@/components/page';
import { Pager } from '@/components/pager';
import { Loading } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { clockText } from '@/lib/tour-moment';
import { isBusy, useMyTours, useRetranscode } from '../api/tours-api';
import { formatDay, timeLeftText } from '../lib/media-format';
import { pageFromParams } from '@/lib/route-params';
import { ProgressBar } from './progress-bar';
import { TourPoster } from './tour-poster';
import { TourStateBadge } from './tour-state-badge';

const PAGE_SIZE = 20;

function StateDetail({ tour }: { tour: TourDto }) {
  const retry = useRetranscode();
  const job = tour.job;
  if (isBusy(tour.state, job)) {
    const queued = !job || job.state === 'queued';
    const percent = queued ? 0 : Math.floor(job.progress);
    const words = queued ? 'Waiting for its turn' : `${percent} % · ${timeLeftText(job.etaSeconds)}`;
    return (
      <div className="mt-2 max-w-sm space-y-1">
        <ProgressBar label={`Preparing “${tour.title}”`} value={percent} valueText={words} tone="ochre" />
        <p className="font-ui text-sm text-ink-soft tabular-nums">{words}</p>
      </div>
    );
  }
  if (tour.state === 'failed') {
    return (
      <div className="mt-2 space-y-2">
        <p className="text-sm text-maple">{tour.failureReason ?? job?.error ?? 'The video could not be prepared.'}</p>
        <Button size="sm" variant="secondary" busy={retry.isPending} onClick={() => retry.mutate(tour.id)}>
          Try again
        </Button>
        {retry.isError && (
          <p role="alert" className="text-sm font-bold text-maple">
            {errorMessage(retry.error)}
          </p>
        )}
      </div>
    );
  }
  return null;
}

function TourRow({ tour }: { tour: TourDto }) {
  const updated = formatDay(tour.updatedAt.slice(0, 10));
  const playable = tour.renditions.length > 0;
  return (
    <li className="grid gap-4 rounded-lg border border-rule bg-card p-4 shadow-leaf sm:grid-cols-[9rem_minmax(0,1fr)_auto] sm:items-start">
      <div className="overflow-hidden rounded-md">
        <TourPoster url={tour.posterUrl} />
      </div>
      <div className="min-w-0">
        <h2 className="text-lg leading-snug">
          <Link to={`/tours/${tour.id}/edit`}>{tour.title}</Link>
        </h2>
        <div className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-1 text-sm text-ink-soft">
          <TourStateBadge state={tour.state} job={tour.job} />
          {tour.durationMs != null && <span className="font-ui tabular-nums">{clockText(tour.durationMs)}</span>}
          {updated && <span>changed {updated}</span>}
        </div>
        <StateDetail tour={tour} />
      </div>
      <div className="flex flex-wrap gap-2 sm:flex-col sm:items-stretch">
        <Link to={`/tours/${tour.id}/edit`} className={buttonClasses('secondary', 'sm')}>
          Edit<span className="sr-only"> “{tour.title}”</span>
        </Link>
        {playable && (
          <Link to={`/tours/${tour.id}`} className={buttonClasses('quiet', 'sm')}>
            {tour.state === 'published' ? 'Watch' : 'Preview'}
            <span className="sr-only"> “{tour.title}”</span>
          </Link>
        )}
      </div>
    </li>
  );
}

/**
 * The author's own tours in every state, with badges, preparation progress (refreshed while any
 * video is being prepared) and "Try again" for a failed one.
 */
export function MyToursPage() {
  const [params, setParams] = useSearchParams();
  const location = useLocation();
  const deleted = (location.state as { deleted?: string } | null)?.deleted;
  const page = pageFromParams(params);
  const tours = useMyTours({ page, pageSize: PAGE_SIZE });

  let body;
  if (tours.isPending) body = <Loading label="Loading your tours…" />;
  else if (tours.isError) body = <ErrorState title="Your tours could not be loaded" error={tours.error} onRetry={() => void tours.refetch()} />;
  else if (tours.data.total === 0) {
    body = (
      <EmptyState title="You have no tours yet.">
        <p>Upload the video of a walk through your garden to make your first one.</p>
      </EmptyState>
    );
  } else {
    body = (
      <>
        <ul className="space-y-4">
          {tours.data.items.map((tour) => (
            <TourRow key={tour.id} tour={tour} />
          ))}
        </ul>
        <Pager
          label="Pages of your tours"
          page={page}
          pageSize={PAGE_SIZE}
          total={tours.data.total}
          onPageChange={(next) => setParams(next === 1 ? {} : { page: String(next) })}
        />
      </>
    );
  }

  return (
    <Page title="My tours" width="wide" intro="Every tour you have uploaded, published or not, most recently changed first.">
      <div className="-mt-4 mb-6 flex flex-wrap gap-3">
        <Link to="/tours/new" className={buttonClasses('primary')}>
          Upload a tour
        </Link>
      </div>
      {deleted && (
        <div className="mb-6">
          <FormSuccess>
            <p>“{deleted}” was deleted.</p>
          </FormSuccess>
        </div>
      )}
      {body}
    </Page>
  );
}
