// Caption lookups that settle their ranking from the first full-text hits in the index's order must
// give exactly what MariaDB's own ORDER BY over every hit gives. The reference here is the server:
// each answer is compared with one query that sorts all hits with ORDER BY (relevance from InnoDB's
// boolean-mode MATCH, then newer tour, tour id, time in the tour, cue id) — no ranking code of ours
// in between. Small windows force both ways of answering; the counters show each was taken, so the
// comparison can fail. The tours, captions and garden are invented (fictional).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { User } from '../../server/db/entities/user.entity';
import { CaptionSearch, compareHits, windowOutcome, type CueHit } from '../../server/modules/search/caption-search';
import { booleanAllPrefix } from '../../server/modules/search/fulltext';
import { makeUser } from '../support/fixtures';
import { resetTables, startTestServer, type TestServer } from '../support/http';
import { publishedTour, trackWithCues } from '../support/search-fixtures';
import { prng } from '../../bench/bench-corpus';

let server: TestServer;
let author: User;

const WORDS = ['maple', 'lantern', 'gatehouse', 'moss', 'pond', 'bark', 'copper', 'willow', 'fern', 'heron'];

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  author = await makeUser(server.dataSource, 'author');
  const ds = server.dataSource;
  const rnd = prng(42);
  // Twelve published walks (some filmed the same day, so tour id breaks ties), two not public.
  const dates = ['2024-04-01', '2024-04-01', '2023-10-10', '2025-05-05', '2022-06-30', '2025-05-05', '2021-09-09', '2024-11-11', '2023-10-10', '2020-03-03', '2025-01-01', '2022-02-02'];
  const tours = [];
  for (const [i, filmedOn] of dates.entries()) tours.push(await publishedTour(ds, author.id, { title: `Ranking walk ${i} (fictional)`, filmedOn }));
  tours.push(await publishedTour(ds, author.id, { title: 'Draft walk (fictional)', state: 'ready', publishedAt: null }));
  tours.push(await publishedTour(ds, author.id, { title: 'Processing walk (fictional)', state: 'processing', publishedAt: null }));
  for (const tour of tours) {
    const cues: [number, number, string][] = [];
    for (let k = 0; k < 30; k++) {
      // Skewed word choice and repeats, so relevance comes in a few tiers with long ties.
      const words = Array.from({ length: 3 + Math.floor(rnd() * 6) }, () => WORDS[Math.floor(WORDS.length * rnd() ** 2)]!);
      // Two cues at the same moment in some tours: cue id then breaks the tie.
      const start = k === 29 ? 28 * 4000 : k * 4000;
      cues.push([start, start + 3000, `${words.join(' ')} by the path.`]);
    }
    await trackWithCues(ds, tour.id, cues);
  }
});
afterAll(async () => server.close());

/** Every hit sorted by the server, as the lookup used to ask for it. */
async function serverOrder(against: string, limit: number): Promise<number[]> {
  const rows = (await server.dataSource.query(
    `SELECT c.id AS id, MATCH(c.text) AGAINST (? IN BOOLEAN MODE) AS score, COALESCE(t.filmed_on, DATE(t.published_at)) AS tourDate
     FROM cues c JOIN caption_tracks ct ON ct.id = c.track_id JOIN tours t ON t.id = ct.tour_id
     WHERE MATCH(c.text) AGAINST (? IN BOOLEAN MODE) AND t.state = 'published'
     ORDER BY score DESC, tourDate DESC, t.id DESC, c.start_ms ASC, c.id ASC LIMIT ${limit}`,
    [against, against],
  )) as { id: number | string }[];
  return rows.map((r) => Number(r.id));
}

describe('ranked caption lookups', () => {
  it('give the same cues in the same order as ORDER BY over every hit, whichever way they settle', async () => {
    let compared = 0;
    const stats = { fromWindow: 0, newestToursFirst: 0, toursReadEarly: 0, sortedAll: 0 };
    for (const window of [3, 8, 25, 60, 1500]) {
      const captions = new CaptionSearch(server.dataSource, window);
      for (const query of [['maple'], ['lantern'], ['heron'], ['maple', 'moss'], ['gate'], ['pond', 'bark']]) {
        const against = booleanAllPrefix(query);
        // Each limit twice: the second lookup sizes its reads from what the first one needed.
        for (const limit of [1, 1, 2, 2, 5, 5, 17, 17, 40, 40]) {
          const got = await captions.ranked(against, { sql: '', params: [] }, limit);
          const want = await serverOrder(against, limit);
          expect(want.length, `${query.join(' ')} has hits`).toBeGreaterThan(0);
          expect(got.map((h) => h.cueId), `${query.join(' ')}, limit ${limit}, window ${window}`).toEqual(want);
          compared++;
        }
      }
      stats.fromWindow += captions.rankStats.fromWindow;
      stats.newestToursFirst += captions.rankStats.newestToursFirst;
      stats.toursReadEarly += captions.rankStats.toursReadEarly;
      stats.sortedAll += captions.rankStats.sortedAll;
    }
    expect(compared).toBe(300);
    // Every way was taken, so each was checked against the server.
    expect(stats.fromWindow).toBeGreaterThan(20);
    expect(stats.newestToursFirst).toBeGreaterThan(10);
    expect(stats.sortedAll).toBeGreaterThan(0);
    // Later lookups with the same words started on the newest tours at once (sizing from earlier ones).
    expect(stats.toursReadEarly).toBeGreaterThan(2);
  });

  it('never shows a cue of a tour that is not published', async () => {
    const captions = new CaptionSearch(server.dataSource, 5);
    const hits = await captions.ranked(booleanAllPrefix(['maple']), { sql: '', params: [] }, 1000);
    const [{ n }] = await server.dataSource.query(
      `SELECT COUNT(*) AS n FROM cues c JOIN caption_tracks ct ON ct.id = c.track_id JOIN tours t ON t.id = ct.tour_id
       WHERE MATCH(c.text) AGAINST ('+maple*' IN BOOLEAN MODE) AND t.state = 'published'`,
    );
    expect(hits).toHaveLength(Number(n));
    const published = new Set(((await server.dataSource.query(`SELECT id FROM tours WHERE state = 'published'`)) as { id: number }[]).map((r) => Number(r.id)));
    expect(hits.every((h) => published.has(h.tourId))).toBe(true);
    expect(published.size).toBe(12);
  });
});

describe('windowOutcome', () => {
  const hit = (cueId: number, score: number): CueHit => ({
    cueId,
    trackId: 1,
    tourId: 1,
    lang: 'en',
    startMs: cueId * 1000,
    endMs: cueId * 1000 + 500,
    rawText: null,
    score,
    tourDate: '2025-01-01',
    nameHit: false,
    cultivarIds: [],
    nameSpans: [],
  });

  it('settles when every hit was read, or when the last read scores below the cut', () => {
    const three = [hit(1, 3), hit(2, 2), hit(3, 1)];
    expect(windowOutcome(three.slice(0, 2), three.slice(0, 2), 2, 3)).toBe('every-hit'); // fewer than the window
    expect(windowOutcome(three, three, 2, 3)).toBe('settled'); // 1 < 2: nothing unread can reach the cut
  });

  it('sees a tie running past the window, too few kept, and distrusts a window whose scores rise', () => {
    const tie = [hit(1, 3), hit(2, 2), hit(3, 2)];
    expect(windowOutcome(tie, tie, 2, 3)).toBe('tie-runs-on'); // an unread hit may tie at 2 and sort first
    const three = [hit(1, 3), hit(2, 2), hit(3, 1)];
    // The cut is the last kept: hit 3 (a draft's) was read but not kept, and it ties nothing, yet
    // only two of three were kept while three are wanted.
    expect(windowOutcome(three, three.slice(0, 2), 3, 3)).toBe('too-few-kept');
    // Kept [3, 1]: the second kept is the last read, so unread hits may tie with it.
    expect(windowOutcome(three, [three[0]!, three[2]!], 2, 3)).toBe('tie-runs-on');
    expect(windowOutcome([hit(1, 1), hit(2, 3), hit(3, 0.5)], [hit(1, 1), hit(2, 3), hit(3, 0.5)], 2, 3)).toBe('unordered'); // not the index's order
  });

  it('sorts like ORDER BY: relevance, newer tour, tour id, time, cue id', () => {
    const a = { ...hit(1, 1), tourDate: '2024-01-01', tourId: 2 };
    const b = { ...hit(2, 1), tourDate: '2025-01-01', tourId: 1 };
    const c = { ...hit(3, 1), tourDate: '2025-01-01', tourId: 3 };
    const d = { ...hit(4, 2), tourDate: '2020-01-01', tourId: 9 };
    expect([a, b, c, d].sort(compareHits).map((h) => h.cueId)).toEqual([4, 3, 2, 1]);
  });
});
