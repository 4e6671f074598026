import { Link, useSearchParams } from 'react-router';
import type { TourDto } from '@shared/schemas/tours';
import { hasRole } from '@shared/schemas/common';
import { buttonClasses } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { Page } from '@/components/page';
import { Pager } from '@/components/pager';
import { Loading } from '@/components/spinner';
import { useMe } from '@/lib/auth';
import { usePublicTours } from '../api/tours-api';
import { durationInWords, formatClock, formatDay } from '../lib/media-format';
import { pageFromParams } from '../lib/page-param';
import { TourPoster } from './tour-poster';

/** Tours per page of the public list (four rows of three on a wide screen). */
export const TOURS_PAGE_SIZE = 12;

function TourCard({ tour }: { tour: TourDto }) {
  const seconds = tour.durationMs != null ? tour.durationMs / 1000 : null;
  const filmed = formatDay(tour.filmedOn);
  return (
    <li className="group relative overflow-hidden rounded-lg border border-rule bg-card shadow-leaf transition-shadow focus-within:shadow-none hover:border-edge">
      <div className="relative">
        <TourPoster url={tour.posterUrl} />
        {seconds != null && (
          <span className="absolute right-2 bottom-2 rounded bg-ink/85 px-1.5 py-0.5 font-ui text-xs font-semibold text-card tabular-nums">
            <span aria-hidden="true">{formatClock(seconds)}</span>
            <span className="sr-only">{durationInWords(seconds)}</span>
          </span>
        )}
      </div>
      <div className="p-4">
        <h2 className="text-lg leading-snug">
          {/* The link covers the whole card, so the card is one click target with one name. */}
          <Link to={`/tours/${tour.id}`} className="text-ink no-underline after:absolute after:inset-0 hover:text-moss-deep group-hover:underline">
            {tour.title}
          </Link>
        </h2>
        {tour.garden && <p className="mt-1 text-sm text-bark">{tour.garden}</p>}
        <p className="mt-1 text-sm text-ink-soft">
          by {tour.author.displayName}
          {filmed && <> · filmed {filmed}</>}
        </p>
      </div>
    </li>
  );
}

/** The public list of published tours, newest first, a page at a time (the page is in the address). */
export function TourListPage() {
  const [params, setParams] = useSearchParams();
  const page = pageFromParams(params);
  const tours = usePublicTours({ page, pageSize: TOURS_PAGE_SIZE });
  const { data: me } = useMe();
  const canUpload = hasRole(me?.role, 'author');

  let body;
  if (tours.isPending) body = <Loading label="Loading tours…" />;
  else if (tours.isError) body = <ErrorState title="The tours could not be loaded" error={tours.error} onRetry={() => void tours.refetch()} />;
  else if (tours.data.items.length === 0 && tours.data.total === 0) {
    body = (
      <EmptyState title="No tours are published yet.">
        {canUpload ? (
          <p>
            Be the first: <Link to="/tours/new">upload a walk through your garden</Link>.
          </p>
        ) : (
          <p>When members publish their garden walks, they appear here, newest first.</p>
        )}
      </EmptyState>
    );
  } else if (tours.data.items.length === 0) {
    body = (
      <EmptyState title="This page is past the end of the list.">
        <Link to="/tours">Go to the first page</Link>
      </EmptyState>
    );
  } else {
    body = (
      <>
        <ul className={`grid gap-5 sm:grid-cols-2 lg:grid-cols-3 ${tours.isPlaceholderData ? 'opacity-60' : ''}`} aria-busy={tours.isPlaceholderData}>
          {tours.data.items.map((tour) => (
            <TourCard key={tour.id} tour={tour} />
          ))}
        </ul>
        <Pager
          label="Pages of tours"
          page={page}
          pageSize={TOURS_PAGE_SIZE}
          total={tours.data.total}
          onPageChange={(next) => setParams(next === 1 ? {} : { page: String(next) })}
        />
      </>
    );
  }

  return (
    <Page title="Tours" width="wide" intro="Filmed walks through members’ gardens, newest first.">
      {canUpload && (
        <div className="-mt-4 mb-6 flex flex-wrap gap-3">
          <Link to="/tours/new" className={buttonClasses('primary')}>
            Upload a tour
          </Link>
          <Link to="/my/tours" className={buttonClasses('secondary')}>
            My tours
          </Link>
        </div>
      )}
      {body}
    </Page>
  );
}
