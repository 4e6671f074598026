import { stopMetadataSchema, type StopMetadata } from '@shared/schemas/stops';

// Times here are milliseconds from the start of the tour, as the watch API sends them. A stop
// covers [startMs, endMs): the HTML standard's "time marches on" counts a cue as active when its
// start time is at or before the current position and its end time is after it.

/** The parts of a stop the timeline rules look at. */
export interface TimedStop {
  id: number;
  startMs: number;
  endMs: number;
}

/**
 * The stop playing at `ms`, as an index, or -1 between stops. Where stops overlap, the one that
 * started last wins: it is the tree the camera has just reached.
 */
export function stopIndexAt(stops: readonly TimedStop[], ms: number): number {
  let found = -1;
  for (let i = 0; i < stops.length; i++) {
    const s = stops[i]!;
    if (s.startMs <= ms && ms < s.endMs && (found < 0 || s.startMs >= stops[found]!.startMs)) found = i;
  }
  return found;
}

/**
 * The stop "next" or "previous" should go to, as an index, or null at either end. From a stop it
 * is simply the neighbour in the list; between stops it is the first stop starting after `ms`
 * (next) or the last one that started before it (previous). Stops are in time order.
 */
export function stepStop(stops: readonly TimedStop[], current: number | null, ms: number, step: 1 | -1): number | null {
  if (stops.length === 0) return null;
  if (current != null && current >= 0 && current < stops.length) {
    const to = current + step;
    return to >= 0 && to < stops.length ? to : null;
  }
  if (step > 0) {
    const i = stops.findIndex((s) => s.startMs > ms);
    return i >= 0 ? i : null;
  }
  for (let i = stops.length - 1; i >= 0; i--) if (stops[i]!.startMs < ms) return i;
  return null;
}

/** The part of a TextTrackCue the metadata reader needs (a plain object in tests). */
export interface MetadataCueLike {
  startTime: number;
  text: string;
}

/** A metadata cue's JSON payload, or null for a cue that is not one of ours. */
export function readStopCue(text: string): StopMetadata | null {
  try {
    const parsed = stopMetadataSchema.safeParse(JSON.parse(text));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

/**
 * The stop id from the metadata track's active cues at a cue change, or null between stops.
 * Players that count a cue's end as still active (video.js's own track code does) report both
 * neighbours at the instant one stop ends and the next begins; the one that started last wins.
 */
export function stopIdFromActiveCues(cues: Iterable<MetadataCueLike> | ArrayLike<MetadataCueLike> | null | undefined): number | null {
  if (!cues) return null;
  let best: { start: number; id: number } | null = null;
  for (const cue of Array.from(cues as ArrayLike<MetadataCueLike>)) {
    const payload = readStopCue(cue.text);
    if (!payload) continue;
    if (!best || cue.startTime >= best.start) best = { start: cue.startTime, id: payload.stopId };
  }
  return best?.id ?? null;
}
