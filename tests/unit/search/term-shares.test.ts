// Word counts that size a caption lookup before its first read, and the first reads they choose.
// Folding follows MariaDB's utf8mb4_unicode_ci collation (accents and case ignored, as the full-text
// index compares words); the counts are checked against the server's own full-text hits in
// tests/integration/search-ranking.test.ts. The read sizes are Grovewalk's own rule (issue 6), checked
// here on worked numbers. The caption lines are invented.
import type { DataSource } from 'typeorm';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { firstReads } from '../../../server/modules/search/caption-search';
import { cueWords, TermShares } from '../../../server/modules/search/term-shares';

describe('cueWords', () => {
  it('folds case and accents and counts how often each word is said', () => {
    expect(Object.fromEntries(cueWords('Érable, érable and the ERABLE near the gate.'))).toEqual({ erable: 3, and: 1, the: 2, near: 1, gate: 1 });
  });

  it('splits on anything but letters and digits, like the search box', () => {
    expect([...cueWords('<i>Kumo-no</i> tsubasa (zone 6b)').keys()]).toEqual(['i', 'kumo', 'no', 'tsubasa', 'zone', '6b']);
  });
});

describe('firstReads', () => {
  const cues = 100_000;

  it('keeps the plain window for words too rare to run past it', () => {
    // 700 hits: under twice a 400-hit window.
    expect(firstReads({ share: 0.007, atLeast: [0.007, 0.001, 0, 0] }, 201, cues, 400)).toBeUndefined();
  });

  it('reads just past the lowest tier holding the answer when cues say the word twice or more often enough', () => {
    // 15,000 hits; 1,200 say it twice, 150 three times: the cut falls among the 1,200.
    expect(firstReads({ share: 0.15, atLeast: [0.15, 0.012, 0.0015, 0.0002] }, 201, cues, 400)).toEqual({ window: Math.ceil(1200 * 1.15) + 50 });
    // 300 say it three times: the cut falls there, and 300 × 1.15 + 50 = 395 is within the plain window.
    expect(firstReads({ share: 0.15, atLeast: [0.15, 0.012, 0.003, 0.0002] }, 201, cues, 400)).toBeUndefined();
  });

  it('reads the newest tours beside the window when the cut falls in the long tie of cues saying it once', () => {
    // 5,000 hits, 40 say it twice: 201 − 40 × 0.8 = 169 more from a tie holding 4,960 of 100,000 cues.
    const r = firstReads({ share: 0.05, atLeast: [0.05, 0.0004, 0, 0] }, 201, cues, 400);
    expect(r).toEqual({ window: 400, walk: Math.ceil((169 / 0.0496) * 1.25) });
    // Nearly the whole answer above the tie: still plans for a quarter of it (201 / 4).
    const r2 = firstReads({ share: 0.05, atLeast: [0.05, 0.0019, 0, 0] }, 201, cues, 400);
    expect(r2!.walk).toBe(Math.ceil((201 / 4 / 0.0481) * 1.25));
  });

  it('takes several words as one tier (no counts of repeats)', () => {
    expect(firstReads({ share: 0.02, atLeast: null }, 201, cues, 400)).toEqual({ window: 400, walk: Math.ceil((201 / 0.02) * 1.25) });
  });
});

describe('TermShares recounts', () => {
  afterEach(() => vi.useRealTimers());

  /** A stand-in database holding `n` invented cues; counts the counting statements. */
  function cuesDb(n: number) {
    const state = { n, counts: 0 };
    const ds = {
      query: async (_sql: string, params: unknown[]) => {
        const [after, page] = params as [number, number];
        if (after === 0) state.counts++;
        return Array.from({ length: Math.max(0, Math.min(page, state.n - after)) }, (_, i) => ({ id: after + i + 1, text: 'maple by the gate' }));
      },
    } as unknown as DataSource;
    return { ds, state };
  }

  it('counts once, and again only when the size the caller sees drifts by a fifth, at most every five minutes', async () => {
    vi.useFakeTimers({ now: new Date('2026-03-01T10:00:00Z') });
    const { ds, state } = cuesDb(1000);
    const terms = new TermShares(ds);
    // The caller's size is an estimate (InnoDB's row count), here far from the 1,000 cues really there.
    expect(terms.estimate(['maple'], 1500)).toBeNull();
    await terms.settled();
    expect(state.counts).toBe(1);
    expect(terms.estimate(['maple'], 1500)!.share).toBe(1);
    // The same estimate again: no recount, though it is half as large again as the cues counted.
    for (let i = 0; i < 5; i++) terms.estimate(['maple'], 1500);
    await terms.settled();
    expect(state.counts).toBe(1);
    // Drifted by more than a fifth, but within five minutes of the last count: not yet.
    state.n = 2000;
    terms.estimate(['maple'], 3000);
    await terms.settled();
    expect(state.counts).toBe(1);
    vi.setSystemTime(new Date('2026-03-01T10:06:00Z'));
    terms.estimate(['maple'], 3000);
    await terms.settled();
    expect(state.counts).toBe(2);
    expect(terms.estimate(['gate'], 3000)!.share).toBe(1);
  });
});
