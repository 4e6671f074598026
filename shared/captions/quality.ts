// Caption quality checks, run live in the caption editor and again on the server when a tour is
// published. Every limit names where its number comes from; numbers without a checked published
// source say so ("common practice", "from memory").
import { compareCues } from './cue-order';
import { cuePlainText } from './cue-text';
import type { Cue } from './types';

/** A limit and where its number comes from, so the editor can show the reason next to a warning. */
export interface Threshold {
  value: number;
  unit: string;
  source: string;
}

const BBC = 'BBC Subtitle Guidelines, version 1.2.5 (March 2026)';

/**
 * The limits the checks use. BBC numbers were read in the guidelines' own text (sections cited);
 * for landscape video. Vertical video allows three lines of about 25 characters (same document,
 * §3.1 and §3.3): pass overrides to {@link checkCues} for that.
 */
export const THRESHOLDS = {
  maxCharsPerLine: {
    value: 37,
    unit: 'characters per line',
    source: `${BBC}, §3.1 Line length: 37 characters (Teletext; also the limit when a file serves online and broadcast)`,
  },
  maxLines: {
    value: 2,
    unit: 'lines per cue',
    source: `${BBC}, §3.3 Number of lines: at most two lines for landscape or square video`,
  },
  maxWordsPerMinute: {
    value: 180,
    unit: 'words per minute',
    source: `${BBC}, §4 Timing: recommended speed 160-180 words per minute`,
  },
  hardMaxWordsPerMinute: {
    value: 200,
    unit: 'words per minute',
    source:
      'BBC R&D blog "How fast should subtitles be?" (September 2015), citing Ofcom: subtitles over 200 words per minute are difficult for many viewers to follow',
  },
  maxCharsPerSecond: {
    value: 20,
    unit: 'characters per second',
    source: 'common practice, from memory (no published source checked)',
  },
  minMsPerWord: {
    value: 300,
    unit: 'milliseconds per word',
    source: `${BBC}, §4.1 Target minimum timing: about 0.3 seconds per word (e.g. 1.2 seconds for a 4-word subtitle)`,
  },
  maxDurationMs: {
    value: 7000,
    unit: 'milliseconds',
    source: 'common practice, from memory (no published source checked)',
  },
  maxOverlapMs: {
    value: 0,
    unit: 'milliseconds',
    source: 'common practice: one caption on screen at a time (WebVTT itself allows overlapping cues)',
  },
  minGapMs: {
    value: 1000,
    unit: 'milliseconds',
    source: `${BBC}, §4.5 Gaps: a gap between subtitles must be at least one second, preferably a second and a half`,
  },
} as const satisfies Record<string, Threshold>;

/** Names of the limits in {@link THRESHOLDS}. */
export type ThresholdName = keyof typeof THRESHOLDS;

/** What a quality issue is about. */
export type QualityKind =
  | 'timing'
  | 'reading-speed'
  | 'reading-speed-cps'
  | 'too-short'
  | 'too-long'
  | 'line-length'
  | 'line-count'
  | 'overlap'
  | 'gap';

/** One finding about one cue; `value` is what was measured and `limit` what it was held against. */
export interface QualityIssue {
  /** Index into the array passed to {@link checkCues}. */
  cueIndex: number;
  kind: QualityKind;
  severity: 'error' | 'warning';
  message: string;
  value: number;
  limit: number;
}

/** Facts about one cue that the checks and the editor's live counters both use. */
export interface CueMeasures {
  durationMs: number;
  lines: string[];
  words: number;
  characters: number;
  wordsPerMinute: number | null;
  charactersPerSecond: number | null;
}

const WORD = /[\p{L}\p{N}]/u;

function length(text: string): number {
  return Array.from(text).length;
}

/**
 * Measures a cue as a viewer reads it: tags removed and escapes decoded; a word is a
 * whitespace-separated run holding a letter or digit (so a hyphenated epithet counts once);
 * characters exclude line breaks; line lengths ignore spaces at the ends of a line.
 */
export function measureCue(cue: Cue): CueMeasures {
  const plain = cuePlainText(cue.text);
  const lines = plain.split('\n').map((line) => line.trim()).filter((line) => line !== '');
  const words = plain.split(/\s+/).filter((token) => WORD.test(token)).length;
  const characters = length(lines.join(' '));
  const durationMs = cue.endMs - cue.startMs;
  const seconds = durationMs / 1000;
  return {
    durationMs,
    lines,
    words,
    characters,
    wordsPerMinute: durationMs > 0 ? words / (seconds / 60) : null,
    charactersPerSecond: durationMs > 0 ? characters / seconds : null,
  };
}

function seconds(ms: number): string {
  return `${Number((ms / 1000).toFixed(2))} s`;
}

function round1(n: number): string {
  return (Math.round(n * 10) / 10).toString();
}

/**
 * Checks every cue against the limits (optionally overridden, e.g. for vertical video) and
 * returns the issues in cue order. Timing that cannot play (end not after start) is an error;
 * speech too fast for many viewers (over 200 words per minute) is an error; the rest are warnings.
 */
export function checkCues(
  cues: readonly Cue[],
  overrides: Partial<Record<ThresholdName, number>> = {},
): QualityIssue[] {
  const limit = (name: ThresholdName) => overrides[name] ?? THRESHOLDS[name].value;
  const issues: QualityIssue[] = [];
  const add = (cueIndex: number, kind: QualityKind, severity: QualityIssue['severity'], message: string, value: number, lim: number) =>
    issues.push({ cueIndex, kind, severity, message, value, limit: lim });

  cues.forEach((cue, index) => {
    const m = measureCue(cue);
    if (m.durationMs <= 0) {
      add(index, 'timing', 'error', 'The cue ends before or when it starts; the end time must be later than the start time (WebVTT cue timings).', m.durationMs, 0);
      return;
    }

    const wpm = m.wordsPerMinute ?? 0;
    if (wpm > limit('hardMaxWordsPerMinute')) {
      add(index, 'reading-speed', 'error', `Reading speed is ${round1(wpm)} words per minute; over ${limit('hardMaxWordsPerMinute')} is difficult for many viewers to follow (Ofcom, reported by BBC R&D). Shorten the text or show the cue longer.`, wpm, limit('hardMaxWordsPerMinute'));
    } else if (wpm > limit('maxWordsPerMinute')) {
      add(index, 'reading-speed', 'warning', `Reading speed is ${round1(wpm)} words per minute; the BBC Subtitle Guidelines recommend ${limit('maxWordsPerMinute')} at most (section 4). Shorten the text or show the cue longer.`, wpm, limit('maxWordsPerMinute'));
    }

    const cps = m.charactersPerSecond ?? 0;
    if (cps > limit('maxCharsPerSecond')) {
      add(index, 'reading-speed-cps', 'warning', `Reading speed is ${round1(cps)} characters per second; aim for ${limit('maxCharsPerSecond')} or fewer (common practice).`, cps, limit('maxCharsPerSecond'));
    }

    const minimum = m.words * limit('minMsPerWord');
    if (m.durationMs < minimum) {
      add(index, 'too-short', 'warning', `Shown for ${seconds(m.durationMs)}; ${m.words} word${m.words === 1 ? '' : 's'} need about ${seconds(minimum)} (${limit('minMsPerWord') / 1000} s per word, BBC Subtitle Guidelines section 4.1).`, m.durationMs, minimum);
    }
    if (m.durationMs > limit('maxDurationMs')) {
      add(index, 'too-long', 'warning', `Shown for ${seconds(m.durationMs)}; cues longer than ${seconds(limit('maxDurationMs'))} are usually split (common practice).`, m.durationMs, limit('maxDurationMs'));
    }

    const longest = m.lines.reduce((max, line) => Math.max(max, length(line)), 0);
    if (longest > limit('maxCharsPerLine')) {
      const which = m.lines.findIndex((line) => length(line) === longest) + 1;
      add(index, 'line-length', 'warning', `Line ${which} has ${longest} characters; keep lines to ${limit('maxCharsPerLine')} or fewer (BBC Subtitle Guidelines section 3.1).`, longest, limit('maxCharsPerLine'));
    }
    if (m.lines.length > limit('maxLines')) {
      add(index, 'line-count', 'warning', `This cue has ${m.lines.length} lines; use at most ${limit('maxLines')} (BBC Subtitle Guidelines section 3.3).`, m.lines.length, limit('maxLines'));
    }
  });

  // Overlaps and gaps are judged between neighbours in playing order.
  const order = cues.map((cue, index) => ({ cue, index })).sort((a, b) => compareCues(a.cue, b.cue));
  for (let k = 0; k + 1 < order.length; k++) {
    const { cue, index } = order[k] as { cue: Cue; index: number };
    const next = (order[k + 1] as { cue: Cue }).cue;
    if (cue.endMs <= cue.startMs) continue;
    const overlap = cue.endMs - next.startMs;
    if (overlap > limit('maxOverlapMs')) {
      add(index, 'overlap', 'warning', `Overlaps the next cue by ${seconds(overlap)}; show one caption at a time (common practice).`, overlap, limit('maxOverlapMs'));
      continue;
    }
    const gap = next.startMs - cue.endMs;
    if (gap > 0 && gap < limit('minGapMs')) {
      add(index, 'gap', 'warning', `The gap before the next cue is ${seconds(gap)}; close it up or leave at least ${seconds(limit('minGapMs'))} (BBC Subtitle Guidelines section 4.5).`, gap, limit('minGapMs'));
    }
  }

  issues.sort((a, b) => a.cueIndex - b.cueIndex);
  return issues;
}
