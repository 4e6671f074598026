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

/** Most caption hits ranked per kind of lookup; the rest are counted as "more" (see `capped`). */
export const MOMENT_CAP = 200;

/** A cue of a published tour that a search found. */
export interface CueHit {
  cueId: number;
  trackId: number;
  tourId: number;
  lang: string;
  startMs: number;
  endMs: number;
  /** The cue text, once loaded (ranking never needs it; see `loadTexts`). */
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
const SELECT = `SELECT c.id AS cueId, c.track_id AS trackId, ct.tour_id AS tourId, ct.lang AS lang, c.start_ms AS startMs,
       c.end_ms AS endMs, %SCORE% AS score, COALESCE(t.filmed_on, DATE(t.published_at)) AS tourDate`;
const ORDER = `ORDER BY score DESC, tourDate DESC, t.id DESC, c.start_ms ASC, c.id ASC`;

function dateString(d: string | Date | null): string | null {
  if (d == null) return null;
  return d instanceof Date ? d.toISOString().slice(0, 10) : String(d).slice(0, 10);
}

function toHit(r: Row): CueHit {
  return {
    cueId: Number(r.cueId),
    trackId: Number(r.trackId),
    tourId: Number(r.tourId),
    lang: r.lang,
    startMs: Number(r.startMs),
    endMs: Number(r.endMs),
    rawText: null,
    score: Number(r.score ?? 0),
    tourDate: dateString(r.tourDate),
    nameHit: false,
    cultivarIds: [],
    nameSpans: [],
  };
}

/**
 * A search with no indexed word reads every cue of the published tours. Reading the cues table
 * straight through and joining each row's track and tour by primary key (STRAIGHT_JOIN) measured
 * about twice as fast as walking tours → tracks → cues through the (track_id, start_ms) index,
 * whose random row lookups cost more than the scan saves (bench/search.bench.ts corpus).
 */
function fallbackOnlySql(where: string, limit: number): string {
  return `${SELECT.replace('SELECT', 'SELECT STRAIGHT_JOIN').replace('%SCORE%', '0')}
         FROM cues c
         JOIN caption_tracks ct ON ct.id = c.track_id
         JOIN tours t ON t.id = ct.tour_id
         WHERE t.state = 'published' AND ${where}
         ${ORDER} LIMIT ${limit}`;
}

/** Whole-word conditions for words the FULLTEXT index does not hold. */
function fallbackWhere(words: readonly string[]): { sql: string; params: string[] } {
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

  constructor(private readonly dataSource: DataSource) {}

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

  /** Loads the text of hits that lack it (one query). */
  loadTexts(hits: readonly CueHit[]): Promise<void> {
    return loadCueTexts(this.dataSource, hits);
  }

  /** Splits folded words for this server. */
  async plan(words: readonly string[]): Promise<WordPlan> {
    return planWords(words, await this.fulltextLimits());
  }

  /** Cues matching every word of the search: up to MOMENT_CAP + 1 rows, best first. */
  async byWords(plan: WordPlan): Promise<CueHit[]> {
    if (!plan.indexed.length && !plan.fallback.length) return [];
    const fb = fallbackWhere(plan.fallback);
    let rows: Row[];
    if (plan.indexed.length) {
      const against = booleanAllPrefix(plan.indexed);
      rows = await this.dataSource.query(
        `${SELECT.replace('%SCORE%', 'MATCH(c.text) AGAINST (? IN BOOLEAN MODE)')}
         FROM cues c
         JOIN caption_tracks ct ON ct.id = c.track_id
         JOIN tours t ON t.id = ct.tour_id
         WHERE MATCH(c.text) AGAINST (? IN BOOLEAN MODE) AND t.state = 'published'${fb.sql ? ` AND ${fb.sql}` : ''}
         ${ORDER} LIMIT ${MOMENT_CAP + 1}`,
        [against, against, ...fb.params],
      );
    } else {
      rows = await this.dataSource.query(fallbackOnlySql(fb.sql, MOMENT_CAP + 1), fb.params);
    }
    return rows.map(toHit);
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
    const rows: Row[] = [];
    const seen = new Set<string>();
    const uniqueGroups = groups.filter((g) => {
      const k = g.join(' ');
      if (seen.has(k)) return false;
      seen.add(k);
      return true;
    });
    // Candidates are confirmed by the matcher below, so fetch more than will be kept.
    const fetch = (MOMENT_CAP + 1) * 2;
    if (uniqueGroups.length) {
      const against = booleanAnyGroup(uniqueGroups);
      rows.push(
        ...((await this.dataSource.query(
          `${SELECT.replace('%SCORE%', 'MATCH(c.text) AGAINST (? IN BOOLEAN MODE)')}
           FROM cues c
           JOIN caption_tracks ct ON ct.id = c.track_id
           JOIN tours t ON t.id = ct.tour_id
           WHERE MATCH(c.text) AGAINST (? IN BOOLEAN MODE) AND t.state = 'published'
           ${ORDER} LIMIT ${fetch}`,
          [against, against],
        )) as Row[]),
      );
    }
    for (const words of shortOnly.slice(0, 5)) {
      const fb = fallbackWhere(words);
      rows.push(...((await this.dataSource.query(fallbackOnlySql(fb.sql, fetch), fb.params)) as Row[]));
    }
    const wanted = new Set(targets.map((t) => t.id));
    const out: CueHit[] = [];
    const taken = new Set<number>();
    const hits = rows.map(toHit);
    await this.loadTexts(hits);
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
export async function loadCueTexts(dataSource: DataSource, hits: readonly CueHit[]): Promise<void> {
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
  return [...byCue.values()].sort(
    (a, b) =>
      Number(b.nameHit) - Number(a.nameHit) ||
      b.score - a.score ||
      (b.tourDate ?? '').localeCompare(a.tourDate ?? '') ||
      b.tourId - a.tourId ||
      a.startMs - b.startMs ||
      a.cueId - b.cueId,
  );
}

/** The spans to mark in a cue's plain text: the names heard and the search's words. */
export function momentSpans(plain: string, hit: CueHit, plan: WordPlan): TextSpan[] {
  return mergeSpans([...hit.nameSpans, ...markWords(plain, markPlan(plan))]);
}
