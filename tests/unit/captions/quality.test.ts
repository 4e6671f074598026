import { describe, expect, it } from 'vitest';
import { THRESHOLDS, checkCues, measureCue, type QualityKind } from '@shared/captions/quality';
import type { Cue } from '@shared/captions/types';

// Hand-made cues. Their texts are invented for Grovewalk's fictional demo garden club
// ("Larkspur Lane"); cultivar epithets such as 'Mossgate Ember' are made up.

const cue = (startMs: number, endMs: number, text: string): Cue => ({ startMs, endMs, text });
const kinds = (cues: Cue[], kind: QualityKind) => checkCues(cues).filter((i) => i.kind === kind);

describe('THRESHOLDS', () => {
  it('gives every limit a value, a unit and a source; BBC limits cite their section', () => {
    for (const [name, t] of Object.entries(THRESHOLDS)) {
      expect(Number.isFinite(t.value), name).toBe(true);
      expect(t.unit.length, name).toBeGreaterThan(0);
      expect(t.source.length, name).toBeGreaterThan(0);
      if (t.source.startsWith('BBC Subtitle Guidelines')) expect(t.source, name).toMatch(/§\d/);
      if (!/BBC|Ofcom/.test(t.source)) expect(t.source, name).toMatch(/common practice/);
    }
  });
});

describe('line length: BBC Subtitle Guidelines §3.1, 37 characters per line', () => {
  it('accepts 37 characters and flags 38, counting what is shown (tags and escapes resolved)', () => {
    const ok37 = 'Mossgate Ember turns red in late May.'; // 37 characters
    expect(ok37).toHaveLength(37);
    expect(kinds([cue(0, 5000, ok37)], 'line-length')).toEqual([]);
    expect(kinds([cue(0, 5000, `<i>${ok37}</i>`)], 'line-length')).toEqual([]);
    expect(kinds([cue(0, 5000, 'Bark &amp; leaves of Mossgate Ember in May')], 'line-length')).toEqual([
      expect.objectContaining({ value: 38, limit: 37, severity: 'warning' }),
    ]);
    const issues = kinds([cue(0, 5000, `Short line\n${ok37}!`)], 'line-length');
    expect(issues).toHaveLength(1);
    expect(issues[0]?.message).toMatch(/^Line 2 has 38 characters/);
  });
});

describe('lines per cue: BBC Subtitle Guidelines §3.3, at most two lines (landscape video)', () => {
  it('accepts two lines and flags three', () => {
    expect(kinds([cue(0, 6000, 'one\ntwo')], 'line-count')).toEqual([]);
    expect(kinds([cue(0, 6000, 'one\ntwo\nthree')], 'line-count')).toEqual([
      expect.objectContaining({ value: 3, limit: 2 }),
    ]);
  });

  it('allows three lines of 25 characters when the caller passes the vertical-video limits (same document, §3.1 and §3.3)', () => {
    const text = 'A fictional tour stop\nfilmed on a phone\nheld upright';
    expect(checkCues([cue(0, 6000, text)]).map((i) => i.kind)).toContain('line-count');
    expect(checkCues([cue(0, 6000, text)], { maxLines: 3, maxCharsPerLine: 25 })).toEqual([]);
  });
});

describe('reading speed: BBC Subtitle Guidelines §4, 160-180 words per minute', () => {
  it('measures the guidelines\' worked example: a 2-word subtitle shown for 1 second is 120 WPM (§4 developer note)', () => {
    expect(measureCue(cue(0, 1000, 'Hello there')).wordsPerMinute).toBe(120);
  });

  it('accepts 180 WPM and warns above it', () => {
    // 6 words in 2 s = 180 WPM
    expect(kinds([cue(0, 2000, 'Mossgate Ember grows slowly in pots')], 'reading-speed')).toEqual([]);
    // 13 words in 4 s = 195 WPM
    const fast = kinds([cue(0, 4000, 'This fictional maple keeps its red colour well into autumn in morning sun')], 'reading-speed');
    expect(fast).toEqual([expect.objectContaining({ severity: 'warning', limit: 180 })]);
    expect(fast[0]?.value).toBeCloseTo(195, 9);
  });

  it('treats more than 200 WPM as an error (BBC R&D 2015, citing Ofcom: over 200 WPM is difficult for many viewers)', () => {
    // 7 words in 2 s = 210 WPM
    const issues = kinds([cue(0, 2000, 'Mossgate Ember is a fictional dwarf maple')], 'reading-speed');
    expect(issues).toEqual([expect.objectContaining({ severity: 'error', limit: 200 })]);
    expect(issues[0]?.value).toBeCloseTo(210, 9);
  });

  it('counts a hyphenated epithet as one word and ignores lone punctuation', () => {
    expect(measureCue(cue(0, 1000, "'Beni-mossgate' \u2014 fictional!")).words).toBe(2);
  });
});

describe('characters per second: common practice, from memory (20 characters per second)', () => {
  it('accepts 20 characters per second and warns above it', () => {
    expect(kinds([cue(0, 1000, 'abcdefghij klmnopqrs')], 'reading-speed-cps')).toEqual([]); // 20 characters in 1 s
    expect(kinds([cue(0, 1000, 'abcdefghij klmnopqrst')], 'reading-speed-cps')).toEqual([
      expect.objectContaining({ value: 21, limit: 20 }),
    ]);
  });
});

describe('minimum duration: BBC Subtitle Guidelines §4.1, about 0.3 s per word (1.2 s for a 4-word subtitle)', () => {
  it('accepts the guidelines\' example of 4 words for 1.2 s and flags 4 words for 1.1 s', () => {
    const words4 = 'Mossgate Ember, fictional maple';
    expect(kinds([cue(0, 1200, words4)], 'too-short')).toEqual([]);
    expect(kinds([cue(0, 1100, words4)], 'too-short')).toEqual([
      expect.objectContaining({ value: 1100, limit: 1200, severity: 'warning' }),
    ]);
  });
});

describe('maximum duration: common practice, from memory (7 s)', () => {
  it('accepts 7 s and flags anything longer', () => {
    expect(kinds([cue(0, 7000, 'A long look at the fictional fern walk.')], 'too-long')).toEqual([]);
    expect(kinds([cue(0, 7001, 'A long look at the fictional fern walk.')], 'too-long')).toEqual([
      expect.objectContaining({ value: 7001, limit: 7000 }),
    ]);
  });
});

describe('timing: W3C WebVTT cue timings syntax, the end time must be greater than the start time', () => {
  it('reports end <= start as an error and skips the speed checks for that cue', () => {
    const issues = checkCues([cue(2000, 2000, 'zero length'), cue(5000, 4000, 'backwards')]);
    expect(issues.filter((i) => i.kind !== 'timing')).toEqual([]);
    expect(issues.map((i) => [i.cueIndex, i.kind, i.severity, i.value])).toEqual([
      [0, 'timing', 'error', 0],
      [1, 'timing', 'error', -1000],
    ]);
  });
});

describe('gaps: BBC Subtitle Guidelines §4.5, a gap between subtitles must be at least one second', () => {
  it('accepts no gap or a gap of 1 s, and flags a gap in between (a flicker)', () => {
    const text = 'Fictional stop';
    expect(kinds([cue(0, 2000, text), cue(2000, 4000, text)], 'gap')).toEqual([]);
    expect(kinds([cue(0, 2000, text), cue(3000, 5000, text)], 'gap')).toEqual([]);
    expect(kinds([cue(0, 2000, text), cue(2999, 5000, text)], 'gap')).toEqual([
      expect.objectContaining({ cueIndex: 0, value: 999, limit: 1000 }),
    ]);
  });
});

describe('overlaps: common practice, one caption at a time (WebVTT allows overlapping cues)', () => {
  it('flags a cue that is still showing when the next one starts, in playing order', () => {
    const cues = [cue(5000, 8000, 'second in time'), cue(1000, 5500, 'first in time')];
    expect(kinds(cues, 'overlap')).toEqual([expect.objectContaining({ cueIndex: 1, value: 500, limit: 0 })]);
  });
});

describe('checkCues on a clean fictional tour', () => {
  it('finds nothing to report', () => {
    const tour = [
      cue(1000, 3500, 'Welcome to Larkspur Lane.'),
      cue(3500, 6500, "This is 'Mossgate Ember',\na fictional dwarf maple."),
      cue(8000, 11_000, 'Its pot is buried to the rim.'),
    ];
    expect(checkCues(tour)).toEqual([]);
  });
});
