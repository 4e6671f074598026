// Caption ranking when its size estimates are far off. Cue ids get sparse as caption saves replace
// a track's cues, so a tie's share of all cues, read from the ids it spans, can come out far too
// small; the lookup must still answer (never read a window shorter than the cut) and answer in the
// order of ORDER BY (a product rule, issue 6: relevance, newer tour, tour id, time, cue id). The
// database here is a stand-in that answers the lookup's statements from an invented list of hits.
import type { DataSource } from 'typeorm';
import { describe, expect, it } from 'vitest';
import { CaptionSearch, windowOutcome } from '../../../server/modules/search/caption-search';

interface FakeHit {
  cueId: number;
  trackId: number;
  tourId: number;
  startMs: number;
  score: number;
  tourDate: string;
}

/** A stand-in database over `hits` (all published), answering the statements `ranked` sends. */
function fakeDb(hits: FakeHit[], tableRows: number, windowListSum = 'unchanged'): { ds: DataSource; windows: number[] } {
  const windows: number[] = [];
  const row = (h: FakeHit) => ({ cueId: h.cueId, trackId: h.trackId, tourId: h.tourId, lang: 'en', startMs: h.startMs, endMs: h.startMs + 1000, score: h.score, tourDate: h.tourDate });
  // The index's order: relevance, then document (cue) order.
  const indexOrder = [...hits].sort((a, b) => b.score - a.score || a.cueId - b.cueId);
  const tracks = [...new Map(hits.map((h) => [h.trackId, h])).values()].sort((a, b) => (a.tourDate < b.tourDate ? 1 : a.tourDate > b.tourDate ? -1 : b.tourId - a.tourId || a.trackId - b.trackId));
  const query = async (sql: string, params: unknown[] = []) => {
    if (sql.includes('information_schema')) return [{ cues: tableRows, tracks: tracks.length }];
    if (sql.includes('ORDER BY tourDate DESC, t.id DESC, ct.id ASC')) return tracks.map((h) => ({ trackId: h.trackId, tourId: h.tourId, lang: 'en', tourDate: h.tourDate, listSum: 'unchanged' }));
    if (sql.includes('HAVING score > 0')) {
      const ids = new Set(params.slice(1).map(Number));
      return hits.filter((h) => ids.has(h.trackId) || ids.has(h.cueId)).map((h) => ({ ...row(h), listSum: 'unchanged' }));
    }
    const limit = Number(/LIMIT (\d+)\s*$/.exec(sql)![1]);
    if (sql.includes('ORDER BY score DESC')) {
      const all = [...hits].sort((a, b) => b.score - a.score || (a.tourDate < b.tourDate ? 1 : a.tourDate > b.tourDate ? -1 : 0) || b.tourId - a.tourId || a.startMs - b.startMs || a.cueId - b.cueId);
      return all.slice(0, limit).map(row);
    }
    windows.push(limit);
    // The window names the track list it saw only when asked (an early read is in flight).
    return indexOrder.slice(0, limit).map((h) => (sql.includes('AS listSum') ? { ...row(h), listSum: windowListSum } : row(h)));
  };
  return { ds: { query } as unknown as DataSource, windows };
}

describe('ranked caption lookups with estimates far off', () => {
  it('answers, in ORDER BY order, when sparse cue ids make the tie look rare', async () => {
    // 450 hits tied at one score, cue ids 40 apart, 45 tours of 10 hits; the table reports 4,500 rows.
    const hits: FakeHit[] = Array.from({ length: 450 }, (_, i) => ({
      cueId: 1 + i * 40,
      trackId: 1 + Math.floor(i / 10),
      tourId: 1 + Math.floor(i / 10),
      startMs: (i % 10) * 5000,
      score: 0.7,
      tourDate: `20${String(10 + (Math.floor(i / 10) % 15)).padStart(2, '0')}-05-01`,
    }));
    const { ds, windows } = fakeDb(hits, 4500);
    const captions = new CaptionSearch(ds, 400);
    const got = await captions.ranked('+word*', { sql: '', params: [] }, 201);
    expect(got).toHaveLength(201);
    // No window was shorter than the cut.
    expect(Math.min(...windows)).toBeGreaterThan(201);
    const want = [...hits].sort((a, b) => (a.tourDate < b.tourDate ? 1 : a.tourDate > b.tourDate ? -1 : 0) || b.tourId - a.tourId || a.startMs - b.startMs || a.cueId - b.cueId).slice(0, 201);
    expect(got.map((h) => h.cueId)).toEqual(want.map((h) => h.cueId));
    expect(captions.rankStats.changedMidLookup).toBe(0);
  });

  it('uses a newest-tours read taken before the window only when the window saw the same track list', async () => {
    // 900 hits tied, 90 tours of 10; the counts say half of all cues hold the word, so the lookup
    // reads the newest tours beside its first window.
    const hits: FakeHit[] = Array.from({ length: 900 }, (_, i) => ({
      cueId: 1 + i,
      trackId: 1 + Math.floor(i / 10),
      tourId: 1 + Math.floor(i / 10),
      startMs: (i % 10) * 5000,
      score: 0.5,
      tourDate: `20${String(10 + (Math.floor(i / 10) % 15)).padStart(2, '0')}-03-01`,
    }));
    const want = [...hits].sort((a, b) => (a.tourDate < b.tourDate ? 1 : a.tourDate > b.tourDate ? -1 : 0) || b.tourId - a.tourId || a.startMs - b.startMs || a.cueId - b.cueId).slice(0, 201);
    for (const [windowSaw, used] of [['unchanged', true], ['a tour published since', false]] as const) {
      const { ds } = fakeDb(hits, 1800, windowSaw);
      const captions = new CaptionSearch(ds, 400);
      const got = await captions.ranked('+word*', { sql: '', params: [] }, 201, { share: 0.5, atLeast: null });
      expect(got.map((h) => h.cueId), windowSaw).toEqual(want.map((h) => h.cueId));
      expect(captions.rankStats.toursReadEarly, windowSaw).toBe(used ? 1 : 0);
      expect(captions.rankStats.changedMidLookup, windowSaw).toBe(used ? 0 : 1);
    }
  });

  it('never concludes from a window no longer than the cut', () => {
    const scores = [3, 2, 1].map((score) => ({ score }));
    expect(windowOutcome(scores, 3, 3)).toBe('unordered');
    expect(windowOutcome(scores, 4, 4)).toBe('every-hit'); // fewer than the window asked for: every hit
  });
});
