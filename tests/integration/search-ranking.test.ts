// Caption lookups that settle their ranking from the first full-text hits in the index's order, or
// finish a long tie from the newest tours, must give exactly what MariaDB's own ORDER BY over every
// hit gives. The reference here is the server: each answer is compared with one query that sorts all
// hits with ORDER BY (relevance from InnoDB's boolean-mode MATCH, then newer tour, tour id, time in
// the tour, cue id) — no ranking code of ours in between. Small windows force every way of
// answering, and each scenario checks which ways it took, so the comparison can fail. The tours,
// captions and garden are invented (fictional).
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { User } from '../../server/db/entities/user.entity';
import { CaptionSearch, compareHits, fallbackWhere, firstReads, windowOutcome, type CueCondition, type CueHit, type RankStats } from '../../server/modules/search/caption-search';
import { booleanAllPrefix } from '../../server/modules/search/fulltext';
import { makeUser } from '../support/fixtures';
import { resetTables, startTestServer, type TestServer } from '../support/http';
import { publishedTour, trackWithCues } from '../support/search-fixtures';
import { prng } from '../../bench/bench-corpus';

let server: TestServer;
let author: User;
let draftTourId: number;

const WORDS = ['maple', 'lantern', 'gatehouse', 'moss', 'pond', 'bark', 'copper', 'willow', 'fern', 'heron'];
const NONE: CueCondition = { sql: '', params: [] };
const PAIRS = [['plum', 'yew'], ['quince', 'rowan'], ['sloe', 'hazel'], ['medlar', 'rue'], ['damson', 'box'], ['elder', 'ivy']];

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  author = await makeUser(server.dataSource, 'author');
  const ds = server.dataSource;
  const rnd = prng(42);
  // Fourteen published walks (some filmed the same day, so tour id breaks ties); every third has
  // a second caption track, so a tour's cues come from two tracks.
  const dates = ['2024-04-01', '2024-04-01', '2023-10-10', '2025-05-05', '2022-06-30', '2025-05-05', '2021-09-09', '2024-11-11', '2023-10-10', '2020-03-03', '2025-01-01', '2022-02-02', '2019-08-08', '2025-05-05'];
  const tours: { id: number; tracks: number }[] = [];
  for (const [i, filmedOn] of dates.entries()) tours.push({ id: (await publishedTour(ds, author.id, { title: `Ranking walk ${i} (fictional)`, filmedOn })).id, tracks: i % 3 === 0 ? 2 : 1 });
  // Not public, and filmed last: if they leaked they would sort first in every tie.
  draftTourId = (await publishedTour(ds, author.id, { title: 'Draft walk (fictional)', state: 'ready', publishedAt: null, filmedOn: '2026-06-01' })).id;
  const processing = await publishedTour(ds, author.id, { title: 'Processing walk (fictional)', state: 'processing', publishedAt: null, filmedOn: '2026-06-02' });
  tours.push({ id: draftTourId, tracks: 1 }, { id: processing.id, tracks: 2 });
  for (const tour of tours) {
    for (const [lang, label] of [['en', 'English'], ['fr', 'Français']].slice(0, tour.tracks)) {
      const cues: [number, number, string][] = [];
      for (let k = 0; k < 30; k++) {
        // Skewed word choice and repeats, so relevance comes in a few tiers with long ties.
        const words = Array.from({ length: 3 + Math.floor(rnd() * 6) }, () => WORDS[Math.floor(WORDS.length * rnd() ** 2)]!);
        // Two cues at the same moment in some tracks: cue id then breaks the tie.
        const start = k === 29 ? 28 * 4000 : k * 4000 + (lang === 'fr' ? 1000 : 0);
        cues.push([start, start + 3000, `${words.join(' ')} ${rnd() < 0.5 ? 'by the path' : 'near a wall'}.`]);
      }
      await trackWithCues(ds, tour.id, cues, lang!, label!);
    }
  }
  // Pairs of words that always come together, in every mix of a fixed total: equal on paper, yet
  // InnoDB sums float terms, so some mixes score one float step apart and the server orders them
  // strictly. Each pair is in a different number of tours, so each has its own weight.
  for (const [p, [a, b]] of PAIRS.entries()) {
    for (const [i, tour] of tours.slice(0, 16 - 2 * p).entries()) {
      const first = 1 + (i % 9);
      await trackWithCues(ds, tour.id, [[500_000 + p * 10_000, 503_000 + p * 10_000, `${`${a} `.repeat(first)}${`${b} `.repeat(10 - first)}together.`]], `x${p}`, `Pair ${p}`);
    }
  }
});
afterAll(async () => server.close());

/** Every hit sorted by the server, as the lookup used to ask for it. */
async function serverOrder(against: string, limit: number, extra: CueCondition = NONE): Promise<number[]> {
  const rows = (await server.dataSource.query(
    `SELECT c.id AS id, MATCH(c.text) AGAINST (? IN BOOLEAN MODE) AS score, COALESCE(t.filmed_on, DATE(t.published_at)) AS tourDate
     FROM cues c JOIN caption_tracks ct ON ct.id = c.track_id JOIN tours t ON t.id = ct.tour_id
     WHERE MATCH(c.text) AGAINST (? IN BOOLEAN MODE) AND t.state = 'published'${extra.sql ? ` AND ${extra.sql}` : ''}
     ORDER BY score DESC, tourDate DESC, t.id DESC, c.start_ms ASC, c.id ASC LIMIT ${limit}`,
    [against, against, ...extra.params],
  )) as { id: number | string }[];
  return rows.map((r) => Number(r.id));
}

function addStats(into: RankStats, from: RankStats): void {
  for (const k of Object.keys(into) as (keyof RankStats)[]) into[k] += from[k];
}
const zero = (): RankStats => ({ fromWindow: 0, reread: 0, newestToursFirst: 0, toursReadEarly: 0, changedMidLookup: 0, sortedAll: 0 });

/** Runs each query at each limit twice (the second sized by the first) against the server's order. */
async function compareAll(windows: number[], queries: string[][], limits: number[], extra = NONE, ds?: () => DataSource): Promise<{ compared: number; stats: RankStats }> {
  let compared = 0;
  const stats = zero();
  for (const window of windows) {
    const captions = new CaptionSearch(ds ? ds() : server.dataSource, window);
    for (const query of queries) {
      const against = booleanAllPrefix(query);
      for (const limit of limits.flatMap((l) => [l, l])) {
        const got = await captions.ranked(against, extra, limit);
        const want = await serverOrder(against, limit, extra);
        expect(want.length, `${query.join(' ')} has hits`).toBeGreaterThan(0);
        expect(got.map((h) => h.cueId), `${query.join(' ')}, limit ${limit}, window ${window}`).toEqual(want);
        compared++;
      }
    }
    addStats(stats, captions.rankStats);
  }
  return { compared, stats };
}

describe('ranked caption lookups', () => {
  it('give the same cues in the same order as ORDER BY over every hit, whichever way they settle', async () => {
    const { compared, stats } = await compareAll([3, 8, 25, 60, 400], [['maple'], ['lantern'], ['heron'], ['maple', 'moss'], ['gate'], ['pond', 'bark']], [1, 2, 5, 17, 40]);
    expect(compared).toBe(300);
    // Every way was taken, so each was checked against the server.
    expect(stats.fromWindow).toBeGreaterThan(20);
    expect(stats.reread).toBeGreaterThan(0);
    expect(stats.newestToursFirst).toBeGreaterThan(10);
    expect(stats.toursReadEarly).toBeGreaterThan(0);
    expect(stats.sortedAll).toBeGreaterThan(0);
    expect(stats.changedMidLookup).toBe(0);
  });

  it('keeps scores one float step apart in order (words that always come together)', async () => {
    const split: string[][] = [];
    for (const pair of PAIRS) {
      const against = booleanAllPrefix(pair);
      const [{ n }] = await server.dataSource.query(`SELECT COUNT(DISTINCT MATCH(text) AGAINST (? IN BOOLEAN MODE)) AS n FROM cues WHERE MATCH(text) AGAINST (? IN BOOLEAN MODE)`, [against, against]);
      if (Number(n) > 1) split.push(pair);
    }
    // The premise: for some pairs, mixes that are equal on paper do not all score alike.
    expect(split.length).toBeGreaterThan(0);
    const { compared } = await compareAll([2, 3, 5], split, [1, 2, 3, 6]);
    expect(compared).toBe(24 * split.length);
  });

  it('counts words as the server’s full-text index finds them: cues holding each, and cues saying it twice or more', async () => {
    const ds = server.dataSource;
    const [{ n }] = await ds.query('SELECT COUNT(*) AS n FROM cues');
    const cues = Number(n);
    const captions = new CaptionSearch(ds);
    captions.terms.estimate(['maple'], cues);
    await captions.terms.settled();
    for (const word of ['maple', 'lantern', 'heron', 'moss', 'yew', 'together']) {
      const against = booleanAllPrefix([word]);
      // The reference is InnoDB: its hit count, and how many hits score above the lowest score
      // (boolean mode scores a cue by how often it says the word, so those say it twice or more).
      const [row] = await ds.query(
        `SELECT COUNT(*) AS hits, SUM(score > lowest) AS above FROM
           (SELECT MATCH(text) AGAINST (? IN BOOLEAN MODE) AS score FROM cues WHERE MATCH(text) AGAINST (? IN BOOLEAN MODE)) s,
           (SELECT MIN(MATCH(text) AGAINST (? IN BOOLEAN MODE)) AS lowest FROM cues WHERE MATCH(text) AGAINST (? IN BOOLEAN MODE)) m`,
        [against, against, against, against],
      );
      const est = captions.terms.estimate([word], cues)!;
      expect(Number(row.hits), word).toBeGreaterThan(0);
      expect(Math.round(est.share * cues), `${word}: cues holding it`).toBe(Number(row.hits));
      expect(Math.round(est.atLeast![1]! * cues), `${word}: cues saying it twice or more`).toBe(Number(row.above));
    }
    // Two words are taken as independent: the product of their shares.
    const both = captions.terms.estimate(['maple', 'moss'], cues)!;
    expect(both.share).toBeCloseTo(captions.terms.estimate(['maple'], cues)!.share * captions.terms.estimate(['moss'], cues)!.share, 12);
    expect(both.atLeast).toBeNull();
  });

  it('sized by word counts before a first lookup (no hint yet), still answers like ORDER BY', async () => {
    const [{ n }] = await server.dataSource.query('SELECT COUNT(*) AS n FROM cues');
    const cues = Number(n);
    const stats = zero();
    let compared = 0;
    let sized = 0;
    for (const window of [3, 8, 25]) {
      for (const limit of [2, 5, 17, 40]) {
        // A fresh lookup object per limit: every query below is its first, so only the counts size it.
        const captions = new CaptionSearch(server.dataSource, window);
        captions.terms.estimate(['maple'], cues);
        await captions.terms.settled();
        for (const query of [['maple'], ['lantern'], ['heron'], ['moss'], ['maple', 'moss']]) {
          const expect_ = captions.terms.estimate(query, cues);
          expect(expect_, 'counted').not.toBeNull();
          if (firstReads(expect_!, limit, cues, window)) sized++;
          const got = await captions.ranked(booleanAllPrefix(query), NONE, limit, expect_);
          expect(got.map((h) => h.cueId), `${query.join(' ')}, limit ${limit}, window ${window}`).toEqual(await serverOrder(booleanAllPrefix(query), limit));
          compared++;
        }
        addStats(stats, captions.rankStats);
      }
    }
    expect(compared).toBe(60);
    // The counts changed how many of these lookups read: early tour reads and longer first windows.
    expect(sized).toBeGreaterThan(20);
    expect(stats.toursReadEarly).toBeGreaterThan(0);
    expect(stats.changedMidLookup).toBe(0);
  });

  it('applies the fallback words (stopwords) in every way of answering', async () => {
    const extra = fallbackWhere(['the']);
    const { compared, stats } = await compareAll([3, 8, 25], [['maple'], ['heron'], ['pond', 'bark']], [1, 4, 17], extra);
    expect(compared).toBe(54);
    expect(stats.newestToursFirst).toBeGreaterThan(0);
    expect(stats.fromWindow).toBeGreaterThan(0);
  });

  it('gives up on the cheap ways when captions are saved between its statements, and still answers like ORDER BY', async () => {
    // After each lookup's first statement, another caption line is saved (to a draft): InnoDB's
    // weights count the documents, so every score moves a little.
    let armed = false;
    let saved = 0;
    const real = server.dataSource;
    const moving = {
      query: async (sql: string, params?: unknown[]) => {
        const rows = await real.query(sql, params);
        if (armed && /LIMIT \d+\s*$/.test(sql) && sql.includes('STRAIGHT_JOIN')) {
          armed = false;
          saved++;
          const [track] = await real.query('SELECT id FROM caption_tracks WHERE tour_id = ? LIMIT 1', [draftTourId]);
          await real.query("INSERT INTO cues (track_id, seq, start_ms, end_ms, text, settings) VALUES (?, 1000 + ?, 0, 1000, 'a moss line saved meanwhile', '')", [track.id, saved]);
        }
        return rows;
      },
    } as unknown as DataSource;
    const captions = new CaptionSearch(moving, 3);
    let compared = 0;
    for (const query of [['maple'], ['lantern'], ['moss']]) {
      for (const limit of [5, 17, 17]) {
        armed = true;
        const got = await captions.ranked(booleanAllPrefix(query), NONE, limit);
        expect(got.map((h) => h.cueId), `${query.join(' ')}, limit ${limit}`).toEqual(await serverOrder(booleanAllPrefix(query), limit));
        compared++;
      }
    }
    expect(compared).toBe(9);
    expect(saved).toBe(9);
    expect(captions.rankStats.changedMidLookup).toBeGreaterThan(0);
  });

  it('answers like ORDER BY when a tour is withdrawn or published between its statements', async () => {
    const real = server.dataSource;
    // The tour changed is the one that holds the best hit, so it has hits above any cut.
    let target = 0;
    const changed = new Set<number>();
    let flip: 'ready' | 'published' | null = null;
    const flipping = {
      query: async (sql: string, params?: unknown[]) => {
        const rows = await real.query(sql, params);
        if (flip && sql.includes('STRAIGHT_JOIN') && /LIMIT \d+\s*$/.test(sql)) {
          const to = flip;
          flip = null;
          await real.query('UPDATE tours SET state = ? WHERE id = ?', [to, target]);
        }
        return rows;
      },
    } as unknown as DataSource;
    try {
      const captions = new CaptionSearch(flipping, 3);
      let compared = 0;
      let mattered = 0;
      for (const word of ['maple', 'lantern', 'moss', 'heron']) {
        const [best] = await real.query(
          `SELECT ct.tour_id AS tourId FROM cues c JOIN caption_tracks ct ON ct.id = c.track_id WHERE c.id = ?`,
          [(await serverOrder(booleanAllPrefix([word]), 1))[0]],
        );
        target = Number(best.tourId);
        changed.add(target);
        for (const [limit, to] of [[5, 'ready'], [17, 'published'], [17, 'ready'], [40, 'published']] as const) {
          // A lookup answers as of one of its statements: before the change or after it, never a mix.
          const before = await serverOrder(booleanAllPrefix([word]), limit);
          flip = to;
          const got = (await captions.ranked(booleanAllPrefix([word]), NONE, limit)).map((h) => h.cueId);
          expect(flip, 'the tour changed during the lookup').toBeNull();
          const after = await serverOrder(booleanAllPrefix([word]), limit);
          if (JSON.stringify(before) !== JSON.stringify(after)) mattered++;
          expect([before, after], `${word}, limit ${limit}, tour now ${to}`).toContainEqual(got);
          compared++;
        }
      }
      expect(compared).toBe(16);
      // The change mattered to most of these answers, and the cheap ways noticed it.
      expect(mattered).toBeGreaterThan(8);
      expect(captions.rankStats.changedMidLookup).toBeGreaterThan(0);
    } finally {
      for (const id of changed) await real.query(`UPDATE tours SET state = 'published' WHERE id = ?`, [id]);
    }
  });

  it('keeps the track list between lookups and notices a tour published since, at its first read', async () => {
    const real = server.dataSource;
    let listReads = 0;
    const counting = {
      query: async (sql: string, params?: unknown[]) => {
        if (sql.includes('ORDER BY tourDate DESC, t.id DESC, ct.id ASC')) listReads++;
        return real.query(sql, params);
      },
    } as unknown as DataSource;
    const captions = new CaptionSearch(counting, 3);
    // Each lookup is its words' first (no hint lets the window settle it), so each finishes a tie
    // from the newest tours; "mapl", "maple" and "map" find the same cues.
    const check = async (prefix: string) => {
      const against = booleanAllPrefix([prefix]);
      expect((await captions.ranked(against, NONE, 17)).map((h) => h.cueId), prefix).toEqual(await serverOrder(against, 17));
    };
    try {
      await check('mapl');
      await check('moss');
      expect(captions.rankStats.newestToursFirst).toBe(2);
      expect(listReads).toBe(1);
      // The draft walk is filmed last: once published, its cues lead the tie.
      await real.query(`UPDATE tours SET state = 'published', published_at = NOW() WHERE id = ?`, [draftTourId]);
      const after = await serverOrder(booleanAllPrefix(['maple']), 17);
      const [{ n }] = await real.query(`SELECT COUNT(*) AS n FROM cues c JOIN caption_tracks ct ON ct.id = c.track_id WHERE ct.tour_id = ? AND c.id IN (${after.join(', ')})`, [draftTourId]);
      expect(Number(n), 'the new tour changes the answer').toBeGreaterThan(0);
      await check('maple');
      expect(captions.rankStats.changedMidLookup).toBe(1);
      // Read again once, then kept.
      await check('map');
      await check('pond');
      expect(listReads).toBe(2);
      expect(captions.rankStats.newestToursFirst).toBe(4);
      expect(captions.rankStats.changedMidLookup).toBe(1);
    } finally {
      await real.query(`UPDATE tours SET state = 'ready', published_at = NULL WHERE id = ?`, [draftTourId]);
    }
  });

  it('never shows a cue of a tour that is not published, also when a long tie is finished from the newest tours', async () => {
    const published = new Set(((await server.dataSource.query(`SELECT id FROM tours WHERE state = 'published'`)) as { id: number }[]).map((r) => Number(r.id)));
    expect(published.size).toBe(14);
    const stats = zero();
    for (const window of [3, 8]) {
      const captions = new CaptionSearch(server.dataSource, window);
      for (const word of ['maple', 'lantern', 'heron', 'moss']) {
        for (const limit of [2, 5, 5, 17, 17, 1000]) {
          const hits = await captions.ranked(booleanAllPrefix([word]), NONE, limit);
          expect(hits.length).toBeGreaterThan(0);
          expect(hits.every((h) => published.has(h.tourId))).toBe(true);
        }
      }
      addStats(stats, captions.rankStats);
    }
    expect(stats.newestToursFirst).toBeGreaterThan(0);
    // The drafts do hold the words and are filmed last, so the check above could fail.
    const [{ n }] = await server.dataSource.query(
      `SELECT COUNT(*) AS n FROM cues c JOIN caption_tracks ct ON ct.id = c.track_id JOIN tours t ON t.id = ct.tour_id
       WHERE MATCH(c.text) AGAINST ('+maple*' IN BOOLEAN MODE) AND t.state <> 'published'`,
    );
    expect(Number(n)).toBeGreaterThan(10);
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
    expect(windowOutcome(three.slice(0, 2), 2, 3)).toBe('every-hit'); // fewer than the window
    expect(windowOutcome(three, 2, 3)).toBe('settled'); // 1 < 2: nothing unread can reach the cut
  });

  it('sees a tie running past the window, compares exactly, and distrusts a window whose scores rise', () => {
    expect(windowOutcome([hit(1, 3), hit(2, 2), hit(3, 2)], 2, 3)).toBe('tie-runs-on'); // an unread hit may tie at 2
    // One float step apart is not a tie: the server orders them strictly.
    expect(windowOutcome([hit(1, 9.835118293762209), hit(2, 9.83511734008789), hit(3, 9.83511734008789)], 1, 3)).toBe('settled');
    expect(windowOutcome([hit(1, 1), hit(2, 3), hit(3, 0.5)], 2, 3)).toBe('unordered'); // not the index's order
  });

  it('sorts like ORDER BY: relevance, newer tour, tour id, time, cue id', () => {
    const a = { ...hit(1, 1), tourDate: '2024-01-01', tourId: 2 };
    const b = { ...hit(2, 1), tourDate: '2025-01-01', tourId: 1 };
    const c = { ...hit(3, 1), tourDate: '2025-01-01', tourId: 3 };
    const d = { ...hit(4, 2), tourDate: '2020-01-01', tourId: 9 };
    expect([a, b, c, d].sort(compareHits).map((h) => h.cueId)).toEqual([4, 3, 2, 1]);
  });
});
