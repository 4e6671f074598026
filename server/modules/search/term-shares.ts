import type { DataSource } from 'typeorm';
import { foldedWords } from '../../../shared/search/text-fold';

/** Cues read per statement while counting (keeps memory flat and lets searches run in between). */
const PAGE = 20_000;
/** A count older than this is redone on the next lookup that asks. */
const MAX_AGE_MS = 60 * 60_000;
/** …and so is one taken when the table's size (as the caller sees it) was this far (as a share) from its size now. */
const MAX_DRIFT = 0.2;
/** Counts start at most this often (a failed first count is retried sooner). */
const MIN_INTERVAL_MS = 5 * 60_000;
const RETRY_FIRST_MS = 10_000;


/** Most times a word is counted as said in one cue (a cue saying it more often counts as this many). */
export const TIMES_COUNTED = 4;

/** Counted words, sorted; `atLeast[k][i]`: cues saying word i at least k + 1 times, out of `total`. */
interface Counts {
  words: string[];
  atLeast: number[][];
  total: number;
  /** The table's size as the caller gave it when this count started (an estimate, compared only with its like). */
  sizeSeen: number;
  at: number;
}

/** What share of all cues a search's words are expected in. */
export interface TermEstimate {
  /** Cues holding every word. */
  share: number;
  /**
   * For a single word: shares of cues saying it at least 1, 2, … TIMES_COUNTED times (boolean mode
   * scores a cue by how often it says the word, so these are the score tiers from the top); null
   * for several words.
   */
  atLeast: number[] | null;
}

/** Folded words of one cue with how often each is said. */
export function cueWords(text: string): Map<string, number> {
  const out = new Map<string, number>();
  for (const w of foldedWords(text)) out.set(w, (out.get(w) ?? 0) + 1);
  return out;
}

/**
 * About what share of all cues hold each word: counted in the background from the cue texts, so a
 * caption lookup that has never seen its words can still size its reads before the first one
 * (`CaptionSearch.ranked`). The counts only size reads; answers never depend on them, so a count a
 * little out of date (captions saved since) costs at most a second read.
 */
export class TermShares {
  private counts: Counts | null = null;
  private counting: Promise<void> | null = null;
  private lastStart = -Infinity;

  constructor(private readonly dataSource: DataSource) {}

  /**
   * Shares of cues that hold every word, the last also as a prefix (as `booleanAllPrefix` asks),
   * taking the words as independent; null until the first count is done. Starts a recount when
   * the count is old or the table's size `cuesNow` (however the caller estimates it, the same way
   * each time) has drifted from what it was then, at most every few minutes; never waits for one.
   */
  estimate(words: readonly string[], cuesNow: number): TermEstimate | null {
    const c = this.counts;
    const now = Date.now();
    const due = c ? now - c.at > MAX_AGE_MS || Math.abs(cuesNow - c.sizeSeen) > MAX_DRIFT * Math.max(c.sizeSeen, 1) : true;
    if (due && !this.counting && now - this.lastStart > (c ? MIN_INTERVAL_MS : RETRY_FIRST_MS)) {
      this.lastStart = now;
      this.counting = this.count(cuesNow)
        .catch(() => undefined) // a failed count leaves the old one (or none); a later lookup retries
        .finally(() => (this.counting = null));
    }
    if (!c || !c.total || !words.length) return null;
    let share = 1;
    words.forEach((w, i) => {
      share *= Math.min(c.total, holding(c, w, i === words.length - 1)[0]!) / c.total;
    });
    return { share, atLeast: words.length === 1 ? holding(c, words[0]!, true).map((n) => Math.min(c.total, n) / c.total) : null };
  }

  /** Resolves when a count in progress (if any) is done. */
  async settled(): Promise<void> {
    await this.counting;
  }

  private async count(sizeSeen: number): Promise<void> {
    const counted = new Map<string, number[]>();
    let total = 0;
    let after = 0;
    for (;;) {
      const rows = (await this.dataSource.query('SELECT id, text FROM cues WHERE id > ? ORDER BY id LIMIT ?', [after, PAGE])) as { id: number | string; text: string }[];
      for (const r of rows) {
        for (const [w, n] of cueWords(r.text)) {
          let k = counted.get(w);
          if (!k) counted.set(w, (k = new Array<number>(TIMES_COUNTED).fill(0)));
          for (let i = 0; i < Math.min(n, TIMES_COUNTED); i++) k[i]!++;
        }
      }
      total += rows.length;
      if (rows.length < PAGE) break;
      after = Number(rows[rows.length - 1]!.id);
    }
    const words = [...counted.keys()].sort();
    this.counts = { words, atLeast: Array.from({ length: TIMES_COUNTED }, (_, i) => words.map((w) => counted.get(w)![i]!)), total, sizeSeen, at: Date.now() };
  }
}

function lowerBound(words: readonly string[], w: string): number {
  let lo = 0;
  let hi = words.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (words[mid]! < w) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * Cues holding `w` (or, as a prefix, any word starting with it) at least 1, 2, … TIMES_COUNTED
 * times. A cue with two such words counts for each: an upper bound, as sizing wants.
 */
function holding(c: Counts, w: string, prefix: boolean): number[] {
  const out = new Array<number>(TIMES_COUNTED).fill(0);
  for (let i = lowerBound(c.words, w); i < c.words.length && (prefix ? c.words[i]!.startsWith(w) : c.words[i] === w); i++) {
    for (let k = 0; k < TIMES_COUNTED; k++) out[k]! += c.atLeast[k]![i]!;
  }
  return out;
}
