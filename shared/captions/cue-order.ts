import type { Cue } from './types';

/**
 * The order WebVTT players keep cues in (start time, then the longer cue first), so that output
 * files stay valid (start times never go backwards) and re-reading them gives the same list.
 */
export function compareCues(a: Pick<Cue, 'startMs' | 'endMs'>, b: Pick<Cue, 'startMs' | 'endMs'>): number {
  if (a.startMs !== b.startMs) return a.startMs - b.startMs;
  return b.endMs - a.endMs;
}

/** A sorted copy (stable: cues with equal times keep their relative order). */
export function sortCues<T extends Pick<Cue, 'startMs' | 'endMs'>>(cues: readonly T[]): T[] {
  return [...cues].sort(compareCues);
}
