import { describe, expect, it } from 'vitest';
import { TRAIL_MIN_GAP, trailLayout, trailY, walkedPath } from '@/features/tours/lib/trail-layout';

// Spacing follows WCAG 2.2 Success Criterion 2.5.8 "Target Size (Minimum)": targets at least
// 24 by 24 CSS pixels, or spaced so a 24 px circle centred on each does not touch another target.
// Placing stops in proportion to their start time is common practice for timelines (no source).
// The stop times are from an invented walk of the fictional Fernhollow Maple Circle.

const WCAG_258_MIN_PX = 24;

/** The points of an "M x y L x y …" path. */
function pathPoints(d: string): { x: number; y: number }[] {
  return d
    .slice(1)
    .split(' L')
    .map((pair) => {
      const [x, y] = pair.split(' ').map(Number);
      return { x: x!, y: y! };
    });
}

/** The path's height at x, by straight lines between its points (what the browser draws). */
function pathYAt(d: string, x: number): number {
  const pts = pathPoints(d);
  for (let i = 1; i < pts.length; i++) {
    const a = pts[i - 1]!;
    const b = pts[i]!;
    if (x >= a.x && x <= b.x) return b.x === a.x ? a.y : a.y + ((b.y - a.y) * (x - a.x)) / (b.x - a.x);
  }
  return Number.NaN;
}

describe('trailLayout', () => {
  it('places stones in proportion to their start time when there is room', () => {
    const layout = trailLayout([0, 30_000, 60_000, 90_000], 120_000, { width: 1000, height: 92, pad: 20 });
    expect(layout.width).toBe(1000);
    const xs = layout.markers.map((m) => m.x);
    // 20 px pads, 960 px of path for 120 s: 8 px per second.
    expect(xs).toEqual([20, 260, 500, 740]);
    expect(layout.markers.map((m) => m.at)).toEqual([0, 0.25, 0.5, 0.75]);
  });

  it('puts every stone on the drawn path', () => {
    const layout = trailLayout([2000, 10_000, 18_000, 24_500], 30_000, { width: 720, height: 92 });
    for (const m of layout.markers) {
      expect(Math.abs(pathYAt(layout.path, m.x) - m.y)).toBeLessThan(0.75);
      expect(trailY(m.x, layout.curve)).toBeCloseTo(m.y, 6);
    }
    const ys = pathPoints(layout.path).map((p) => p.y);
    expect(Math.min(...ys)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...ys)).toBeLessThanOrEqual(92);
  });

  it('pushes crowded stones apart to at least the WCAG 2.5.8 spacing, keeping their order and the ends', () => {
    // Five stops within two seconds near the end of a long tour.
    const starts = [596_000, 596_500, 597_000, 597_500, 598_000];
    const layout = trailLayout(starts, 600_000, { width: 400, height: 92, pad: 22 });
    const xs = layout.markers.map((m) => m.x);
    for (let i = 1; i < xs.length; i++) {
      expect(xs[i]! - xs[i - 1]!).toBeGreaterThanOrEqual(TRAIL_MIN_GAP - 1e-9);
      expect(xs[i]! - xs[i - 1]!).toBeGreaterThanOrEqual(WCAG_258_MIN_PX);
    }
    expect(Math.max(...xs)).toBeLessThanOrEqual(layout.width - 22 + 1e-9);
    expect(Math.min(...xs)).toBeGreaterThanOrEqual(22);
  });

  it('grows wider than the screen (to scroll) when the stones cannot fit', () => {
    const starts = Array.from({ length: 30 }, (_, i) => i * 1000);
    const layout = trailLayout(starts, 30_000, { width: 320, height: 92, pad: 20 });
    expect(layout.width).toBe(2 * 20 + 29 * TRAIL_MIN_GAP);
    const xs = layout.markers.map((m) => m.x);
    for (let i = 1; i < xs.length; i++) expect(xs[i]! - xs[i - 1]!).toBeGreaterThanOrEqual(WCAG_258_MIN_PX);
  });

  it('draws the walked part up to a stone, on the same curve', () => {
    const layout = trailLayout([0, 60_000], 120_000, { width: 600, height: 92, pad: 20 });
    const walked = pathPoints(walkedPath(layout, layout.markers[1]!.x));
    expect(walked[0]!.x).toBe(0);
    expect(walked[walked.length - 1]!.x).toBeCloseTo(layout.markers[1]!.x, 1);
    for (const p of walked) expect(Math.abs(pathYAt(layout.path, p.x) - p.y)).toBeLessThan(0.75);
  });

  it('copes with a tour of unknown length and with no stops', () => {
    expect(trailLayout([], 0, { width: 300, height: 92 }).markers).toEqual([]);
    const unknown = trailLayout([0, 5000], 0, { width: 300, height: 92, pad: 20 });
    expect(unknown.markers[1]!.x).toBeLessThanOrEqual(280);
    expect(unknown.markers[1]!.x).toBeGreaterThan(unknown.markers[0]!.x);
  });
});
