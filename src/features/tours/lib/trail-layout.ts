// The trail under the player: a winding garden path drawn left to right, with each stop as a
// numbered stepping stone placed by its start time. Pure geometry, in CSS pixels, so the markers
// (HTML buttons) and the SVG path agree exactly and the rules can be tested without a browser.

/** Options of `trailLayout`; sizes in CSS pixels. */
export interface TrailOptions {
  /** Width the trail has on screen; the layout grows wider (and scrolls) when stops need more room. */
  width: number;
  height: number;
  /** Least distance between two marker centres. */
  minGap?: number;
  /** Room left free at both ends, so the first and last stones are not cut off. */
  pad?: number;
  /** How far the path winds up and down from the middle line. */
  amplitude?: number;
  /** Length of one bend of the path. */
  bend?: number;
}

/** One stop's stone on the trail. */
export interface TrailMarker {
  x: number;
  y: number;
  /** Where the stop starts, as a share of the tour (0–1), before any crowding was resolved. */
  at: number;
}

/** The drawn trail: its size, the path and the markers in stop order. */
export interface TrailLayout {
  width: number;
  height: number;
  /** SVG path data of the whole trail. */
  path: string;
  markers: TrailMarker[];
  /** The curve's settings, for drawing parts of the same path. */
  curve: TrailCurve;
}

/** The settings of the winding curve. */
export interface TrailCurve {
  height: number;
  amplitude: number;
  bend: number;
  pad: number;
}

/**
 * Least centre-to-centre distance of two stones. WCAG 2.2 SC 2.5.8 (Target Size, Minimum) asks
 * for 24 × 24 CSS px targets or that much spacing; the stones are 32 px wide, so 36 px keeps a gap.
 */
export const TRAIL_MIN_GAP = 36;
const SAMPLE_STEP = 6;

/** Height of the winding path at `x` (the same curve for the stroke and the stones). */
export function trailY(x: number, o: TrailCurve): number {
  return o.height / 2 + o.amplitude * Math.sin((2 * Math.PI * (x - o.pad)) / o.bend);
}

/**
 * Stones placed along the path by start time. When stops are closer in time than the stones are
 * wide, they are pushed apart to `minGap` (keeping their order), first forwards and then back from
 * the far end; if they still do not fit, the trail grows wider than the screen and scrolls.
 */
export function trailLayout(startsMs: readonly number[], durationMs: number, opts: TrailOptions): TrailLayout {
  const minGap = opts.minGap ?? TRAIL_MIN_GAP;
  const pad = opts.pad ?? 24;
  const height = opts.height;
  const amplitude = opts.amplitude ?? height * 0.2;
  const bend = opts.bend ?? 280;
  const n = startsMs.length;
  const width = Math.max(opts.width, 2 * pad + Math.max(0, n - 1) * minGap);
  const span = width - 2 * pad;
  const total = durationMs > 0 ? durationMs : Math.max(1, ...startsMs.map((s) => s + 1));
  const at = startsMs.map((s) => Math.min(1, Math.max(0, s / total)));
  const xs = at.map((a) => pad + a * span);

  for (let i = 1; i < n; i++) xs[i] = Math.max(xs[i]!, xs[i - 1]! + minGap);
  if (n > 0) xs[n - 1] = Math.min(xs[n - 1]!, width - pad);
  // The width leaves room for every gap, so pulling back from the far end never passes `pad`.
  for (let i = n - 2; i >= 0; i--) xs[i] = Math.min(xs[i]!, xs[i + 1]! - minGap);

  const curve: TrailCurve = { height, amplitude, bend, pad };
  const points: string[] = [];
  for (let x = 0; x < width; x += SAMPLE_STEP) points.push(`${round(x)} ${round(trailY(x, curve))}`);
  points.push(`${round(width)} ${round(trailY(width, curve))}`);
  return {
    width,
    height,
    path: `M${points.join(' L')}`,
    markers: xs.map((x, i) => ({ x, y: trailY(x, curve), at: at[i]! })),
    curve,
  };
}

/** SVG path data of the trail from its start up to `x`: the part already walked. */
export function walkedPath(layout: TrailLayout, x: number): string {
  const { curve } = layout;
  const end = Math.max(0, Math.min(layout.width, x));
  const points: string[] = [];
  for (let px = 0; px < end; px += SAMPLE_STEP) points.push(`${round(px)} ${round(trailY(px, curve))}`);
  points.push(`${round(end)} ${round(trailY(end, curve))}`);
  return `M${points.join(' L')}`;
}

function round(v: number): number {
  return Math.round(v * 10) / 10;
}
