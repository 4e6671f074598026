import { positiveIntParam } from '@/lib/route-params';

/** Most records side by side shows at once (the server refuses more). */
export const MAX_COMPARE = 3;

/** What the address asked for, and whether side by side can show it. */
export interface CompareIds {
  ids: number[];
  /** "ok" for two or three; otherwise why not, so the page can say it plainly. */
  status: 'ok' | 'too_few' | 'too_many';
}

/**
 * Record ids from `?ids=3,7`: positive whole numbers in the order given, repeats and anything
 * unreadable dropped one by one (so "3,,x,3,7" still means 3 and 7).
 */
export function parseCompareIds(raw: string | null | undefined): CompareIds {
  const ids: number[] = [];
  for (const part of (raw ?? '').split(',')) {
    const n = positiveIntParam(part.trim());
    if (n !== null && !ids.includes(n)) ids.push(n);
  }
  return { ids, status: ids.length < 2 ? 'too_few' : ids.length > MAX_COMPARE ? 'too_many' : 'ok' };
}

/** The side by side address for some records, or the empty picker when there are none. */
export function compareHref(ids: readonly number[]): string {
  return ids.length ? `/compare?ids=${ids.join(',')}` : '/compare';
}
