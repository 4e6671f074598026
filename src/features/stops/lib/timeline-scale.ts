// Geometry of the stops timeline: where a moment sits along it, and where the time labels go.

/** Steps the scale may use between labels, in seconds: "round" numbers people read at a glance. */
export const SCALE_STEPS_S = [1, 2, 5, 10, 15, 30, 60, 120, 300, 600, 900, 1800, 3600] as const;

/** A moment's position along the timeline, 0–100 (per cent of the width), clamped to the ends. */
export function percentAt(ms: number, durationMs: number): number {
  if (!(durationMs > 0)) return 0;
  return Math.min(100, Math.max(0, (ms / durationMs) * 100));
}

/** The moment under a point of the timeline, from the point's fraction of the width (0–1). */
export function msAtFraction(fraction: number, durationMs: number): number {
  const f = Math.min(1, Math.max(0, fraction));
  return Math.round(f * Math.max(0, durationMs));
}

/**
 * Label positions for the scale: the smallest round step that keeps at most `maxLabels` labels
 * (0 s included), so a 40-second walk is marked every 5 s and a 20-minute one every 2 or 5 min.
 */
export function scaleMarks(durationMs: number, maxLabels = 8): number[] {
  if (!(durationMs > 0)) return [0];
  const seconds = durationMs / 1000;
  const step = SCALE_STEPS_S.find((s) => Math.floor(seconds / s) + 1 <= maxLabels) ?? Math.ceil(seconds / Math.max(1, maxLabels - 1) / 3600) * 3600;
  const marks: number[] = [];
  for (let t = 0; t <= seconds + 1e-9; t += step) marks.push(Math.round(t * 1000));
  return marks;
}
