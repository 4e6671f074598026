import type { ReactNode } from 'react';
import { Link, useSearchParams } from 'react-router';
import type { CultivarHit, MomentHit, TourHit } from '@shared/schemas/search';
import { Button } from '@/components/button';
import { CultivarName, FictionalMark } from '@/components/cultivar-name';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { MarkedText } from '@/components/marked-text';
import { MomentThumb } from '@/components/moment-thumb';
import { Page } from '@/components/page';
import { SlashShortcutToggle } from '@/components/site-search';
import { Loading } from '@/components/spinner';
import { useHeadMeta } from '@/lib/head-meta';
import { clockText } from '@/lib/tour-moment';
import { useSearch } from '../api/search-api';
import { momentHref, reasonView, searchPageCount, searchParamsOf } from '../lib/search-view';

function plural(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

function Group({ id, title, count, children }: { id: string; title: string; count: number; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="mt-10 first:mt-0">
      <h2 id={id} className="flex items-baseline gap-3 text-2xl text-moss-deep">
        {title}
        <span className="font-ui text-base font-normal text-ink-soft">{count}</span>
      </h2>
      <div className="mt-3">{children}</div>
    </section>
  );
}

function CultivarResult({ hit }: { hit: CultivarHit }) {
  const reasons = hit.reasons.map((r) => reasonView(r, hit.cultivar.epithet));
  const suggestion = reasons.find((r) => r.suggestion);
  return (
    <li className="rounded-lg border border-rule bg-card px-4 py-3">
      {suggestion && <p className="font-ui text-sm font-bold text-maple">{suggestion.text}</p>}
      <p className="text-lg">
        <Link to={`/cultivars/${hit.cultivar.slug}`} className="font-bold">
          <CultivarName record={hit.cultivar} />
        </Link>{' '}
        <FictionalMark record={hit.cultivar} />
      </p>
      <div className="mt-1 flex flex-wrap items-center gap-2 font-ui text-sm">
        {hit.cultivar.groupName && <span className="text-ink-soft">{hit.cultivar.groupName}</span>}
        <ul className="flex flex-wrap gap-1.5" aria-label="Why it matched">
          {reasons
            .filter((r) => !r.suggestion)
            .map((r) => (
              <li key={r.text} className="rounded-full bg-moss-wash px-2.5 py-0.5 text-moss-deep">
                {r.text}
              </li>
            ))}
          {suggestion && <li className="rounded-full bg-maple-wash px-2.5 py-0.5 text-maple">Close spelling</li>}
        </ul>
        <Link to={`/cultivars/${hit.cultivar.slug}#where`} className="ml-auto font-bold">
          Where to see it<span className="sr-only"> (‘{hit.cultivar.epithet}’)</span>
        </Link>
      </div>
    </li>
  );
}

function TourResult({ hit }: { hit: TourHit }) {
  return (
    <li className="relative flex gap-3 rounded-lg border border-rule bg-card p-3 hover:border-edge sm:gap-4">
      <div className="w-28 shrink-0 self-start overflow-hidden rounded sm:w-36">
        <MomentThumb thumbnail={hit.posterUrl ? { kind: 'poster', url: hit.posterUrl } : null} />
      </div>
      <div className="min-w-0">
        <p className="text-lg leading-snug font-bold">
          <Link to={hit.link} className="after:absolute after:inset-0">
            <MarkedText text={hit.title} spans={hit.titleHighlights} />
          </Link>
        </p>
        <p className="text-sm text-ink-soft">
          {hit.garden && <>{hit.garden} · </>}
          by{' '}
          <Link to={`/authors/${hit.author.id}`} className="relative z-10">
            {hit.author.displayName}
          </Link>
        </p>
        {hit.snippet && (
          <p className="mt-1 text-sm">
            <MarkedText text={hit.snippet.text} spans={hit.snippet.highlights} />
          </p>
        )}
      </div>
    </li>
  );
}

function MomentResult({ hit }: { hit: MomentHit }) {
  const at = clockText(hit.startMs);
  return (
    <li className="relative flex gap-3 rounded-lg border border-rule bg-card p-3 hover:border-edge sm:gap-4" data-moment={hit.stop?.id ?? ''}>
      <div className="relative w-28 shrink-0 self-start overflow-hidden rounded sm:w-40">
        <MomentThumb thumbnail={hit.thumbnail} />
        <span aria-hidden="true" className="absolute right-1 bottom-1 rounded bg-ink/85 px-1.5 font-ui text-xs font-semibold text-card tabular-nums">
          {at}
        </span>
      </div>
      <div className="min-w-0">
        <p className="font-bold leading-snug">
          <Link to={momentHref(hit)} className="after:absolute after:inset-0">
            {hit.tourTitle}
            <span className="font-ui font-normal text-ink-soft"> at {at}</span>
          </Link>
        </p>
        <blockquote className="mt-1 border-l-2 border-rule pl-3">
          <MarkedText text={hit.text} spans={hit.highlights} />
        </blockquote>
        {hit.stop && (
          <p className="mt-1 font-ui text-sm text-ink-soft">
            Tree card:{' '}
            {hit.stop.cultivar ? (
              <span className="font-bold text-ink">
                <CultivarName record={hit.stop.cultivar} />
              </span>
            ) : (
              <span>unidentified tree{hit.stop.title ? ` (${hit.stop.title})` : ''}</span>
            )}
          </p>
        )}
      </div>
    </li>
  );
}

function Results({ q, page, setPage }: { q: string; page: number; setPage: (page: number) => void }) {
  const search = useSearch(q, page);
  if (search.isPending) return <Loading label={`Searching for “${q}”…`} />;
  if (search.isError) return <ErrorState title="The search did not work" error={search.error} onRetry={() => void search.refetch()} />;
  const data = search.data;
  const total = data.cultivars.total + data.tours.total + data.moments.total;
  const pages = searchPageCount(data);

  if (total === 0) {
    return (
      <EmptyState title={`Nothing found for “${q}”.`}>
        <p>Try part of a name (“sora”), a trait such as “weeping” or “coral bark”, or a word the narrator says.</p>
        <p className="mt-2">
          The <Link to="/glossary">glossary</Link> lists every accepted name, and the <Link to="/finder">tree finder</Link> works from what you see.
        </p>
      </EmptyState>
    );
  }

  const empty = (what: string) => <p className="text-ink-soft">{page > 1 ? `No more ${what} on this page.` : `No ${what} match.`}</p>;

  return (
    <div aria-busy={search.isPlaceholderData} className={search.isPlaceholderData ? 'opacity-60' : ''}>
      <p role="status" className="mb-8 font-ui text-ink-soft">
        Found {plural(data.cultivars.total, 'cultivar record', 'cultivar records')}, {plural(data.tours.total, 'tour', 'tours')} and{' '}
        {plural(data.moments.total, 'moment', 'moments')} in captions{pages > 1 ? ` · page ${page} of ${pages}` : ''}.
      </p>

      <Group id="cultivars-heading" title="Cultivars" count={data.cultivars.total}>
        {data.cultivars.items.length ? (
          <ul className="space-y-3">
            {data.cultivars.items.map((hit) => (
              <CultivarResult key={hit.cultivar.id} hit={hit} />
            ))}
          </ul>
        ) : (
          empty('cultivar records')
        )}
      </Group>

      <Group id="tours-heading" title="Tours" count={data.tours.total}>
        {data.tours.items.length ? (
          <ul className="space-y-3">
            {data.tours.items.map((hit) => (
              <TourResult key={hit.id} hit={hit} />
            ))}
          </ul>
        ) : (
          empty('tours')
        )}
      </Group>

      <Group id="moments-heading" title="Moments" count={data.moments.total}>
        <p className="-mt-1 mb-3 text-sm text-ink-soft">Where a tour says it. Each opens the video at that moment, with the tree card of that stop.</p>
        {data.moments.items.length ? (
          <ul className="space-y-3">
            {data.moments.items.map((hit) => (
              <MomentResult key={`${hit.trackId}-${hit.startMs}`} hit={hit} />
            ))}
          </ul>
        ) : (
          empty('moments')
        )}
        {data.moments.capped && <p className="mt-3 text-sm text-ink-soft">More moments matched than are listed. Add a word to narrow the search.</p>}
      </Group>

      {pages > 1 && (
        <nav aria-label="Pages of results" className="mt-8 flex flex-wrap items-center justify-between gap-3 font-ui text-sm">
          <p className="text-ink-soft">
            Page {page} of {pages}
          </p>
          <div className="flex gap-2">
            <Button variant="secondary" size="sm" disabled={page <= 1} onClick={() => setPage(page - 1)}>
              Previous page
            </Button>
            <Button variant="secondary" size="sm" disabled={page >= pages} onClick={() => setPage(page + 1)}>
              Next page
            </Button>
          </div>
        </nav>
      )}
    </div>
  );
}

/**
 * /search?q=: the site search's results in three groups — cultivar records (with why each
 * matched, and "Did you mean …?" for a close spelling), tours, and caption moments that open the
 * player at that moment with the stop's tree card — with loading, error and empty states and pages.
 */
export function SearchPage() {
  const [params, setParams] = useSearchParams();
  const { q, page } = searchParamsOf(params);
  useHeadMeta({ title: q ? `Search: ${q}` : 'Search', description: 'Search Grovewalk: cultivar names (even misspelt), traits such as “weeping”, and words spoken in garden tours.' });
  return (
    <Page title={q ? `Search: “${q}”` : 'Search'} width="medium" intro={q ? undefined : 'Use the search box at the top of the page: a cultivar name, even misspelt, a trait such as “weeping” or “coral bark”, or a word from a tour.'}>
      {q ? (
        <Results
          q={q}
          page={page}
          setPage={(next) => {
            const p = new URLSearchParams(params);
            if (next > 1) p.set('page', String(next));
            else p.delete('page');
            setParams(p);
            window.scrollTo({ top: 0 });
          }}
        />
      ) : null}
      <div className="mt-12 border-t border-rule pt-4 text-ink-soft">
        <SlashShortcutToggle />
      </div>
    </Page>
  );
}
