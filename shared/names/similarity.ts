/**
 * The string measures the name matcher uses: restricted Damerau-Levenshtein (optimal string
 * alignment) for misspellings, Jaro-Winkler to vet sound-alike candidates, and double-metaphone
 * keys for English sound-alikes. Kept small on purpose: only what the matcher needs.
 */
import { doubleMetaphone } from 'double-metaphone';

// Scratch rows reused across calls: the matcher runs this hundreds of thousands of times.
let rowPrev2 = new Int32Array(64);
let rowPrev = new Int32Array(64);
let rowCur = new Int32Array(64);

function ensureRows(n: number): void {
  if (rowCur.length >= n) return;
  const size = Math.max(n, rowCur.length * 2);
  rowPrev2 = new Int32Array(size);
  rowPrev = new Int32Array(size);
  rowCur = new Int32Array(size);
}

let codesA = new Uint16Array(64);
let codesB = new Uint16Array(64);

/**
 * Edit distance counting insertions, deletions, substitutions and swaps of two adjacent
 * characters, in the restricted form (no substring is edited twice), which is the form that
 * models typing and hearing slips. With `max`, returns max + 1 as soon as the distance is known
 * to exceed it, which keeps candidate checks cheap. Compares UTF-16 code units.
 */
export function damerauLevenshtein(a: string, b: string, max = Infinity): number {
  if (a === b) return 0;
  if (codesA.length < a.length) codesA = new Uint16Array(a.length * 2);
  if (codesB.length < b.length) codesB = new Uint16Array(b.length * 2);
  for (let i = 0; i < a.length; i++) codesA[i] = a.charCodeAt(i);
  for (let i = 0; i < b.length; i++) codesB[i] = b.charCodeAt(i);
  return damerauLevenshteinCodes(codesA, a.length, codesB, b.length, max);
}

/**
 * The same distance over character-code buffers (the first `la` and `lb` codes), for callers
 * that already hold codes and compare them many times, like the name matcher.
 */
export function damerauLevenshteinCodes(a: Uint16Array, la: number, b: Uint16Array, lb: number, max = Infinity): number {
  if (Math.abs(la - lb) > max) return max + 1;
  // Common prefix and suffix never change the distance.
  let start = 0;
  while (start < la && start < lb && a[start] === b[start]) start++;
  while (la > start && lb > start && a[la - 1] === b[lb - 1]) {
    la--;
    lb--;
  }
  const n = la - start;
  const m = lb - start;
  if (n === 0) return m > max ? max + 1 : m;
  if (m === 0) return n > max ? max + 1 : n;
  ensureRows(m + 1);
  let prev2 = rowPrev2;
  let prev = rowPrev;
  let cur = rowCur;
  for (let j = 0; j <= m; j++) prev[j] = j;
  for (let i = 1; i <= n; i++) {
    const ca = a[start + i - 1]!;
    const caBefore = i > 1 ? a[start + i - 2]! : -1;
    cur[0] = i;
    let rowMin = i;
    for (let j = 1; j <= m; j++) {
      const cb = b[start + j - 1]!;
      let d = prev[j - 1]! + (ca === cb ? 0 : 1);
      const del = prev[j]! + 1;
      if (del < d) d = del;
      const ins = cur[j - 1]! + 1;
      if (ins < d) d = ins;
      if (j > 1 && ca === b[start + j - 2] && caBefore === cb) {
        const swap = prev2[j - 2]! + 1;
        if (swap < d) d = swap;
      }
      cur[j] = d;
      if (d < rowMin) rowMin = d;
    }
    // Row minima never decrease (a swap costs at least the cell it skips), so stop early.
    if (rowMin > max) return max + 1;
    const t = prev2;
    prev2 = prev;
    prev = cur;
    cur = t;
  }
  const d = prev[m]!;
  return d > max ? max + 1 : d;
}

/** Edit distance scaled to 0…1 (1 = identical) so names of different lengths compare fairly. */
export function editSimilarity(a: string, b: string): number {
  const len = Math.max(a.length, b.length);
  if (len === 0) return 1;
  return 1 - damerauLevenshtein(a, b) / len;
}

/**
 * Jaro similarity: shared characters within a window of half the longer length, penalised by
 * half the out-of-order ones (rounded down, as in Winkler's reference code).
 */
export function jaro(a: string, b: string): number {
  if (a === b) return 1;
  const [short, long] = a.length <= b.length ? [a, b] : [b, a];
  if (short.length === 0) return 0;
  const range = Math.max(Math.floor(long.length / 2) - 1, 0);
  const longUsed = new Uint8Array(long.length);
  const shortMatchedAt = new Int32Array(short.length).fill(-1);
  let matches = 0;
  for (let i = 0; i < short.length; i++) {
    const lo = Math.max(0, i - range);
    const hi = Math.min(long.length, i + range + 1);
    for (let j = lo; j < hi; j++) {
      if (!longUsed[j] && short[i] === long[j]) {
        longUsed[j] = 1;
        shortMatchedAt[i] = j;
        matches++;
        break;
      }
    }
  }
  if (matches === 0) return 0;
  let k = 0;
  let outOfOrder = 0;
  for (let i = 0; i < short.length; i++) {
    if (shortMatchedAt[i] === -1) continue;
    while (!longUsed[k]) k++;
    if (short[i] !== long[k]) outOfOrder++;
    k++;
  }
  const t = Math.floor(outOfOrder / 2);
  return (matches / a.length + matches / b.length + (matches - t) / matches) / 3;
}

/**
 * Jaro-Winkler: Jaro raised for a shared prefix of up to four characters (scaling p = 0.1),
 * applied only when Jaro reaches 0.7 (Winkler's boost threshold). Names misheard in captions
 * usually keep their opening sound, which this rewards.
 */
export function jaroWinkler(a: string, b: string, p = 0.1): number {
  const j = jaro(a, b);
  if (j < 0.7) return j;
  const limit = Math.min(4, a.length, b.length);
  let prefix = 0;
  while (prefix < limit && a[prefix] === b[prefix]) prefix++;
  return j + prefix * p * (1 - j);
}

/** Primary and alternate double-metaphone keys: equal keys mean the words likely sound alike. */
export function phoneticKeys(word: string): [string, string] {
  return doubleMetaphone(word);
}

/** True when any key of one side equals any key of the other. */
export function keysShare(a: readonly [string, string], b: readonly [string, string]): boolean {
  return a[0] === b[0] || a[0] === b[1] || a[1] === b[0] || a[1] === b[1];
}
