import type { MatchReason, MomentHit, SearchResponse } from '@shared/schemas/search';
import { SEARCH_QUERY_MAX } from '@shared/schemas/search';
import { startParam } from '@/lib/tour-moment';

/** The search text and page from the address; the page falls back to 1 for anything odd. */
export function searchParamsOf(params: URLSearchParams): { q: string; page: number } {
  const q = (params.get('q') ?? '').trim().slice(0, SEARCH_QUERY_MAX);
  const raw = Number(params.get('page') ?? '1');
  const page = Number.isInteger(raw) && raw >= 1 && raw <= 1000 ? raw : 1;
  return { q, page };
}

/** The results page for a search (and page), as an address. */
export function searchHref(q: string, page = 1): string {
  const params = new URLSearchParams({ q: q.trim() });
  if (page > 1) params.set('page', String(page));
  return `/search?${params.toString()}`;
}

/**
 * Where a caption hit opens: the stop's own address at the cue's time (so the player starts at
 * that moment with that stop's tree card), or the tour at that time when no stop covers the cue.
 * The time is rounded down to a tenth of a second so the player never starts after the words.
 */
export function momentHref(hit: Pick<MomentHit, 'tourId' | 'startMs' | 'stop'>): string {
  const t = startParam(hit.startMs);
  return hit.stop ? `/tours/${hit.tourId}/stops/${hit.stop.id}?t=${t}` : `/tours/${hit.tourId}?t=${t}`;
}

const SEASON_WORDS = { spring: 'spring', summer: 'summer', autumn: 'autumn' } as const;

function listWords(items: readonly string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/** How a result's reason reads beside its name; a close spelling asks "Did you mean …?". */
export interface ReasonView {
  text: string;
  /** A misspelling or sound-alike: the name is offered as a correction. */
  suggestion: boolean;
}

/** Plain words for why a cultivar record matched the search. */
export function reasonView(reason: MatchReason, epithet: string): ReasonView {
  if (reason.kind === 'trait') {
    const seasons = reason.seasons?.length ? ` in ${listWords(reason.seasons.map((s) => SEASON_WORDS[s]))}` : '';
    return { text: `${reason.label}${seasons}`, suggestion: false };
  }
  switch (reason.how) {
    case 'exact':
      return { text: 'Name matches', suggestion: false };
    case 'variant':
      return { text: `Also written “${reason.matched}”`, suggestion: false };
    case 'prefix':
      return { text: `Name starts with “${reason.heard}”`, suggestion: false };
    case 'contains':
      return { text: `Name contains “${reason.heard}”`, suggestion: false };
    case 'fuzzy':
    case 'phonetic':
      return { text: `Did you mean ‘${epithet}’?`, suggestion: true };
  }
}

/** Pages of the grouped results: as many as the longest group needs (at least one). */
export function searchPageCount(data: Pick<SearchResponse, 'pageSizes' | 'cultivars' | 'tours' | 'moments'>): number {
  const pages = (total: number, size: number) => Math.ceil(total / Math.max(1, size));
  return Math.max(
    1,
    pages(data.cultivars.total, data.pageSizes.cultivars),
    pages(data.tours.total, data.pageSizes.tours),
    pages(data.moments.total, data.pageSizes.moments),
  );
}
