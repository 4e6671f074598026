import type { EntityManager } from 'typeorm';
import { replaceVariant } from '../../../shared/names/replace';
import { likeContains } from '../../db/like';

/** A cue with where it belongs, as the spelling-fix queries read it. */
export interface CueHit {
  cueId: number;
  trackId: number;
  tourId: number;
  tourTitle: string;
  startMs: number;
  endMs: number;
  text: string;
}

/** The separators replaceVariant accepts between the words of a variant. */
const WORD_SPLIT = /[\s\u00A0\-\u2010\u2011\u2013]+/;

/**
 * The longest word of the proposed text: a cheap SQL pre-filter (LIKE under the case- and
 * accent-insensitive collation finds a superset of what the exact word-boundary check accepts).
 */
export function longestWord(text: string): string {
  return text
    .trim()
    .split(WORD_SPLIT)
    .filter((w) => w.length > 0)
    .reduce((best, w) => (w.length > best.length ? w : best), '');
}

/** True when accepting the fix would change this cue text. */
export function wouldChange(text: string, proposedText: string, accepted: string): boolean {
  return replaceVariant(text, proposedText, accepted).count > 0;
}

/**
 * Cues whose text holds `proposedText` as whole words and would change when it is replaced by
 * `accepted`. `visibleTo` limits the search to tours a person may see (published, or their own);
 * without it every tour counts. Not a locking read.
 */
export async function cuesToChange(
  m: EntityManager,
  proposedText: string,
  accepted: string,
  opts: { visibleTo?: { userId: number; everything: boolean }; trackId?: number; startMs?: number; cueId?: number; limit?: number } = {},
): Promise<CueHit[]> {
  const word = longestWord(proposedText);
  if (!word) return [];
  const params: unknown[] = [likeContains(word)];
  let where = 'c.text LIKE ?';
  if (opts.cueId !== undefined) {
    where += ' AND c.id = ?';
    params.push(opts.cueId);
  }
  if (opts.trackId !== undefined) {
    where += ' AND c.track_id = ?';
    params.push(opts.trackId);
  }
  if (opts.startMs !== undefined) {
    where += ' AND c.start_ms = ?';
    params.push(opts.startMs);
  }
  if (opts.visibleTo && !opts.visibleTo.everything) {
    where += " AND (r.state = 'published' OR r.author_id = ?)";
    params.push(opts.visibleTo.userId);
  }
  const rows: Record<string, unknown>[] = await m.query(
    `SELECT c.id, c.track_id AS trackId, t.tour_id AS tourId, r.title AS tourTitle, c.start_ms AS startMs, c.end_ms AS endMs, c.text
       FROM cues c
       JOIN caption_tracks t ON t.id = c.track_id
       JOIN tours r ON r.id = t.tour_id
      WHERE ${where}
      ORDER BY c.id`,
    params,
  );
  const out: CueHit[] = [];
  for (const r of rows) {
    const text = String(r.text);
    if (!wouldChange(text, proposedText, accepted)) continue;
    out.push({
      cueId: Number(r.id),
      trackId: Number(r.trackId),
      tourId: Number(r.tourId),
      tourTitle: String(r.tourTitle),
      startMs: Number(r.startMs),
      endMs: Number(r.endMs),
      text,
    });
    if (opts.limit && out.length >= opts.limit) break;
  }
  return out;
}
