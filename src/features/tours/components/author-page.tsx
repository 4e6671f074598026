import { Link, useSearchParams } from 'react-router';
import { buttonClasses } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { Page } from '@/components/page';
import { Pager } from '@/components/pager';
import { Loading } from '@/components/spinner';
import { isApiError } from '@/lib/api';
import { useHeadMeta } from '@/lib/head-meta';
import { AUTHOR_TOURS_PAGE_SIZE, useAuthorPage } from '../api/watch-api';
import { formatDay } from '../lib/media-format';
import { pageFromParams } from '@/lib/route-params';
import { TourCard } from './tour-card';

/** /authors/:id: a member who publishes tours — name, garden, since when, and their published tours. */
export function AuthorPage({ authorId }: { authorId: number }) {
  const [params, setParams] = useSearchParams();
  const page = pageFromParams(params);
  const query = useAuthorPage(authorId, page);
  const data = query.data;
  useHeadMeta(
    data
      ? {
          title: `${data.author.displayName} on Grovewalk`,
          description: `Garden tours by ${data.author.displayName}${data.author.garden ? ` of ${data.author.garden}` : ''}: ${data.author.publishedTours} published.`,
          type: 'profile',
        }
      : null,
  );

  if (query.isPending) {
    return (
      <div className="mx-auto max-w-6xl px-4 sm:px-6">
        <Loading label="Loading the author’s page…" />
      </div>
    );
  }
  if (query.isError) {
    if (isApiError(query.error) && query.error.status === 404) {
      return (
        <Page title="No such author">
          <p>Nobody publishes tours under this address. They may have left the club, or the link is mistyped.</p>
          <p className="mt-4">
            <Link to="/tours">Browse all tours</Link>
          </p>
        </Page>
      );
    }
    return (
      <div className="mx-auto max-w-3xl px-4 sm:px-6">
        <ErrorState title="The author’s page could not be loaded" error={query.error} onRetry={() => void query.refetch()} />
      </div>
    );
  }

  const { author, tours } = query.data;
  const since = formatDay(author.memberSince.slice(0, 10));
  return (
    <Page
      title={author.displayName}
      width="wide"
      intro={
        <>
          {author.garden && <p className="text-bark">{author.garden}</p>}
          <p>
            {author.publishedTours} published tour{author.publishedTours === 1 ? '' : 's'}
            {since && <> · member since {since}</>}
          </p>
        </>
      }
    >
      <div className="-mt-2 mb-6">
        <Link to={`/tours?author=${author.id}`} className={buttonClasses('secondary', 'sm')}>
          Filter all tours by {author.displayName}
        </Link>
      </div>
      <section aria-labelledby="author-tours">
        <h2 id="author-tours" className="sr-only">
          Tours by {author.displayName}
        </h2>
        {tours.items.length === 0 ? (
          <EmptyState title={page > 1 ? 'This page is past the end of the list.' : `${author.displayName} has not published a tour yet.`} />
        ) : (
          <>
            <ul className={`grid gap-5 sm:grid-cols-2 lg:grid-cols-3 ${query.isPlaceholderData ? 'opacity-60' : ''}`}>
              {tours.items.map((t) => (
                <TourCard key={t.id} tour={t} showAuthor={false} headingLevel={3} />
              ))}
            </ul>
            <Pager label="Pages of tours" page={page} pageSize={AUTHOR_TOURS_PAGE_SIZE} total={tours.total} onPageChange={(next) => setParams(next === 1 ? {} : { page: String(next) })} />
          </>
        )}
      </section>
    </Page>
  );
}
