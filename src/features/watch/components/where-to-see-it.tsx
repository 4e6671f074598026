import { useId, useState } from 'react';
import { Link } from 'react-router';
import type { SeeItMoment } from '@shared/schemas/watch';
import { MomentThumb } from '@/components/moment-thumb';
import { Pager } from '@/components/pager';
import { Loading } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { clockText } from '@/lib/tour-moment';
import { useWhereToSee, WHERE_TO_SEE_PAGE_SIZE } from '../api/where-to-see-api';

const dayFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });

/** "14 May 2026" from an ISO day or moment, read in UTC so the day never shifts. */
function dayText(iso: string | null): string | null {
  if (!iso) return null;
  const d = new Date(iso.length === 10 ? `${iso}T00:00:00Z` : iso);
  return Number.isNaN(d.getTime()) ? null : dayFormat.format(d);
}

/** A stop's own address: the tour opens at the stop with this tree's card. */
function stopHref(m: SeeItMoment): string {
  return `/tours/${m.tourId}/stops/${m.stopId}`;
}

function MomentCard({ m }: { m: SeeItMoment }) {
  const filmed = dayText(m.filmedOn);
  const published = dayText(m.publishedAt);
  return (
    <li className="relative overflow-hidden rounded-lg border border-rule bg-card shadow-leaf hover:border-edge">
      <div className="relative">
        <MomentThumb thumbnail={m.thumbnail} />
        <span aria-hidden="true" className="absolute right-2 bottom-2 rounded bg-ink/85 px-1.5 font-ui text-xs font-semibold text-card tabular-nums">
          {clockText(m.startMs)}
        </span>
      </div>
      <div className="p-3">
        <p className="leading-snug font-bold">
          <Link to={stopHref(m)} className="after:absolute after:inset-0">
            {m.tourTitle}
            <span className="sr-only">, stop at {clockText(m.startMs)}</span>
          </Link>
        </p>
        <p className="mt-0.5 text-sm text-ink-soft">
          {m.garden && <>{m.garden} · </>}
          by{' '}
          <Link to={`/authors/${m.author.id}`} className="relative z-10">
            {m.author.displayName}
          </Link>
        </p>
        <p className="mt-0.5 font-ui text-xs text-ink-soft">{filmed ? `Filmed ${filmed}` : published ? `Published ${published}` : 'Date not given'}</p>
      </div>
    </li>
  );
}

/**
 * "Where to see it" for a cultivar record: every stop of a published tour that shows this tree, in
 * order of tour date (when filmed, else when published; oldest first to follow the tree through
 * the years, or newest first), with a picture of the moment. Each opens the tour at that stop with
 * the tree card showing.
 */
export function WhereToSeeIt({ slug }: { slug: string }) {
  const [order, setOrder] = useState<'oldest' | 'newest'>('oldest');
  const [page, setPage] = useState(1);
  const query = useWhereToSee(slug, order, page);
  const orderId = useId();

  if (query.isPending) return <Loading label="Finding tours that show this tree…" />;
  if (query.isError) return <p className="text-ink-soft">The tour moments could not be loaded just now: {errorMessage(query.error)}</p>;
  const data = query.data;
  if (data.total === 0) return <p className="text-ink-soft">No published tour shows this tree yet.</p>;

  return (
    <div>
      <div className="mb-3 flex flex-wrap items-center justify-between gap-3 font-ui text-sm">
        <p className="text-ink-soft">
          {data.total} moment{data.total === 1 ? '' : 's'} in published tours
        </p>
        <label htmlFor={orderId} className="flex items-center gap-2">
          <span className="font-bold">Order</span>
          <select
            id={orderId}
            value={order}
            onChange={(e) => {
              setOrder(e.target.value === 'newest' ? 'newest' : 'oldest');
              setPage(1);
            }}
            className="min-h-9 rounded-md border border-edge bg-card px-2"
          >
            <option value="oldest">Oldest tour first</option>
            <option value="newest">Newest tour first</option>
          </select>
        </label>
      </div>
      <ul className={`grid gap-4 sm:grid-cols-2 lg:grid-cols-3 ${query.isPlaceholderData ? 'opacity-60' : ''}`} aria-busy={query.isPlaceholderData}>
        {data.items.map((m) => (
          <MomentCard key={m.stopId} m={m} />
        ))}
      </ul>
      {data.total > WHERE_TO_SEE_PAGE_SIZE && <Pager label="Pages of tour moments" page={page} pageSize={WHERE_TO_SEE_PAGE_SIZE} total={data.total} onPageChange={setPage} />}
    </div>
  );
}
