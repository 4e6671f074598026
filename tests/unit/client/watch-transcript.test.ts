import { describe, expect, it } from 'vitest';
import { activeCueIndex, findInLines, stepMatch, transcriptLine, type TimedCue } from '@/features/tours/lib/transcript';

// The current line follows the HTML Living Standard's "time marches on" (a cue is active from its
// start time up to, not including, its end time). The find box is checked against ECMA-402's
// Intl.Collator with sensitivity "base" (letters equal regardless of case and accents), the
// reference for "same letters" the browser itself ships. Cue text follows the W3C WebVTT spec
// (tags such as <i> and <v Speaker> are not read; &amp; is "&").
// The narration lines are invented for the fictional Fernhollow Maple Circle.

const cues: TimedCue[] = [
  { startMs: 2_200, endMs: 5_800 },
  { startMs: 6_200, endMs: 9_800 },
  { startMs: 10_200, endMs: 13_800 },
  { startMs: 13_500, endMs: 20_000 },
  { startMs: 14_000, endMs: 15_000 },
  { startMs: 25_000, endMs: 26_000 },
];

function referenceActive(list: readonly TimedCue[], ms: number): number {
  let best = -1;
  list.forEach((c, i) => {
    if (c.startMs <= ms && ms < c.endMs && (best < 0 || c.startMs >= list[best]!.startMs)) best = i;
  });
  return best;
}

describe('activeCueIndex', () => {
  it('matches the standard’s rule at every 100 ms, overlaps and pauses included', () => {
    for (let ms = 0; ms <= 27_000; ms += 100) expect(activeCueIndex(cues, ms), `at ${ms} ms`).toBe(referenceActive(cues, ms));
  });

  it('finds a long cue that started before a shorter one has ended', () => {
    expect(activeCueIndex(cues, 16_000)).toBe(3);
    expect(activeCueIndex(cues, 14_500)).toBe(4);
    expect(activeCueIndex(cues, 5_800)).toBe(-1);
    expect(activeCueIndex([], 1000)).toBe(-1);
  });
});

describe('findInLines (find in the transcript)', () => {
  const lines = [
    'We start at the bottom of the steps with Sóra-no-hane.',
    'And back to SORA no hani, now scarlet.',
    'Under the birch we keep Yuki-hotaru in shade.',
    'Nothing here.',
  ];
  const collator = new Intl.Collator('en', { sensitivity: 'base', usage: 'search' });

  /** Every window of the query's length that the collator calls equal to it. */
  function referenceMatches(query: string) {
    const out: { line: number; start: number; end: number }[] = [];
    lines.forEach((text, line) => {
      for (let i = 0; i + query.length <= text.length; i++) {
        if (collator.compare(text.slice(i, i + query.length), query) === 0) {
          out.push({ line, start: i, end: i + query.length });
          i += query.length - 1;
        }
      }
    });
    return out;
  }

  it('agrees with Intl.Collator (base sensitivity) on case and accents', () => {
    for (const q of ['sora', 'SORA', 'hani', 'no', 'yuki-hotaru', 'scarlet', 'ó']) expect(findInLines(lines, q), q).toEqual(referenceMatches(q));
    expect(findInLines(lines, 'sora').map((m) => m.line)).toEqual([0, 1]);
  });

  it('gives offsets into the line as shown', () => {
    const [m] = findInLines(lines, 'hani');
    expect(lines[m!.line]!.slice(m!.start, m!.end)).toBe('hani');
  });

  it('finds nothing for an empty or blank box', () => {
    expect(findInLines(lines, '')).toEqual([]);
    expect(findInLines(lines, '   ')).toEqual([]);
  });

  it('steps through matches and wraps round', () => {
    expect(stepMatch(3, -1, 1)).toBe(0);
    expect(stepMatch(3, -1, -1)).toBe(2);
    expect(stepMatch(3, 2, 1)).toBe(0);
    expect(stepMatch(3, 0, -1)).toBe(2);
    expect(stepMatch(0, 0, 1)).toBe(-1);
  });
});

describe('transcriptLine (W3C WebVTT cue text)', () => {
  it('reads the text a viewer sees: no tags, decoded escapes, one line', () => {
    expect(transcriptLine('<v Ada>We start with <i>Sora-no-hane</i>.</v>')).toBe('We start with Sora-no-hane.');
    expect(transcriptLine('Pots &amp; troughs\nby the bench')).toBe('Pots & troughs by the bench');
    expect(transcriptLine('<ruby>空<rt>sora</rt></ruby> no hane')).toBe('空 no hane');
  });
});
