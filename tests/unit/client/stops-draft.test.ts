import { describe, expect, it } from 'vitest';
import { stopInput } from '@shared/schemas/stops';
import { DEFAULT_STOP_MS, draftAtPlayhead, draftFromCue, overlapsAny, stopIndexAt } from '@/features/stops/lib/stop-draft';
import { msAtFraction, percentAt, scaleMarks } from '@/features/stops/lib/timeline-scale';
import { clockText } from '@/lib/tour-moment';

// Stop ranges are half-open, [start, end), like WebVTT cue timings in the HTML standard's "text
// track cue" rules: a stop ending at 10 s and one starting at 10 s do not overlap. The ten-second
// default is Grovewalk's own; the one-second minimum is the shared stop schema's, which the
// server applies, so every draft is checked against that schema too. Stop titles are invented.

const stops = [
  { startMs: 10_000, endMs: 20_000, title: 'Lantern Moss' },
  { startMs: 25_000, endMs: 30_000, title: '' },
];

function valid(d: ReturnType<typeof draftAtPlayhead>) {
  if (!d.ok) throw new Error(d.message);
  return stopInput.safeParse({ startMs: d.startMs, endMs: d.endMs, title: '', cultivarId: null }).success;
}

describe('a new stop at the playhead', () => {
  it('lasts ten seconds when nothing follows closely', () => {
    expect(draftAtPlayhead([], 2000, 60_000)).toEqual({ ok: true, startMs: 2000, endMs: 2000 + DEFAULT_STOP_MS });
    expect(valid(draftAtPlayhead([], 2000, 60_000))).toBe(true);
  });
  it('ends where the next stop begins, or at the end of the video', () => {
    expect(draftAtPlayhead(stops, 20_000, 60_000)).toEqual({ ok: true, startMs: 20_000, endMs: 25_000 });
    expect(draftAtPlayhead(stops, 55_000, 60_000)).toEqual({ ok: true, startMs: 55_000, endMs: 60_000 });
    expect(valid(draftAtPlayhead(stops, 20_000, 60_000))).toBe(true);
  });
  it('refuses a moment inside a stop, naming it, and less than a second before the next one', () => {
    const inside = draftAtPlayhead(stops, 12_000, 60_000);
    expect(inside.ok).toBe(false);
    expect(inside.ok ? '' : inside.message).toMatch(/stop 1 \(“Lantern Moss”\), 00:10\.000–00:20\.000/);
    const tight = draftAtPlayhead(stops, 24_500, 60_000);
    expect(tight.ok ? '' : tight.message).toMatch(/next stop begins/);
    const end = draftAtPlayhead([], 59_500, 60_000);
    expect(end.ok ? '' : end.message).toMatch(/video ends/);
  });
});

describe('a new stop from a cue', () => {
  it('starts with the cue and covers at least the whole cue', () => {
    expect(draftFromCue([], { startMs: 3000, endMs: 5000 }, 60_000)).toEqual({ ok: true, startMs: 3000, endMs: 13_000 });
    expect(draftFromCue([], { startMs: 3000, endMs: 18_000 }, 60_000)).toEqual({ ok: true, startMs: 3000, endMs: 18_000 });
    expect(draftFromCue(stops, { startMs: 1000, endMs: 4000 }, 60_000)).toEqual({ ok: true, startMs: 1000, endMs: 10_000 });
  });
});

describe('ranges are half-open', () => {
  it('finds the stop at a moment and tests overlap without counting touching ends', () => {
    expect(stopIndexAt(stops, 10_000)).toBe(0);
    expect(stopIndexAt(stops, 20_000)).toBe(-1);
    expect(overlapsAny(stops, { startMs: 20_000, endMs: 25_000 })).toBe(false);
    expect(overlapsAny(stops, { startMs: 19_999, endMs: 21_000 })).toBe(true);
  });
});

describe('timeline scale', () => {
  it('places moments in per cent and back', () => {
    expect(percentAt(15_000, 60_000)).toBe(25);
    expect(percentAt(90_000, 60_000)).toBe(100);
    expect(msAtFraction(0.25, 60_000)).toBe(15_000);
    expect(msAtFraction(-1, 60_000)).toBe(0);
  });
  it('picks the smallest round step with at most eight labels (common practice: 1, 2, 5, 10, 15, 30 s …)', () => {
    expect(scaleMarks(40_000)).toEqual([0, 10_000, 20_000, 30_000, 40_000]);
    expect(scaleMarks(7000)).toEqual([0, 1000, 2000, 3000, 4000, 5000, 6000, 7000]);
    expect(scaleMarks(20 * 60_000).length).toBeLessThanOrEqual(8);
    expect(clockText(90_000)).toBe('1:30');
    expect(clockText(3_720_000)).toBe('1:02:00');
  });
});
