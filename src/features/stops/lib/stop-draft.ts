// Where a new stop goes when the author adds one at the playhead or from a cue, worked out before
// anything is sent, so the usual case never meets the server's overlap rule.
import type { StopDto } from '@shared/schemas/stops';
import { formatTimeInput } from '@/lib/time-input';

/** Length of a stop added at the playhead when nothing follows closely (Grovewalk's own default). */
export const DEFAULT_STOP_MS = 10_000;
/** Shortest stop the server accepts (shared stop schema: at least one second). */
export const MIN_STOP_MS = 1000;

/** A time range for a new stop, or the reason there is no room for one. */
export type StopDraft = { ok: true; startMs: number; endMs: number } | { ok: false; message: string };

type Range = Pick<StopDto, 'startMs' | 'endMs'>;

function label(stop: Range & { title?: string }, index: number): string {
  const name = stop.title?.trim() ? ` (“${stop.title.trim()}”)` : '';
  return `stop ${index + 1}${name}, ${formatTimeInput(stop.startMs)}–${formatTimeInput(stop.endMs)}`;
}

/**
 * A stop starting at `startMs` that runs `wantMs` (ten seconds by default) or until the next stop
 * or the video's end, whichever comes first, and at least until `atLeastMs` when there is room.
 * No draft when the moment is inside another stop or less than a second is free after it.
 */
export function draftStop(
  stops: readonly (Range & { title?: string })[],
  startMs: number,
  durationMs: number | null,
  opts: { wantMs?: number; atLeastMs?: number } = {},
): StopDraft {
  const start = Math.max(0, Math.round(startMs));
  const sorted = [...stops].sort((a, b) => a.startMs - b.startMs);
  const inside = sorted.findIndex((s) => start >= s.startMs && start < s.endMs);
  if (inside >= 0) {
    return { ok: false, message: `That moment is inside ${label(sorted[inside]!, inside)}. Move the playhead past it, or edit that stop.` };
  }
  const next = sorted.find((s) => s.startMs > start);
  const limit = Math.min(next?.startMs ?? Infinity, durationMs ?? Infinity);
  if (limit - start < MIN_STOP_MS) {
    const what = next && next.startMs <= (durationMs ?? Infinity) ? 'the next stop begins' : 'the video ends';
    return { ok: false, message: `Less than a second is left before ${what}; a stop lasts at least one second.` };
  }
  const want = Math.max(opts.wantMs ?? DEFAULT_STOP_MS, (opts.atLeastMs ?? start) - start, MIN_STOP_MS);
  return { ok: true, startMs: start, endMs: Math.min(start + want, limit) };
}

/** A stop at the playhead: ten seconds, or until the next stop or the end. */
export function draftAtPlayhead(stops: readonly (Range & { title?: string })[], playheadMs: number, durationMs: number | null): StopDraft {
  return draftStop(stops, playheadMs, durationMs);
}

/** A stop from a cue: it starts with the cue and lasts at least as long as the cue (and ten seconds when there is room). */
export function draftFromCue(stops: readonly (Range & { title?: string })[], cue: Range, durationMs: number | null): StopDraft {
  return draftStop(stops, cue.startMs, durationMs, { atLeastMs: cue.endMs });
}

/** The stop showing at `ms` (index into the time-sorted list), or -1. */
export function stopIndexAt(stops: readonly Range[], ms: number): number {
  return stops.findIndex((s) => ms >= s.startMs && ms < s.endMs);
}

/** A suggestion that would overlap a stop already there (the server would refuse it). */
export function overlapsAny(stops: readonly Range[], range: Range): boolean {
  return stops.some((s) => range.startMs < s.endMs && s.startMs < range.endMs);
}
