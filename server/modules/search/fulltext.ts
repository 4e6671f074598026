/**
 * How a search's words become MariaDB queries. InnoDB's FULLTEXT index leaves out words shorter
 * than `innodb_ft_min_token_size` (default 3) and the words of its default stopword list, so those
 * words are matched by a LIKE/REGEXP fallback instead; every other word becomes a required term
 * of a boolean-mode query. Words reach here as letters and digits only (see `searchWords`), so
 * nothing a user types can act as a boolean operator or a LIKE wildcard.
 */
import type { MarkWord } from '../../../shared/search/text-fold';

/**
 * InnoDB's default FULLTEXT stopwords, as listed by information_schema.INNODB_FT_DEFAULT_STOPWORD
 * (MariaDB Knowledge Base, "Information Schema INNODB_FT_DEFAULT_STOPWORD Table"; the MySQL
 * reference manual prints the same 36 rows, "the" twice).
 */
export const INNODB_DEFAULT_STOPWORDS: ReadonlySet<string> = new Set(
  'a about an are as at be by com de en for from how i in is it la of on or that the this to was what when where who will with und www'.split(' '),
);

/** innodb_ft_min_token_size and innodb_ft_max_token_size defaults (MariaDB system variables documentation). */
export const INNODB_FT_DEFAULTS = { minToken: 3, maxToken: 84 } as const;

/** The index's word-length limits as the server reports them. */
export interface FulltextLimits {
  minToken: number;
  maxToken: number;
}

/** A search's words split by whether the FULLTEXT index can find them. */
export interface WordPlan {
  /** Words the index holds: each a required prefix term. */
  indexed: string[];
  /** Too short, too long or a stopword: matched as whole words by the fallback. */
  fallback: string[];
}

/** The words to mark in results, read the way the query reads them (see `booleanAllPrefix`). */
export function markPlan(plan: WordPlan): MarkWord[] {
  return [
    ...plan.indexed.map((word, i) => ({ word, prefix: i === plan.indexed.length - 1 })),
    ...plan.fallback.map((word) => ({ word, prefix: false })),
  ];
}

/** Splits folded words into those the FULLTEXT index holds and those it never stores. */
export function planWords(words: readonly string[], limits: FulltextLimits = INNODB_FT_DEFAULTS): WordPlan {
  const indexed: string[] = [];
  const fallback: string[] = [];
  for (const w of words) {
    const n = [...w].length;
    if (n < limits.minToken || n > limits.maxToken || INNODB_DEFAULT_STOPWORDS.has(w)) fallback.push(w);
    else indexed.push(w);
  }
  return { indexed, fallback };
}

const SAFE_TERM = /^[\p{L}\p{N}]+$/u;

function assertSafe(word: string): void {
  // Defence in depth: a term with anything but letters and digits could carry an operator.
  if (!SAFE_TERM.test(word)) throw new Error(`unsafe full-text term: ${JSON.stringify(word)}`);
}

/**
 * `+word1 +word2*`: every word required; the last one also as the start of a longer word, as a
 * search box's last word is often still being typed. Whole words elsewhere keep the index lookup
 * cheap (a prefix term reads every indexed word that starts with it).
 */
export function booleanAllPrefix(words: readonly string[]): string {
  return words
    .map((w, i) => {
      assertSafe(w);
      return i === words.length - 1 ? `+${w}*` : `+${w}`;
    })
    .join(' ');
}

/**
 * `(+a +b) (+c)`: a row matches when it holds every word of at least one group. Used for the
 * spellings of cultivar names, where each group is one name or variant.
 */
export function booleanAnyGroup(groups: readonly (readonly string[])[]): string {
  return groups
    .filter((g) => g.length > 0)
    .map((g) => {
      g.forEach(assertSafe);
      return `(${g.map((w) => `+${w}`).join(' ')})`;
    })
    .join(' ');
}

/** Escapes the characters PCRE treats specially, for a REGEXP built around a word. */
export function escapeRegExp(s: string): string {
  return s.replace(/[\\^$.*+?()[\]{}|-]/g, (c) => `\\${c}`);
}

/**
 * A MariaDB REGEXP that finds `word` as a whole word (case follows the column's collation, which
 * ignores case). ASCII word classes; words with other letters rely on the LIKE beside it.
 */
export function wholeWordRegExp(word: string): string {
  return `(^|[^[:alnum:]])${escapeRegExp(word)}([^[:alnum:]]|$)`;
}

/** True when the REGEXP form can be trusted for this word (ASCII letters and digits only). */
export function regExpUsable(word: string): boolean {
  return /^[a-z0-9]+$/.test(word);
}
