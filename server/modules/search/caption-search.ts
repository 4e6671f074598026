import type { DataSource } from 'typeorm';
import { cuePlainText } from '../../../shared/captions/cue-text';
import { findNames, type NameIndex } from '../../../shared/names/matcher';
import { normalizeName } from '../../../shared/names/normalize';
import { markWords, mergeSpans, type TextSpan } from '../../../shared/search/text-fold';
import { likeContains } from '../../db/like';
import {
  INNODB_FT_DEFAULTS,
  booleanAllPrefix,
  booleanAnyGroup,
  markPlan,
  planWords,
  regExpUsable,
  wholeWordRegExp,
  type FulltextLimits,
  type WordPlan,
} from './fulltext';
import { TermShares, type TermEstimate } from './term-shares';

/** Most caption hits ranked per kind of lookup; the rest are counted as "more" (see `capped`). */
export const MOMENT_CAP = 200;

/**
 * Full-text hits a ranked lookup first reads in the index's relevance order (see
 * `CaptionSearch.ranked`), unless an earlier search with the same words showed how far it needs to
 * read. Each hit read costs a row lookup (about 2–5 µs on the benchmark machine).
 */
export const RANK_WINDOW = 400;
/** Furthest a second read of the stream goes to get past a tie (beyond it, other ways are cheaper). */
const RANK_WINDOW_MAX = 5000;
/** Lookups whose reads are remembered (oldest forgotten first). */
const WINDOW_HINTS_MAX = 2000;
/** Most cues a remembered tour read starts with. */
const WALK_HINT_MAX = 20_000;

/** A cue of a published tour that a search found. */
export interface CueHit {
  cueId: number;
  trackId: number;
  tourId: number;
  lang: string;
  startMs: number;
  endMs: number;
  /** The cue text, once loaded (ranking never needs it; see `loadCueTexts`). */
  rawText: string | null;
  score: number;
  tourDate: string | null;
  nameHit: boolean;
  cultivarIds: number[];
  /** Spans in the plain text, when already known (name hits). */
  nameSpans: TextSpan[];
}

/** The spellings of one record a name search looks for in captions. */
export interface NameTarget {
  id: number;
  spellings: string[];
}

interface Row {
  cueId: number | string;
  trackId: number | string;
  tourId: number | string;
  lang: string;
  startMs: number | string;
  endMs: number | string;
  score: number | string | null;
  tourDate: string | Date | null;
}

// Only published tours: drafts and private tours never reach search, whoever asks. The text is left
// out of ranked queries: a TEXT column would push the sort into an on-disk temporary table.
/** The date tours are ordered by: when filmed, else when published (as `tourDate` in tour-search.ts). */
const TOUR_DATE = 'COALESCE(t.filmed_on, DATE(t.published_at))';
const SELECT = `SELECT c.id AS cueId, c.track_id AS trackId, ct.tour_id AS tourId, ct.lang AS lang, c.start_ms AS startMs,
       c.end_ms AS endMs, %SCORE% AS score, ${TOUR_DATE} AS tourDate`;
const ORDER = `ORDER BY score DESC, tourDate DESC, t.id DESC, c.start_ms ASC, c.id ASC`;
/** InnoDB's boolean-mode relevance of a cue for the search's terms (the first `?`). */
const MATCH_SCORE = 'MATCH(c.text) AGAINST (? IN BOOLEAN MODE)';
/**
 * Cues with their track and tour, joined by primary key. Put after `SELECT STRAIGHT_JOIN`, the
 * cues are read first: left to itself the optimizer may start from every published tour.
 */
const CUES_TRACKS_TOURS = `FROM cues c
       JOIN caption_tracks ct FORCE INDEX (PRIMARY) ON ct.id = c.track_id
       JOIN tours t FORCE INDEX (PRIMARY) ON t.id = ct.tour_id`;

/** A condition on cues with its parameters (see `fallbackWhere`). */
export interface CueCondition {
  sql: string;
  params: string[];
}

const NO_CONDITION: CueCondition = { sql: '', params: [] };

/** ` AND <condition>`, or nothing for an empty one. */
function andAlso(extra: CueCondition): string {
  return extra.sql ? ` AND ${extra.sql}` : '';
}

/** How far a lookup reads: the first window of the stream, and the newest tours' cues read beside it. */
interface ReadHint {
  window: number;
  walk?: number;
}

/**
 * The first reads of a lookup with no hint yet, from how common its words are. Boolean mode scores
 * a cue by how often it says the word, so the cut falls in the lowest tier (cues saying it at least
 * k times) that still holds `limit` cues. Above the bottom tier, relevance order gives that tier
 * first: the window reads just past it, at once. In the bottom tier (cues that say it once), a tie
 * longer than the window is finished from the newest tours, so they are read beside it, about as
 * far as holds the rest of the answer (several words count as one tier). Rare words keep the plain
 * window.
 */
export function firstReads(expect: TermEstimate, limit: number, cues: number, window: number): ReadHint | undefined {
  if (expect.share * cues <= 2 * window) return undefined;
  const tiers = (expect.atLeast ?? [expect.share]).map((s) => s * cues);
  let k = tiers.length - 1;
  while (k > 0 && tiers[k]! < limit) k--;
  if (k > 0) {
    const through = Math.ceil(tiers[k]! * 1.15) + 50;
    return through > window ? { window: through } : undefined;
  }
  const above = tiers[1] ?? 0;
  const onceShare = (tiers[0]! - above) / cues;
  // Fewer of the cues above the tie may be in published tours than counted: never plan for under a quarter of the answer.
  const need = Math.max(limit - above * 0.8, limit / 4);
  return onceShare > 0 ? { window, walk: Math.min(WALK_HINT_MAX, Math.ceil((need / onceShare) * 1.25)) } : undefined;
}

/** How ranked lookups were answered (see `CaptionSearch.ranked`). */
export interface RankStats {
  /** From the first hits in the index's relevance order alone (after a second, longer read in `reread` of them). */
  fromWindow: number;
  reread: number;
  /** A long tie at the cut finished by reading the newest tours' cues first. */
  newestToursFirst: number;
  /** Of those, how many used tours read beside the window (sized by an earlier lookup of the same words). */
  toursReadEarly: number;
  /**
   * Times captions or tours changed between two statements of a lookup, or tours since the track
   * list kept from an earlier lookup was read, so every hit was sorted instead.
   */
  changedMidLookup: number;
  /** By sorting every hit. */
  sortedAll: number;
}

/** A published caption track in the order ORDER ranks its tour. */
interface TrackInOrder {
  trackId: number;
  tourId: number;
  lang: string;
  tourDate: string | null;
}

function dateString(d: string | Date | null): string | null {
  if (d == null) return null;
  return d instanceof Date ? d.toISOString().slice(0, 10) : String(d).slice(0, 10);
}

/**
 * A checksum of everything the published-tracks list holds (each published tour's id and dates,
 * its tracks and their languages), as a scalar subquery the server works out once per statement.
 * A statement that returns it shows whether a list read earlier still holds.
 */
const TRACK_LIST_SUM = `(SELECT CONCAT(COUNT(*), ':', COALESCE(SUM(CRC32(CONCAT_WS('|', lt.id, IFNULL(lt.filmed_on, '-'), IFNULL(lt.published_at, '-'), lc.id, lc.lang))), 0))
       FROM tours lt JOIN caption_tracks lc ON lc.tour_id = lt.id WHERE lt.state = 'published')`;

/** The caption tracks of published tours in the order ORDER ranks their tours, with the checksum the same statement gave. */
interface TrackList {
  tracks: TrackInOrder[];
  sum: string;
}

/** Hits read from whole tours, newest first: up to track index `next` (exclusive), about `cues` cues read. */
interface ToursRead {
  hits: CueHit[];
  next: number;
  cues: number;
  /** Scores the same statement gave the probe cues (see `readTours`), by cue id. */
  probes: Map<number, number>;
  /** The track-list checksum as of this read (null when it returned no row). */
  listSum: string | null;
}

/** A cue row as the tour reads return it, before its track is known. */
interface CueRow {
  cueId: number | string;
  trackId: number | string;
  startMs: number | string;
  endMs: number | string;
  score: number | string | null;
}

/** A hit from a cue row and the track it belongs to (as the row says, or as the track list says). */
function hitOf(r: CueRow, track: Omit<TrackInOrder, 'trackId'>): CueHit {
  return {
    cueId: Number(r.cueId),
    trackId: Number(r.trackId),
    tourId: track.tourId,
    lang: track.lang,
    startMs: Number(r.startMs),
    endMs: Number(r.endMs),
    rawText: null,
    score: Number(r.score ?? 0),
    tourDate: track.tourDate,
    nameHit: false,
    cultivarIds: [],
    nameSpans: [],
  };
}

function toHit(r: Row): CueHit {
  return hitOf(r, { tourId: Number(r.tourId), lang: r.lang, tourDate: dateString(r.tourDate) });
}

/** The order of ORDER in JavaScript (scores compared exactly, as the server compares them). */
export function compareHits(a: CueHit, b: CueHit): number {
  return (
    b.score - a.score ||
    compareDesc(a.tourDate, b.tourDate) ||
    b.tourId - a.tourId ||
    a.startMs - b.startMs ||
    a.cueId - b.cueId
  );
}

/** Descending, with null last (as ORDER BY … DESC puts NULL). */
function compareDesc(a: string | null, b: string | null): number {
  if (a === b) return 0;
  if (a === null) return 1;
  if (b === null) return -1;
  return a < b ? 1 : -1;
}

/** What the first `window` hits, read in the index's order, say about the full ranking. */
export type WindowOutcome =
  /** Fewer than `window` were read: they are every hit. */
  | 'every-hit'
  /** Scores never rise and the last one read is below the `limit`-th: nothing unread can reach the answer. */
  | 'settled'
  /** As settled, except that the `limit`-th ties with the last one read: unread hits may share its score. */
  | 'tie-runs-on'
  /** Scores rise somewhere (not the index's relevance order), or the window is no longer than the cut: nothing is concluded from it. */
  | 'unordered';

/**
 * Reads a window of hits taken with `LIMIT window` (window > limit) in the index's order. The
 * relevance order is checked, not assumed; scores are compared exactly, as the server compares
 * them (InnoDB sums float terms, so two mixes of words can score one float step apart).
 */
export function windowOutcome(hits: readonly { score: number }[], limit: number, window: number): WindowOutcome {
  if (hits.length < window) return 'every-hit';
  // A window no longer than the cut says nothing about it.
  if (hits.length <= limit) return 'unordered';
  for (let i = 1; i < hits.length; i++) if (hits[i]!.score > hits[i - 1]!.score) return 'unordered';
  return hits[hits.length - 1]!.score < hits[limit - 1]!.score ? 'settled' : 'tie-runs-on';
}

/**
 * A search with no indexed word reads every cue of the published tours. Reading the cues table
 * straight through and joining each row's track and tour by primary key (STRAIGHT_JOIN) measured
 * about twice as fast as walking tours → tracks → cues through the (track_id, start_ms) index,
 * whose random row lookups cost more than the scan saves (bench/search.bench.ts corpus).
 */
function fallbackOnlySql(where: string, limit: number): string {
  return `${SELECT.replace('SELECT', 'SELECT STRAIGHT_JOIN').replace('%SCORE%', '0')}
         ${CUES_TRACKS_TOURS}
         WHERE t.state = 'published' AND ${where}
         ${ORDER} LIMIT ${limit}`;
}

/** Whole-word conditions for words the FULLTEXT index does not hold. */
export function fallbackWhere(words: readonly string[]): CueCondition {
  const parts: string[] = [];
  const params: string[] = [];
  for (const w of words) {
    // LIKE (accent- and case-blind per the collation) narrows; REGEXP insists on a whole word.
    parts.push('c.text LIKE ?');
    params.push(likeContains(w));
    if (regExpUsable(w)) {
      parts.push('c.text REGEXP ?');
      params.push(wholeWordRegExp(w));
    }
  }
  return { sql: parts.join(' AND '), params };
}

/**
 * Caption search over published tours. Words the FULLTEXT index holds go through MATCH … AGAINST
 * in boolean mode (every word required, the last also as a prefix); shorter words and stopwords are
 * matched as whole words with LIKE and REGEXP, either on the full-text hits or, when the search has
 * no indexed word, on every cue of the published tours. A second lookup finds cues that say a
 * cultivar the search matched by name, in any recorded spelling, and keeps those where the name
 * matcher really hears that record.
 */
export class CaptionSearch {
  private limits: FulltextLimits | null = null;
  /** Counts of how ranked lookups were answered since this object was made (the benchmark prints them). */
  readonly rankStats: RankStats = { fromWindow: 0, reread: 0, newestToursFirst: 0, toursReadEarly: 0, changedMidLookup: 0, sortedAll: 0 };
  private cueStats: { cuesPerTrack: number; cues: number; at: number } | null = null;
  /** The published-tracks list, kept between lookups: every tour read checks it still holds (see TRACK_LIST_SUM). */
  private trackList: Promise<TrackList> | null = null;
  /** How far each recent lookup needed to read: the stream, and the newest tours' cues (sizing only). */
  private readonly hints = new Map<string, ReadHint>();
  /** How common each word is in the cues, counted in the background (sizes a lookup with no hint yet). */
  readonly terms: TermShares;

  constructor(
    private readonly dataSource: DataSource,
    private readonly window = RANK_WINDOW,
  ) {
    this.terms = new TermShares(dataSource);
  }

  /** The server's FULLTEXT word-length limits, read once (they only change with a restart). */
  async fulltextLimits(): Promise<FulltextLimits> {
    if (!this.limits) {
      try {
        const [row] = (await this.dataSource.query('SELECT @@innodb_ft_min_token_size AS minToken, @@innodb_ft_max_token_size AS maxToken')) as {
          minToken: number | string;
          maxToken: number | string;
        }[];
        this.limits = { minToken: Number(row!.minToken), maxToken: Number(row!.maxToken) };
      } catch {
        this.limits = { ...INNODB_FT_DEFAULTS };
      }
    }
    return this.limits;
  }

  /** Splits folded words for this server. */
  async plan(words: readonly string[]): Promise<WordPlan> {
    return planWords(words, await this.fulltextLimits());
  }

  /**
   * The first `limit` cues of published tours that match the boolean-mode `against` (and the
   * `extra` conditions), in ORDER: relevance, then newer tour, then time in the tour. Every way
   * below gives exactly what ORDER BY over all hits gives; they differ only in what they read.
   *
   * Sorting every hit costs a row lookup per hit (about 2–5 µs here), which for a word said in a
   * tenth of all cues is most of a search's time. InnoDB hands full-text hits over in relevance
   * order, so the first `window` of them are read without ORDER BY (cues first, their track and
   * tour joined by primary key, published tours only). When their scores never rise and the last
   * one read scores below the `limit`-th, every hit that can be in the answer has been read
   * (scores compared exactly, as the server compares them). When instead a tie at the cut runs past the window (many cues that say the word once),
   * every hit above the tie has been read, and the rest of the answer is the tie's hits in the
   * newest tours. A short tie (a frequent word said twice in a thousand cues) is cheaper to read
   * to its end in a second, longer window; a long one (a word said once in thousands of cues) is
   * completed by reading whole tours, newest first, until enough of the tie is found
   * (`newestToursFirst`). Only when neither looks cheaper than sorting every hit, or the window is
   * not in relevance order, or captions were saved between its statements (which moves every
   * score), is every hit sorted by the server. How far each lookup had to read is
   * remembered per words and sizes the next one (and starts its tour reads beside the window);
   * hints change only what is read, never the answer.
   */
  async ranked(against: string, extra: CueCondition, limit: number, expect: TermEstimate | null = null): Promise<CueHit[]> {
    if (limit < 1) return [];
    const key = [against, extra.sql, ...extra.params].join('\u0000');
    const hint = this.hints.get(key) ?? (expect ? firstReads(expect, limit, (await this.cueCounts()).cues, this.window) : undefined);
    let tracksRead: Promise<TrackList> | null = null;
    const tracks = () => (tracksRead ??= this.publishedTracks());
    // When this lookup last had to read the newest tours (or the word counts say it will), start
    // reading them now, beside the window (two cores do both at once); it counts only if its
    // scores agree with the window's.
    const earlyRead = hint?.walk ? tracks().then((list) => this.readTours(against, extra, list.tracks, 0, hint.walk!, [])) : null;
    earlyRead?.catch(() => undefined); // awaited below; this only keeps an early failure from going unhandled
    let window = Math.max(limit + 1, Math.min(RANK_WINDOW_MAX, hint?.window ?? this.window));
    for (let attempt = 0; attempt < 2; attempt++) {
      // An early read may have been taken before this statement: the window then also says, in the
      // same statement, which track list it saw, so the two are known to see the same tours.
      const rows = (await this.dataSource.query(
        `${SELECT.replace('SELECT', 'SELECT STRAIGHT_JOIN').replace('%SCORE%', MATCH_SCORE)}${earlyRead ? `, ${TRACK_LIST_SUM} AS listSum` : ''}
         ${CUES_TRACKS_TOURS}
         WHERE ${MATCH_SCORE} AND t.state = 'published'${andAlso(extra)}
         LIMIT ${window}`,
        [against, against, ...extra.params],
      )) as (Row & { listSum?: string })[];
      const hits = rows.map(toHit);
      const windowSum = rows[0]?.listSum ?? null;
      const outcome = windowOutcome(hits, limit, window);
      if (outcome === 'every-hit' || outcome === 'settled') {
        if (outcome === 'settled') {
          // Next time, read about as far as this lookup needed: to the first hit below the cut.
          const cut = hits[limit - 1]!.score;
          this.hint(key, { window: hits.findIndex((h) => h.score < cut) + 1 });
        }
        this.rankStats.fromWindow++;
        return hits.sort(compareHits).slice(0, limit);
      }
      if (outcome === 'unordered') break;

      const cut = hits[limit - 1]!.score;
      const above = hits.filter((h) => h.score > cut);
      const tie = hits.filter((h) => h.score === cut);
      // How common the tie is: its hits came in cue order (the index's order within a tie), so
      // they and the cue ids they span give its share of all cues.
      const ids = tie.map((h) => h.cueId);
      const share = tie.length / (Math.max(...ids) - Math.min(...ids) + 1);
      const tieStart = hits.indexOf(tie[0]!);
      const { cues } = await this.cueCounts();
      // Costs counted in cue reads: a full-text fetch costs about 2.5 reads of a cue in track order.
      const rereadTo = Math.ceil((tieStart + share * cues) * 1.25) + 50;
      const walkCues = (limit - above.length) / share;
      if (attempt === 0 && rereadTo > window && rereadTo * 2.5 < walkCues && rereadTo <= RANK_WINDOW_MAX) {
        // A short tie (a frequent word said twice in a thousand cues): read the stream past its end.
        window = rereadTo;
        this.rankStats.reread++;
        continue;
      }
      // Sorting every hit fetches at least the tie's hits.
      if (walkCues > 2.5 * share * cues) break;
      const early = earlyRead ? await earlyRead : null;
      const answer = await this.tieNewestToursFirst(against, extra, { cut, above, tie, need: limit - above.length, walkCues, windowSum }, await tracks(), early);
      if (!answer) break;
      // Next time: the window up to the tie and a little of it, and the newest tours read at once.
      this.hint(key, { window: Math.max(tieStart + 100, limit + 30), walk: Math.ceil(walkCues * 1.3) });
      this.rankStats.newestToursFirst++;
      return answer.sort(compareHits).slice(0, limit);
    }
    this.rankStats.sortedAll++;
    return (
      (await this.dataSource.query(
        `${SELECT.replace('%SCORE%', MATCH_SCORE)}
         ${CUES_TRACKS_TOURS}
         WHERE ${MATCH_SCORE} AND t.state = 'published'${andAlso(extra)}
         ${ORDER} LIMIT ${limit}`,
        [against, against, ...extra.params],
      )) as Row[]
    ).map(toHit);
  }

  /** Remembers how far a lookup needed to read (sizing hints only: answers never depend on them). */
  private hint(key: string, seen: ReadHint): void {
    this.hints.delete(key);
    this.hints.set(key, {
      window: Math.min(RANK_WINDOW_MAX, Math.ceil(seen.window * 1.15) + 10),
      walk: seen.walk === undefined ? undefined : Math.min(WALK_HINT_MAX, seen.walk),
    });
    if (this.hints.size > WINDOW_HINTS_MAX) this.hints.delete(this.hints.keys().next().value!);
  }

  /** The caption tracks of published tours, in the order ORDER ranks their tours: as last read, else read now. */
  private publishedTracks(): Promise<TrackList> {
    if (!this.trackList) {
      const reading = this.readTrackList();
      this.trackList = reading;
      reading.catch(() => {
        if (this.trackList === reading) this.trackList = null;
      });
    }
    return this.trackList;
  }

  private async readTrackList(): Promise<TrackList> {
    const rows = (await this.dataSource.query(
      `SELECT ct.id AS trackId, ct.tour_id AS tourId, ct.lang AS lang, ${TOUR_DATE} AS tourDate, ${TRACK_LIST_SUM} AS listSum
       FROM tours t JOIN caption_tracks ct ON ct.tour_id = t.id
       WHERE t.state = 'published'
       ORDER BY tourDate DESC, t.id DESC, ct.id ASC`,
    )) as { trackId: number | string; tourId: number | string; lang: string; tourDate: string | Date | null; listSum: string }[];
    return {
      tracks: rows.map((r) => ({ trackId: Number(r.trackId), tourId: Number(r.tourId), lang: r.lang, tourDate: dateString(r.tourDate) })),
      sum: rows[0]?.listSum ?? '',
    };
  }

  /**
   * Finishes a ranking whose cut falls in a tie that runs past the window: the hits above the tie
   * (all read already), then the tie's hits in ORDER's other keys (newer tour, tour id, time, cue
   * id), found by reading whole tours newest first. Tours not read all rank after those read, so
   * once enough of the tie is found the answer is exact.
   *
   * The window and these reads are separate statements. A caption saved in between moves every
   * score (InnoDB's weights count the documents), and a tour published or withdrawn changes which
   * hits count. So each read also returns, in the same statement, the hits above the cut and the
   * ends of the tie as the window scored them (probes), and the checksum of the track list (which
   * is kept between lookups). A probe missing or scored differently, a hit above the cut the window
   * did not see, a window hit whose track is not listed, or a list that no longer holds gives up:
   * null, and the caller sorts every hit in one statement. Null too when the reads grow far past
   * the estimate. The candidates are returned unsorted.
   */
  private async tieNewestToursFirst(
    against: string,
    extra: CueCondition,
    t: { cut: number; above: readonly CueHit[]; tie: readonly CueHit[]; need: number; walkCues: number; windowSum: string | null },
    list: TrackList,
    early: ToursRead | null,
  ): Promise<CueHit[] | null> {
    const { tracks } = list;
    const seen = new Map([...t.above, ...t.tie].map((h) => [h.cueId, h.score]));
    // A tour published or withdrawn since the window changes no score: every hit above the cut
    // and the first of the tie are probed, and every hit the window read must be in `tracks`.
    const listed = new Set(tracks.map((k) => k.trackId));
    if (![...t.above, ...t.tie].every((h) => listed.has(h.trackId))) return this.moved();
    const probes = [...t.above, t.tie[0]!, t.tie[t.tie.length - 1]!];
    const agrees = (read: ToursRead, probed: boolean): boolean => {
      if (read.listSum !== list.sum) return false;
      if (probed && !probes.every((p) => read.probes.get(p.cueId) === p.score)) return false;
      // Every hit the window scored must score the same here, and nothing unseen may beat the cut.
      return read.hits.every((h) => (seen.has(h.cueId) ? seen.get(h.cueId) === h.score : h.score <= t.cut));
    };
    const found: CueHit[] = [];
    let read: ToursRead = { hits: [], next: 0, cues: 0, probes: new Map(), listSum: list.sum };
    // The early read had no probes: it counts only when it holds hits the window scored too, and
    // only when the window saw the same track list (it may have been taken before the window).
    if (early && early.hits.some((h) => seen.has(h.cueId))) {
      if (t.windowSum !== list.sum || !agrees(early, false)) return this.moved();
      read = early;
      this.rankStats.toursReadEarly++;
    }
    const { cuesPerTrack } = await this.cueCounts();
    const most = 4 * t.walkCues + 4 * cuesPerTrack;
    let budget = Math.ceil(t.walkCues * 1.5);
    for (;;) {
      for (const h of read.hits) if (h.score === t.cut) found.push(h);
      if (found.length >= t.need || read.next >= tracks.length) break;
      if (read.cues > most) return null;
      read = await this.readTours(against, extra, tracks, read.next, budget, probes, read.cues);
      if (!agrees(read, true)) return this.moved();
      budget *= 2;
    }
    return [...t.above, ...found];
  }

  /** Gives up on a lookup's cheap ways; the track list is read again next time, in case it was what moved. */
  private moved(): null {
    this.rankStats.changedMidLookup++;
    this.trackList = null;
    return null;
  }

  /**
   * Every hit in whole tours of `tracks` from index `from`, about `budget` cues' worth (at least
   * one tour; a tour's tracks are read together, so every tour read is complete), each checked
   * published in the same statement. The `probes` (cues the window scored) come back in the same
   * statement too, so their scores show whether the corpus moved in between.
   */
  private async readTours(
    against: string,
    extra: CueCondition,
    tracks: readonly TrackInOrder[],
    from: number,
    budget: number,
    probes: readonly CueHit[],
    cuesBefore = 0,
  ): Promise<ToursRead> {
    const { cuesPerTrack } = await this.cueCounts();
    const chunk: TrackInOrder[] = [];
    let next = from;
    let cues = 0;
    while (next < tracks.length && (cues < budget || !chunk.length || tracks[next]!.tourId === tracks[next - 1]!.tourId)) {
      chunk.push(tracks[next]!);
      cues += cuesPerTrack;
      next++;
    }
    if (!chunk.length) return { hits: [], next, cues: cuesBefore, probes: new Map(), listSum: null };
    const byTrack = new Map(chunk.map((c) => [c.trackId, c]));
    const probeIds = [...new Set(probes.map((p) => p.cueId))];
    const probeSet = new Set(probeIds);
    const rows = (await this.dataSource.query(
      `SELECT STRAIGHT_JOIN c.id AS cueId, c.track_id AS trackId, c.start_ms AS startMs, c.end_ms AS endMs, ${MATCH_SCORE} AS score,
              ${TRACK_LIST_SUM} AS listSum
       ${CUES_TRACKS_TOURS}
       WHERE (c.track_id IN (${chunk.map(() => '?').join(', ')})${probeIds.length ? ` OR c.id IN (${probeIds.map(() => '?').join(', ')})` : ''})
         AND t.state = 'published'${andAlso(extra)}
       HAVING score > 0`,
      [against, ...chunk.map((c) => c.trackId), ...probeIds, ...extra.params],
    )) as (CueRow & { listSum: string })[];
    const hits: CueHit[] = [];
    const probeScores = new Map<number, number>();
    for (const r of rows) {
      if (probeSet.has(Number(r.cueId))) probeScores.set(Number(r.cueId), Number(r.score));
      const track = byTrack.get(Number(r.trackId));
      if (track) hits.push(hitOf(r, track));
    }
    return { hits, next, cues: cuesBefore + cues, probes: probeScores, listSum: rows[0]?.listSum ?? null };
  }

  /** About how many cues there are and per track (sizes the newest-tours-first reads; kept a minute). */
  private async cueCounts(): Promise<{ cuesPerTrack: number; cues: number }> {
    if (!this.cueStats || Date.now() - this.cueStats.at > 60_000) {
      const [row] = (await this.dataSource.query(
        `SELECT (SELECT TABLE_ROWS FROM information_schema.TABLES WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = 'cues') AS cues,
                (SELECT COUNT(*) FROM caption_tracks) AS tracks`,
      )) as { cues: number | string | null; tracks: number | string }[];
      const cues = Math.max(1, Number(row?.cues ?? 0));
      this.cueStats = { cues, cuesPerTrack: Math.max(1, cues / Math.max(1, Number(row?.tracks ?? 1))), at: Date.now() };
    }
    return this.cueStats;
  }

  /** Cues matching every word of the search: up to MOMENT_CAP + 1 rows, best first. */
  async byWords(plan: WordPlan): Promise<CueHit[]> {
    if (!plan.indexed.length && !plan.fallback.length) return [];
    const fb = fallbackWhere(plan.fallback);
    if (plan.indexed.length) {
      const expect = plan.fallback.length ? null : this.terms.estimate(plan.indexed, (await this.cueCounts()).cues);
      return this.ranked(booleanAllPrefix(plan.indexed), fb, MOMENT_CAP + 1, expect);
    }
    return ((await this.dataSource.query(fallbackOnlySql(fb.sql, MOMENT_CAP + 1), fb.params)) as Row[]).map(toHit);
  }

  /**
   * Cues of published tours where the matcher hears one of `targets` (any recorded spelling, also
   * with its words joined). Up to MOMENT_CAP + 1 confirmed hits.
   */
  async byNames(targets: readonly NameTarget[], index: NameIndex): Promise<CueHit[]> {
    if (!targets.length) return [];
    const limits = await this.fulltextLimits();
    const groups: string[][] = [];
    const shortOnly: string[][] = [];
    for (const t of targets) {
      for (const spelling of t.spellings) {
        const words = normalizeName(spelling).split(' ').filter(Boolean);
        if (!words.length) continue;
        const { indexed, fallback } = planWords(words, limits);
        if (indexed.length) groups.push(indexed);
        else shortOnly.push(fallback);
        const joined = words.join('');
        if (words.length > 1 && planWords([joined], limits).indexed.length) groups.push([joined]);
      }
    }
    const hits: CueHit[] = [];
    const seen = new Set<string>();
    const uniqueGroups = groups.filter((g) => {
      const k = g.join(' ');
      if (seen.has(k)) return false;
      seen.add(k);
      return true;
    });
    // Candidates are confirmed by the matcher below, so fetch more than will be kept.
    const fetch = (MOMENT_CAP + 1) * 2;
    if (uniqueGroups.length) hits.push(...(await this.ranked(booleanAnyGroup(uniqueGroups), NO_CONDITION, fetch)));
    for (const words of shortOnly.slice(0, 5)) {
      const fb = fallbackWhere(words);
      hits.push(...((await this.dataSource.query(fallbackOnlySql(fb.sql, fetch), fb.params)) as Row[]).map(toHit));
    }
    const wanted = new Set(targets.map((t) => t.id));
    const out: CueHit[] = [];
    const taken = new Set<number>();
    await loadCueTexts(this.dataSource, hits);
    for (const hit of hits) {
      if (taken.has(hit.cueId)) continue;
      const plain = plainCueText(hit.rawText ?? '');
      const names = findNames(index, plain).filter((m) => wanted.has(Number(m.recordId)));
      if (!names.length) continue;
      taken.add(hit.cueId);
      hit.nameHit = true;
      hit.cultivarIds = [...new Set(names.map((m) => Number(m.recordId)))];
      hit.nameSpans = names.map((m) => ({ start: m.start, end: m.end }));
      out.push(hit);
      if (out.length > MOMENT_CAP) break;
    }
    return out;
  }
}

/** What a viewer reads in a cue; most cues carry no tags or escapes, so the parser is skipped for them. */
export function plainCueText(text: string): string {
  return text.includes('<') || text.includes('&') ? cuePlainText(text) : text;
}

/** Fills in `rawText` of the hits that lack it, in one query by primary key. */
async function loadCueTexts(dataSource: DataSource, hits: readonly CueHit[]): Promise<void> {
  const missing = hits.filter((h) => h.rawText === null);
  if (!missing.length) return;
  const ids = [...new Set(missing.map((h) => h.cueId))];
  const rows = (await dataSource.query(`SELECT id, text FROM cues WHERE id IN (${ids.map(() => '?').join(', ')})`, ids)) as { id: number | string; text: string }[];
  const byId = new Map(rows.map((r) => [Number(r.id), r.text]));
  for (const h of missing) h.rawText = byId.get(h.cueId) ?? '';
}

/** Merges name hits and word hits (a cue found both ways counts once, as a name hit), ranked. */
export function rankMoments(nameHits: readonly CueHit[], wordHits: readonly CueHit[]): CueHit[] {
  const byCue = new Map<number, CueHit>();
  for (const h of nameHits) byCue.set(h.cueId, { ...h });
  for (const h of wordHits) {
    const known = byCue.get(h.cueId);
    if (known) known.score = Math.max(known.score, h.score);
    else byCue.set(h.cueId, { ...h });
  }
  return [...byCue.values()].sort((a, b) => Number(b.nameHit) - Number(a.nameHit) || compareHits(a, b));
}

/** The spans to mark in a cue's plain text: the names heard and the search's words. */
export function momentSpans(plain: string, hit: CueHit, plan: WordPlan): TextSpan[] {
  return mergeSpans([...hit.nameSpans, ...markWords(plain, markPlan(plan))]);
}
