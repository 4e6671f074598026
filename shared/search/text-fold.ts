/**
 * Search text helpers shared by the server and the client: the comparison form of text (accents
 * folded, lower case, ß as ss, as MariaDB's utf8mb4_unicode_ci collation compares), the words of a
 * query, and highlight spans as offsets into the original string, so a client can mark matches
 * without the server sending HTML.
 */

/** A highlighted run of a string: `start` inclusive, `end` exclusive, UTF-16 offsets. */
export interface TextSpan {
  start: number;
  end: number;
}

/** A folded string with, per folded character, the original span it came from. */
export interface FoldedText {
  folded: string;
  starts: number[];
  ends: number[];
}

const WORD_CHAR = /[\p{L}\p{N}]/u;
const WORD_RUN = /[\p{L}\p{N}]+/gu;
// Letters the collation expands; NFKD leaves them whole.
const EXPANSIONS: Record<string, string> = { ß: 'ss', ẞ: 'ss', æ: 'ae', Æ: 'ae', œ: 'oe', Œ: 'oe', ø: 'o', Ø: 'o', đ: 'd', Đ: 'd', ł: 'l', Ł: 'l' };

function foldChar(ch: string): string {
  const expanded = EXPANSIONS[ch];
  if (expanded) return expanded;
  return ch.normalize('NFKD').replace(/\p{M}+/gu, '').toLowerCase();
}

const ASCII = /^[\x00-\x7f]*$/;

/** Lower case, accents removed, ß → ss: the form both sides of a comparison are put in. */
export function foldText(text: string): string {
  // Plain ASCII only needs lower case (most captions and names): no per-character work.
  if (ASCII.test(text)) return text.toLowerCase();
  let out = '';
  for (const ch of text) out += foldChar(ch);
  return out;
}

/** Folds `text` and remembers where each folded character came from (for highlight offsets). */
export function foldWithMap(text: string): FoldedText {
  let folded = '';
  const starts: number[] = [];
  const ends: number[] = [];
  let i = 0;
  for (const ch of text) {
    const f = foldChar(ch);
    for (let k = 0; k < f.length; k++) {
      starts.push(i);
      ends.push(i + ch.length);
    }
    folded += f;
    i += ch.length;
  }
  return { folded, starts, ends };
}

/**
 * The words of a search, folded, in order and without repeats. Only letters and digits make
 * words, so quote marks, wildcards (% _) and full-text operators (+ - < > ( ) ~ * : " & | @)
 * never reach a query as anything but a word break.
 */
export function searchWords(q: string): string[] {
  return [...new Set(foldedWords(q))];
}

/** Every word of `text` in folded form, in order, repeats kept (runs of letters and digits). */
export function foldedWords(text: string): string[] {
  return foldText(text).match(WORD_RUN) ?? [];
}

/** A word to mark in a text: `prefix` also marks words that merely start with it. */
export interface MarkWord {
  word: string;
  prefix: boolean;
}

function isWordCharAt(s: string, i: number): boolean {
  return i >= 0 && i < s.length && WORD_CHAR.test(s[i]!);
}

/**
 * Spans of `text` where the words start a word (and, unless `prefix`, also end one), compared in
 * folded form; overlapping and touching spans are merged, in text order.
 */
export function markWords(text: string, words: readonly MarkWord[]): TextSpan[] {
  if (!words.length || !text) return [];
  const { folded, starts, ends } = foldWithMap(text);
  const raw: TextSpan[] = [];
  for (const { word, prefix } of words) {
    if (!word) continue;
    let from = 0;
    for (;;) {
      const at = folded.indexOf(word, from);
      if (at < 0) break;
      from = at + 1;
      if (isWordCharAt(folded, at - 1)) continue;
      const after = at + word.length;
      if (!prefix && isWordCharAt(folded, after)) continue;
      // A prefix hit marks the whole word it starts, as a reader expects.
      let end = after;
      if (prefix) while (isWordCharAt(folded, end)) end++;
      raw.push({ start: starts[at]!, end: ends[end - 1]! });
    }
  }
  return mergeSpans(raw);
}

/** Sorts spans and merges those that overlap or touch. */
export function mergeSpans(spans: readonly TextSpan[]): TextSpan[] {
  const sorted = [...spans].sort((a, b) => a.start - b.start || a.end - b.end);
  const out: TextSpan[] = [];
  for (const s of sorted) {
    const last = out[out.length - 1];
    if (last && s.start <= last.end) last.end = Math.max(last.end, s.end);
    else out.push({ ...s });
  }
  return out;
}

/**
 * A window of about `width` characters of `text` around its first span, cut at word breaks, with
 * the spans moved into the window; "…" marks a cut on either side.
 */
export function snippetAround(text: string, spans: readonly TextSpan[], width = 160): { text: string; highlights: TextSpan[] } {
  const clean = text;
  if (clean.length <= width) return { text: clean, highlights: spans.map((s) => ({ ...s })) };
  const first = spans[0] ?? { start: 0, end: 0 };
  let from = Math.max(0, Math.min(first.start - Math.floor(width / 3), clean.length - width));
  let to = Math.min(clean.length, from + width);
  // Move the cuts to word breaks so no word is shown in part.
  while (from > 0 && WORD_CHAR.test(clean[from - 1]!) && WORD_CHAR.test(clean[from]!)) from--;
  while (to < clean.length && WORD_CHAR.test(clean[to - 1]!) && WORD_CHAR.test(clean[to]!)) to++;
  const lead = from > 0 ? '…' : '';
  const tail = to < clean.length ? '…' : '';
  const body = clean.slice(from, to);
  const trimmedStart = body.length - body.trimStart().length;
  const inner = body.trim();
  const shift = lead.length - from - trimmedStart;
  const highlights = spans
    .filter((s) => s.start >= from + trimmedStart && s.end <= from + trimmedStart + inner.length)
    .map((s) => ({ start: s.start + shift, end: s.end + shift }));
  return { text: `${lead}${inner}${tail}`, highlights };
}
