import { cuePlainText } from '@shared/captions/cue-text';
import { foldText, foldWithMap } from '@shared/search/text-fold';

/**
 * A cue as one transcript line: the text a viewer reads (WebVTT tags removed, escapes decoded),
 * with line breaks and runs of spaces made single spaces so the find box matches across them.
 */
export function transcriptLine(cueText: string): string {
  return cuePlainText(cueText).replace(/\s+/g, ' ').trim();
}

/** The timing of a cue, in milliseconds. */
export interface TimedCue {
  startMs: number;
  endMs: number;
}

/**
 * The cue being spoken at `ms` in a list sorted by start time, or -1 in a pause. A cue is active
 * from its start up to, not including, its end (the HTML standard's "time marches on"); where cues
 * overlap, the one that started last is the line the viewer is reading.
 */
export function activeCueIndex(cues: readonly TimedCue[], ms: number): number {
  // The last cue starting at or before `ms` (binary search), then back over overlapping cues.
  let lo = 0;
  let hi = cues.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (cues[mid]!.startMs <= ms) lo = mid + 1;
    else hi = mid;
  }
  // Sorted by start only: a long earlier cue may still cover `ms`, so look further back too.
  for (let i = lo - 1; i >= 0; i--) if (ms < cues[i]!.endMs) return i;
  return -1;
}

/** One match of the find box: which line, and where in its text (UTF-16 offsets, end exclusive). */
export interface TranscriptMatch {
  line: number;
  start: number;
  end: number;
}

/**
 * Every place the find text occurs in the lines, in reading order, ignoring case and accents
 * ("sora" finds "Sóra"), the way the site's search compares words. Matches inside a word count
 * too, as in a browser's find-in-page; an empty or blank find text matches nothing. Offsets are
 * into the lines exactly as given (the transcript shows them as they are).
 */
export function findInLines(lines: readonly string[], query: string): TranscriptMatch[] {
  const needle = foldText(query.trim().replace(/\s+/g, ' '));
  if (!needle) return [];
  const out: TranscriptMatch[] = [];
  lines.forEach((text, line) => {
    const { folded, starts, ends } = foldWithMap(text);
    let from = 0;
    for (;;) {
      const at = folded.indexOf(needle, from);
      if (at < 0) break;
      out.push({ line, start: starts[at]!, end: ends[at + needle.length - 1]! });
      from = at + needle.length;
    }
  });
  return out;
}

/** The match to go to from `current` (−1: none yet), wrapping round at either end. */
export function stepMatch(count: number, current: number, step: 1 | -1): number {
  if (count <= 0) return -1;
  if (current < 0) return step > 0 ? 0 : count - 1;
  return (((current + step) % count) + count) % count;
}
