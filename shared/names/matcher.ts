/**
 * Finds cultivar names in caption text, including misspellings and mishearings, so Grovewalk can
 * suggest stops and spelling fixes. Each window of one to four words is compared with the names
 * that share a blocking key with it (first two letters, last three letters, opening consonant
 * sounds), by restricted Damerau-Levenshtein on the letters with spaces and hyphens removed
 * (which absorbs split words, joined words and dropped hyphens) and by double-metaphone keys
 * (English sound-alikes). Precision comes first: names under five letters must match exactly,
 * a window of everyday English words or of six letters or fewer only counts when it also sounds
 * like the name, and function words never sit at the edge of a fuzzy match.
 */
import { COMMON_WORDS, FUNCTION_WORDS } from './common-words';
import { damerauLevenshteinCodes, jaroWinkler, keysShare, phoneticKeys } from './similarity';

/** A cultivar record as the matcher needs it: its accepted epithet and known variants. */
export interface NameRecord {
  id: string | number;
  acceptedEpithet: string;
  variants?: string[];
}

/**
 * How a name was found: exact (the accepted epithet), variant (a recorded misspelling), fuzzy
 * (close in spelling, including the same letters split or joined differently) or phonetic
 * (sounds alike). Anything but exact is a candidate for a spelling fix.
 */
export type MatchKind = 'exact' | 'variant' | 'fuzzy' | 'phonetic';

/** One name found in a text: a character span into the original string and the record. */
export interface NameMatch {
  start: number;
  end: number;
  matchedText: string;
  recordId: string | number;
  score: number;
  kind: MatchKind;
}

/** Tuning knobs; the defaults are the ones the names benchmark measures. */
export interface FindNamesOptions {
  /** Lowest edit similarity (1 − distance / length) for a fuzzy match. */
  threshold?: number;
  /** How far below the threshold a sound-alike may fall and still count. */
  phoneticAllowance?: number;
  /** Lowest Jaro-Winkler for a sound-alike. */
  phoneticMinJaroWinkler?: number;
  /** Longest window, in words. */
  maxWindowWords?: number;
  /** Turn off to report spelling matches only. */
  phonetic?: boolean;
}

/** Default fuzzy threshold: two slips in an eight-letter name, three in twelve. */
export const DEFAULT_THRESHOLD = 0.75;
const DEFAULT_PHONETIC_ALLOWANCE = 0.15;
const DEFAULT_PHONETIC_MIN_JW = 0.8;
const PHONETIC_MARGIN = 0.01;
const DEFAULT_MAX_WINDOW_WORDS = 4;
/** Names (letters only) shorter than this are only found exactly: too many English look-alikes. */
const MIN_FUZZY_LENGTH = 5;
/** Up to this many letters, a fuzzy match must also sound alike (double-metaphone). */
const SHORT_LENGTH = 6;
/** Same letters, different spacing or hyphenation ("Shin deshojo" style splits). */
const RESPLIT_SCORE = 0.99;
const MEMO_LIMIT = 200_000;
const HASH_BASE = 0x01000193;
const SPACE = 32;

interface Entry {
  recordId: string | number;
  variant: boolean;
  tokens: string[];
  joined: string;
  codes: Uint16Array;
  keys: [string, string];
  /** Which of 32 letter classes occur: a cheap lower bound on edit distance. */
  mask: number;
  /** How often each letter class occurs: a tighter bound (bag distance) checked next. */
  counts: Uint8Array;
  /** Window number that last visited this entry, to skip duplicates across blocking lists. */
  stamp: number;
}

/** What the matcher keeps about one caption word; memoised per spelling. */
interface WordInfo {
  fold: string;
  common: boolean;
  functionWord: boolean;
  hash: number;
  /** HASH_BASE to the power of the folded length, to extend a rolling hash by this word. */
  pow: number;
  mask: number;
}

/** A prepared index over cultivar records; build once, reuse for every caption. */
export interface NameIndex {
  readonly size: number;
  /** @internal lookups by rolling hash of the folded words (with spaces) and of the letters. */
  readonly byTokens: ReadonlyMap<number, Entry[]>;
  readonly byJoined: ReadonlyMap<number, Entry[]>;
  /** @internal blocking lists, each sorted by name length so a window scans plausible lengths. */
  readonly byFirst: ReadonlyMap<number, Entry[]>;
  readonly byLast: ReadonlyMap<number, Entry[]>;
  readonly bySound: ReadonlyMap<number, Entry[]>;
  readonly maxLength: number;
  /** @internal function words that open or close some name ("The …", "… of the …"). */
  readonly openingWords: ReadonlySet<string>;
  readonly closingWords: ReadonlySet<string>;
  /** @internal memo of caption words and phonetic keys; grows with the vocabulary, then resets. */
  readonly memo: { words: Map<string, WordInfo>; keys: Map<string, [string, string]> };
}

function foldWord(word: string): string {
  return word
    .normalize('NFD')
    .replace(/\p{M}+/gu, '')
    .toLowerCase()
    .replace(/[^\p{L}\p{N}]+/gu, '');
}

function nameTokens(name: string): string[] {
  return name
    .split(/[\s\-‐‑–—/\\,.!]+/u)
    .map(foldWord)
    .filter((t) => t.length > 0);
}

function hashOf(s: string): number {
  let h = 0;
  for (let i = 0; i < s.length; i++) h = (Math.imul(h, HASH_BASE) + s.charCodeAt(i)) | 0;
  return h;
}

function powOf(length: number): number {
  let p = 1;
  for (let i = 0; i < length; i++) p = Math.imul(p, HASH_BASE);
  return p;
}

function letterMask(s: string): number {
  let mask = 0;
  for (let i = 0; i < s.length; i++) mask |= 1 << (s.charCodeAt(i) & 31);
  return mask;
}

function letterCounts(s: string): Uint8Array {
  const counts = new Uint8Array(32);
  for (let i = 0; i < s.length; i++) counts[s.charCodeAt(i) & 31]!++;
  return counts;
}

/** Letters one side has more of than the other, the larger side: never more than the edit distance. */
function bagDistance(x: Uint8Array, y: Uint8Array): number {
  let more = 0;
  let fewer = 0;
  for (let k = 0; k < 32; k++) {
    const d = x[k]! - y[k]!;
    if (d > 0) more += d;
    else fewer -= d;
  }
  return more > fewer ? more : fewer;
}

function popcount(x: number): number {
  x -= (x >>> 1) & 0x55555555;
  x = (x & 0x33333333) + ((x >>> 2) & 0x33333333);
  return (((x + (x >>> 4)) & 0x0f0f0f0f) * 0x01010101) >>> 24;
}

const a = 97;
// Consonant classes for the sound skeleton, indexed by letter (a = 0); 0 = ignored.
const SOUND_CLASS = new Uint8Array(26);
for (const [letters, cls] of [['bp', 1], ['ckqgx', 2], ['dt', 3], ['fv', 4], ['sz', 5], ['j', 6], ['lr', 7], ['m', 8], ['n', 9]] as const) {
  for (const l of letters) SOUND_CLASS[l.charCodeAt(0) - a] = cls;
}
const SH_CLASS = 10;

/**
 * The first three consonant sounds of folded letters as a number, vowels and h, w, y dropped
 * and repeats merged: "hoshi car gura" and "hoshikagura" share one. Only a blocking key;
 * double-metaphone decides whether two strings sound alike.
 */
function soundSkeleton(codes: Uint16Array, length: number): number {
  let key = 0;
  let last = 0;
  let count = 0;
  for (let i = 0; i < length && count < 3; i++) {
    const c = codes[i]! - a;
    if (c < 0 || c >= 26) continue;
    const next = i + 1 < length ? codes[i + 1]! - a : -1;
    let cls: number;
    if ((c === 18 || c === 2) && next === 7) {
      cls = SH_CLASS; // sh, ch
      i++;
    } else if (c === 19 && next === 18) {
      cls = 5; // ts sounds like s
      i++;
    } else if (c === 15 && next === 7) {
      cls = 4; // ph
      i++;
    } else if (c === 2 && (next === 4 || next === 8 || next === 24)) {
      cls = 5; // soft c
    } else {
      cls = SOUND_CLASS[c]!;
    }
    if (cls === 0 || cls === last) continue;
    key = key * 16 + cls;
    last = cls;
    count++;
  }
  return key;
}

function firstKey(codes: Uint16Array): number {
  return codes[0]! * 65536 + codes[1]!;
}

function lastKey(codes: Uint16Array, length: number): number {
  return ((codes[length - 3]! & 1023) << 20) | ((codes[length - 2]! & 1023) << 10) | (codes[length - 1]! & 1023);
}

function toCodes(s: string): Uint16Array {
  const out = new Uint16Array(s.length);
  for (let i = 0; i < s.length; i++) out[i] = s.charCodeAt(i);
  return out;
}

function addTo(map: Map<number, Entry[]>, key: number, entry: Entry): void {
  const list = map.get(key);
  if (list) {
    if (!list.includes(entry)) list.push(entry);
  } else map.set(key, [entry]);
}

/**
 * Prepares records for matching: hashed lookups for exact and re-split names, and three
 * blocking keys per name (first two letters, last three letters, opening consonant sounds) so a
 * window is only compared with the few names that could be close to it.
 */
export function buildNameIndex(records: readonly NameRecord[]): NameIndex {
  const byTokens = new Map<number, Entry[]>();
  const byJoined = new Map<number, Entry[]>();
  const byFirst = new Map<number, Entry[]>();
  const byLast = new Map<number, Entry[]>();
  const bySound = new Map<number, Entry[]>();
  let maxLength = 0;
  let size = 0;
  const seen = new Set<string>();
  const openingWords = new Set<string>();
  const closingWords = new Set<string>();

  for (const record of records) {
    const names = [record.acceptedEpithet, ...(record.variants ?? [])];
    names.forEach((name, i) => {
      const tokens = nameTokens(name);
      if (tokens.length === 0) return;
      const joined = tokens.join('');
      const dedupe = `${String(record.id)}\u0000${tokens.join(' ')}`;
      if (seen.has(dedupe)) return;
      seen.add(dedupe);
      const codes = toCodes(joined);
      const entry: Entry = {
        recordId: record.id,
        variant: i > 0,
        tokens,
        joined,
        codes,
        keys: phoneticKeys(joined),
        mask: letterMask(joined),
        counts: letterCounts(joined),
        stamp: 0,
      };
      size++;
      addTo(byTokens, hashOf(tokens.join(' ')), entry);
      addTo(byJoined, hashOf(joined), entry);
      maxLength = Math.max(maxLength, joined.length);
      if (FUNCTION_WORDS.has(tokens[0]!)) openingWords.add(tokens[0]!);
      if (FUNCTION_WORDS.has(tokens[tokens.length - 1]!)) closingWords.add(tokens[tokens.length - 1]!);
      if (joined.length < MIN_FUZZY_LENGTH) return;
      addTo(byFirst, firstKey(codes), entry);
      addTo(byLast, lastKey(codes, codes.length), entry);
      addTo(bySound, soundSkeleton(codes, codes.length), entry);
    });
  }
  // Accepted epithets win over variants of another record with the same letters.
  for (const list of [...byTokens.values(), ...byJoined.values()]) list.sort((x, y) => Number(x.variant) - Number(y.variant));
  for (const map of [byFirst, byLast, bySound]) for (const list of map.values()) list.sort((x, y) => x.joined.length - y.joined.length);
  return {
    size, byTokens, byJoined, byFirst, byLast, bySound, maxLength, openingWords, closingWords, memo: { words: new Map(), keys: new Map() },
  };
}

function cachedKeys(index: NameIndex, s: string): [string, string] {
  let k = index.memo.keys.get(s);
  if (!k) {
    if (index.memo.keys.size > MEMO_LIMIT) index.memo.keys.clear();
    k = phoneticKeys(s);
    index.memo.keys.set(s, k);
  }
  return k;
}

function wordInfo(index: NameIndex, raw: string): WordInfo {
  let info = index.memo.words.get(raw);
  if (!info) {
    if (index.memo.words.size > MEMO_LIMIT) index.memo.words.clear();
    const fold = foldWord(raw);
    info = {
      fold,
      common: COMMON_WORDS.has(fold),
      functionWord: FUNCTION_WORDS.has(fold),
      hash: hashOf(fold),
      pow: powOf(fold.length),
      mask: letterMask(fold),
    };
    index.memo.words.set(raw, info);
  }
  return info;
}

interface Token {
  start: number;
  end: number;
  info: WordInfo;
}

// Words with inner apostrophes stay whole ("O'Hare"); a trailing possessive is left out of the span.
const WORD = /[\p{L}\p{M}\p{N}]+(?:['’][\p{L}\p{M}\p{N}]+)*/gu;

function tokenize(index: NameIndex, text: string): Token[] {
  // Caption markup (<i>, <c.class>, <v Name>) is not speech: blank it out, keeping offsets.
  const plain = text.includes('<') ? text.replace(/<[^>]*>/g, (m) => ' '.repeat(m.length)) : text;
  const tokens: Token[] = [];
  for (const m of plain.matchAll(WORD)) {
    let raw = m[0];
    const n = raw.length;
    if (n > 2 && (raw[n - 2] === "'" || raw[n - 2] === '’') && (raw[n - 1] === 's' || raw[n - 1] === 'S')) raw = raw.slice(0, -2);
    const info = wordInfo(index, raw);
    if (info.fold.length === 0) continue;
    tokens.push({ start: m.index, end: m.index + raw.length, info });
  }
  return tokens;
}

interface Candidate {
  first: number;
  last: number;
  entry: Entry;
  score: number;
  kind: MatchKind;
  rank: number;
}

function maxEdits(length: number, similarity: number): number {
  return Math.max(0, Math.floor(length * (1 - similarity) + 1e-9));
}

/** First position in a length-sorted list whose name is at least `length` letters long. */
function firstOfLength(list: readonly Entry[], length: number): number {
  let lo = 0;
  let hi = list.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (list[mid]!.joined.length < length) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

function sameTokens(entry: Entry, tokens: readonly Token[], first: number, last: number): boolean {
  if (entry.tokens.length !== last - first + 1) return false;
  for (let t = first; t <= last; t++) if (entry.tokens[t - first] !== tokens[t]!.info.fold) return false;
  return true;
}

let windowCounter = 0;
let windowCodes = new Uint16Array(256);
const windowCounts = new Uint8Array(32);

/**
 * The names in a text as non-overlapping matches, best first per region, in text order. Spans
 * are word-aligned character offsets into the original string (a trailing possessive 's is left
 * out), so a spelling fix can replace exactly the matched words. "Exact" ignores case, accents
 * and whether the words are joined by spaces or hyphens; the same letters split differently
 * ("Shin deshojo") count as fuzzy with score 0.99.
 */
export function findNames(index: NameIndex, text: string, opts: FindNamesOptions = {}): NameMatch[] {
  const threshold = opts.threshold ?? DEFAULT_THRESHOLD;
  const phoneticFloor = threshold - (opts.phoneticAllowance ?? DEFAULT_PHONETIC_ALLOWANCE);
  const minJw = opts.phoneticMinJaroWinkler ?? DEFAULT_PHONETIC_MIN_JW;
  const maxWords = opts.maxWindowWords ?? DEFAULT_MAX_WINDOW_WORDS;
  const usePhonetic = opts.phonetic ?? true;
  const looseFloor = usePhonetic ? Math.min(phoneticFloor, threshold) : threshold;

  if (index.size === 0) return [];
  const tokens = tokenize(index, text);
  if (tokens.length === 0) return [];
  const candidates: Candidate[] = [];
  const longestWindow = index.maxLength + maxEdits(index.maxLength, looseFloor);
  if (windowCodes.length < longestWindow + 64) windowCodes = new Uint16Array(longestWindow + 64);
  const codes = windowCodes;

  for (let i = 0; i < tokens.length; i++) {
    const firstWord = tokens[i]!.info;
    let n = 0;
    let joinedHash = 0;
    let tokenHash = 0;
    let allCommon = true;
    let mask = 0;
    windowCounts.fill(0);
    // A fuzzy match may not start on a function word unless some name does.
    const openingOk = !firstWord.functionWord || index.openingWords.has(firstWord.fold);
    for (let w = 1; w <= maxWords && i + w - 1 < tokens.length; w++) {
      const last = i + w - 1;
      const word = tokens[last]!.info;
      if (n + word.fold.length > longestWindow) break;
      for (let k = 0; k < word.fold.length; k++) {
        const c = word.fold.charCodeAt(k);
        codes[n + k] = c;
        windowCounts[c & 31]!++;
      }
      n += word.fold.length;
      joinedHash = (Math.imul(joinedHash, word.pow) + word.hash) | 0;
      tokenHash = w === 1 ? word.hash : (Math.imul((Math.imul(tokenHash, HASH_BASE) + SPACE) | 0, word.pow) + word.hash) | 0;
      allCommon &&= word.common;
      mask |= word.mask;

      const exact = index.byTokens.get(tokenHash)?.find((e) => sameTokens(e, tokens, i, last));
      if (exact) {
        candidates.push({ first: i, last, entry: exact, score: 1, kind: exact.variant ? 'variant' : 'exact', rank: 1 + 0.02 * (w - 1) });
        continue;
      }
      const sameLetters = index.byJoined.get(joinedHash);
      if (sameLetters) {
        const joined = String.fromCharCode(...codes.subarray(0, n));
        const e = sameLetters.find((x) => x.joined === joined);
        if (e) {
          const rank = RESPLIT_SCORE + 0.02 * (w - 1);
          candidates.push({ first: i, last, entry: e, score: RESPLIT_SCORE, kind: e.variant ? 'variant' : 'fuzzy', rank });
          continue;
        }
      }

      if (n < MIN_FUZZY_LENGTH) continue;
      // A lone everyday word is never a misspelt name.
      if (!openingOk || (allCommon && w === 1)) continue;
      if (word.functionWord && !index.closingWords.has(word.fold)) continue;

      const stamp = ++windowCounter;
      let joined: string | null = null;
      let windowKeys: [string, string] | null = null;
      // The sound list first, with the wider phonetic length range; then the letter lists.
      for (let b = 0; b < 3; b++) {
        const list =
          b === 0 ? index.bySound.get(soundSkeleton(codes, n)) : b === 1 ? index.byFirst.get(firstKey(codes)) : index.byLast.get(lastKey(codes, n));
        if (!list) continue;
        // Everyday words must match closely anyway, so they never get the phonetic range.
        const floor = b === 0 && !allCommon ? looseFloor : threshold;
        // |m − n| ≤ m(1 − floor) bounds the name length m to [n / (2 − floor), n / floor].
        const hi = n / floor;
        for (let k = firstOfLength(list, Math.ceil(n / (2 - floor) - 1e-9)); k < list.length; k++) {
          const entry = list[k]!;
          const m = entry.joined.length;
          if (m > hi) break;
          if (entry.stamp === stamp) continue;
          entry.stamp = stamp;
          const bound = maxEdits(m, floor);
          if (Math.abs(m - n) > bound) continue;
          // Each letter present on one side only needs at least one edit.
          if (popcount(mask & ~entry.mask) > bound || popcount(entry.mask & ~mask) > bound) continue;
          if (bagDistance(windowCounts, entry.counts) > bound) continue;
          if (firstWord.functionWord && entry.tokens[0] !== firstWord.fold) continue;
          if (word.functionWord && entry.tokens[entry.tokens.length - 1] !== word.fold) continue;
          const d = damerauLevenshteinCodes(entry.codes, m, codes, n, bound);
          if (d > bound) continue;
          const sim = 1 - d / Math.max(m, n);
          const strict = d <= maxEdits(m, threshold) && sim >= threshold;
          joined ??= String.fromCharCode(...codes.subarray(0, n));
          const short = Math.min(m, n) <= SHORT_LENGTH;
          let soundsAlike = false;
          if (usePhonetic || allCommon || short) {
            windowKeys ??= cachedKeys(index, joined);
            soundsAlike = keysShare(windowKeys, entry.keys);
          }
          // Everyday English words, and short words where one slip is a fifth of the word,
          // only count when they also sound like the name.
          if ((allCommon || short) && !(strict && soundsAlike)) continue;
          if (strict) {
            candidates.push({ first: i, last, entry, score: sim, kind: 'fuzzy', rank: sim });
          } else if (usePhonetic && soundsAlike && sim >= phoneticFloor) {
            const jw = jaroWinkler(entry.joined, joined);
            if (jw < minJw) continue;
            // Sounding alike is weaker evidence than spelling: always rank below a fuzzy match.
            const score = Math.min((sim + jw) / 2, threshold - PHONETIC_MARGIN);
            candidates.push({ first: i, last, entry, score, kind: 'phonetic', rank: score });
          }
        }
      }
    }
  }

  // Best first; among equals the longer span, then the earlier one. Exact and re-split matches
  // get a small bonus per extra word so "Shin deshojo" beats a shorter name inside it.
  candidates.sort((x, y) => y.rank - x.rank || y.last - y.first - (x.last - x.first) || x.first - y.first);
  const taken = new Uint8Array(tokens.length);
  const chosen: Candidate[] = [];
  for (const c of candidates) {
    let free = true;
    for (let t = c.first; t <= c.last && free; t++) if (taken[t]) free = false;
    if (!free) continue;
    for (let t = c.first; t <= c.last; t++) taken[t] = 1;
    chosen.push(c);
  }
  chosen.sort((x, y) => x.first - y.first);
  return chosen.map((c) => {
    const start = tokens[c.first]!.start;
    const end = tokens[c.last]!.end;
    return {
      start,
      end,
      matchedText: text.slice(start, end),
      recordId: c.entry.recordId,
      score: Math.round(c.score * 1000) / 1000,
      kind: c.kind,
    };
  });
}
