/** A pair of records as notes are stored: lower id first. */
export type Pair = readonly [number, number];

/** Every pair among the records on screen, lower id first, in the order the records are shown. */
export function pairsOf(ids: readonly number[]): Pair[] {
  const out: Pair[] = [];
  for (let i = 0; i < ids.length; i++) {
    for (let j = i + 1; j < ids.length; j++) {
      const a = ids[i] as number;
      const b = ids[j] as number;
      out.push(a < b ? [a, b] : [b, a]);
    }
  }
  return out;
}

/** The stored note of a pair, whichever way round the ids are given. */
export function noteFor<T extends { aId: number; bId: number }>(notes: readonly T[], a: number, b: number): T | undefined {
  const [lo, hi] = a < b ? [a, b] : [b, a];
  return notes.find((n) => n.aId === lo && n.bId === hi);
}
