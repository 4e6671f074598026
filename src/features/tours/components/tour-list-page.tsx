import { useQuery } from '@tanstack/react-query';
import { useEffect, useId, useMemo, useState, type FormEvent } from 'react';
import { Link, useSearchParams } from 'react-router';
import { z } from 'zod';
import { hasRole } from '@shared/schemas/common';
import { cultivarSummarySchema } from '@shared/schemas/cultivars';
import { Button, buttonClasses } from '@/components/button';
import { CultivarName } from '@/components/cultivar-name';
import { CultivarPicker, type PickedCultivar } from '@/components/cultivar-picker';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { Page } from '@/components/page';
import { Pager } from '@/components/pager';
import { Loading } from '@/components/spinner';
import { api } from '@/lib/api';
import { useMe } from '@/lib/auth';
import { tourKeys } from '../api/tour-keys';
import { usePublicTours } from '../api/tours-api';
import { authorListQueryOptions, authorPageQueryOptions } from '../api/watch-api';
import { BROWSE_GROUPS, filtersFromParams, hasFilters, listParams, paramsFromFilters, type BrowseFilters } from '../lib/browse-filters';
import { pageFromParams } from '@/lib/route-params';
import { TourCard } from './tour-card';

/** Tours per page of the public list (four rows of three on a wide screen). */
export const TOURS_PAGE_SIZE = 12;

const recordResponse = z.object({ cultivar: cultivarSummarySchema });

/** The record a cultivar filter names, to show its name and to start the picker with it. */
function useFilterRecord(slug: string | undefined) {
  return useQuery({
    queryKey: tourKeys.browseRecord(slug ?? ''),
    queryFn: ({ signal }) => api.get(`/api/cultivars/${encodeURIComponent(slug!)}`, { schema: recordResponse, signal }).then((r) => r.cultivar),
    enabled: !!slug,
    staleTime: 5 * 60_000,
  });
}

/**
 * Everyone who has published a tour, for the author choice; an author named in the address but
 * with no published tour left (or not yet listed) stays choosable, so the filter shown is true.
 */
function useAuthorChoices(current: number | undefined) {
  const list = useQuery(authorListQueryOptions());
  const listed = !list.data || current == null || list.data.some((a) => a.id === current);
  const currentAuthor = useQuery({ ...authorPageQueryOptions(current ?? 0, 1), enabled: !listed });
  return useMemo(() => {
    // The server sends them by name; counts tell a namesake apart.
    const choices = (list.data ?? []).map((a) => ({ id: a.id, name: `${a.displayName} (${a.publishedTours} ${a.publishedTours === 1 ? 'tour' : 'tours'})` }));
    if (!listed && currentAuthor.data) choices.push({ id: currentAuthor.data.author.id, name: currentAuthor.data.author.displayName });
    return choices;
  }, [list.data, listed, currentAuthor.data]);
}

function FilterForm({ filters, onApply }: { filters: BrowseFilters; onApply: (f: BrowseFilters) => void }) {
  const ids = { author: useId(), garden: useId(), group: useId(), cultivar: useId() };
  const [picking, setPicking] = useState(false);
  const authors = useAuthorChoices(filters.author);
  const record = useFilterRecord(filters.cultivar);
  const [author, setAuthor] = useState(filters.author ? String(filters.author) : '');
  const [garden, setGarden] = useState(filters.garden ?? '');
  const [group, setGroup] = useState(filters.group ?? '');
  const [picked, setPicked] = useState<PickedCultivar | null>(null);
  const [cleared, setCleared] = useState(false);

  // The form follows the address (back button, a link to a filtered list).
  useEffect(() => {
    setAuthor(filters.author ? String(filters.author) : '');
    setGarden(filters.garden ?? '');
    setGroup(filters.group ?? '');
    setCleared(false);
    setPicked(null);
    setPicking(false);
  }, [filters.author, filters.garden, filters.group, filters.cultivar]);

  const chosen: PickedCultivar | null = picked ?? (!cleared && record.data ? record.data : null);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    onApply({
      author: author ? Number(author) : undefined,
      garden: garden.trim() || undefined,
      group: group || undefined,
      cultivar: chosen?.slug ?? (!cleared && filters.cultivar && !record.data ? filters.cultivar : undefined),
    });
  };

  return (
    <form onSubmit={submit} aria-label="Filter tours" className="mb-8 rounded-lg border border-rule bg-card p-4 shadow-leaf">
      <div className="grid gap-4 sm:grid-cols-3">
        <div>
          <label htmlFor={ids.author} className="block font-bold">
            Author
          </label>
          <select id={ids.author} value={author} onChange={(e) => setAuthor(e.target.value)} className="mt-1 block min-h-11 w-full rounded-md border border-edge bg-card px-3">
            <option value="">Anyone</option>
            {authors.map((a) => (
              <option key={a.id} value={String(a.id)}>
                {a.name}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor={ids.garden} className="block font-bold">
            Garden
          </label>
          <input
            id={ids.garden}
            type="text"
            value={garden}
            onChange={(e) => setGarden(e.target.value)}
            maxLength={160}
            placeholder="Part of its name"
            className="mt-1 block min-h-11 w-full rounded-md border border-edge bg-card px-3 placeholder:text-ink-soft"
          />
        </div>
        <div>
          <label htmlFor={ids.group} className="block font-bold">
            Cultivar Group
          </label>
          <select id={ids.group} value={group} onChange={(e) => setGroup(e.target.value)} className="mt-1 block min-h-11 w-full rounded-md border border-edge bg-card px-3">
            <option value="">Any Group</option>
            {BROWSE_GROUPS.map((g) => (
              <option key={g} value={g}>
                {g} Group
              </option>
            ))}
            {group && !(BROWSE_GROUPS as readonly string[]).includes(group) && <option value={group}>{group} Group</option>}
          </select>
        </div>
      </div>
      <div className="mt-4">
        {chosen || picking ? (
          <CultivarPicker
            label="Shows this cultivar"
            hint="Tours with a stop at this tree. Type part of a name; common misspellings are found too."
            value={chosen}
            onChange={(c) => {
              setPicked(c);
              setCleared(c === null);
            }}
          />
        ) : (
          <div>
            <p className="font-bold" id={ids.cultivar}>
              Shows this cultivar
            </p>
            <div className="mt-1 flex flex-wrap items-center gap-3" role="group" aria-labelledby={ids.cultivar}>
              <span className="text-ink-soft">Any cultivar</span>
              <Button variant="secondary" size="sm" onClick={() => setPicking(true)}>
                Choose a cultivar
              </Button>
            </div>
          </div>
        )}
      </div>
      <div className="mt-4 flex flex-wrap gap-3">
        <Button type="submit">Show tours</Button>
        {hasFilters(filters) && (
          <Link to="/tours" className={buttonClasses('quiet')}>
            Clear filters
          </Link>
        )}
      </div>
    </form>
  );
}

function ActiveFilters({ filters, authorName, cultivar }: { filters: BrowseFilters; authorName: string | null; cultivar: { acceptedName: string; nameSegments: { text: string; italic: boolean }[] } | null }) {
  if (!hasFilters(filters)) return null;
  const parts = [
    filters.author && <>by {authorName ?? `author ${filters.author}`}</>,
    filters.garden && <>in a garden called “{filters.garden}”</>,
    filters.group && <>showing a tree of the {filters.group} Group</>,
    filters.cultivar && <>showing {cultivar ? <CultivarName record={cultivar} /> : `“${filters.cultivar}”`}</>,
  ].filter(Boolean);
  return (
    <p role="status" className="mb-4 font-ui text-sm text-ink-soft">
      Tours{' '}
      {parts.map((p, i) => (
        <span key={i}>
          {i > 0 && ', '}
          {p}
        </span>
      ))}
      .
    </p>
  );
}

/** The public list of published tours, newest first, with browse filters and pages (all in the address). */
export function TourListPage() {
  const [params, setParams] = useSearchParams();
  const page = pageFromParams(params);
  const filters = useMemo(() => filtersFromParams(params), [params]);
  const tours = usePublicTours(listParams(filters, page, TOURS_PAGE_SIZE));
  const { data: me } = useMe();
  const canUpload = hasRole(me?.role, 'author');
  const authorPage = useQuery({ ...authorPageQueryOptions(filters.author ?? 0, 1), enabled: filters.author != null });
  const record = useFilterRecord(filters.cultivar);
  const filtered = hasFilters(filters);

  let body;
  if (tours.isPending) body = <Loading label="Loading tours…" />;
  else if (tours.isError) body = <ErrorState title="The tours could not be loaded" error={tours.error} onRetry={() => void tours.refetch()} />;
  else if (tours.data.items.length === 0 && tours.data.total === 0 && filtered) {
    body = (
      <EmptyState title="No published tour matches these filters.">
        <Link to="/tours">Show all tours</Link>
      </EmptyState>
    );
  } else if (tours.data.items.length === 0 && tours.data.total === 0) {
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
        <Link to={`/tours?${paramsFromFilters(filters).toString()}`}>Go to the first page</Link>
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
        <Pager label="Pages of tours" page={page} pageSize={TOURS_PAGE_SIZE} total={tours.data.total} onPageChange={(next) => setParams(paramsFromFilters(filters, next))} />
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
      <FilterForm filters={filters} onApply={(f) => setParams(paramsFromFilters(f))} />
      <ActiveFilters filters={filters} authorName={authorPage.data?.author.displayName ?? null} cultivar={record.data ?? null} />
      {body}
    </Page>
  );
}
