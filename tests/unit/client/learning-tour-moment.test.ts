import { describe, expect, it } from 'vitest';
import { parseStartTime } from '@/features/tours/lib/start-time';
import { clipSrc, clockText, startParam, tourMomentHref } from '@/lib/tour-moment';

describe('links to a tour moment', () => {
  it('?t= in seconds, rounded down to a tenth so the player opens at or just before the stop', () => {
    expect(startParam(8000)).toBe('8');
    expect(startParam(12_549)).toBe('12.5');
    expect(startParam(-5)).toBe('0');
    expect(tourMomentHref(3, 61_250)).toBe('/tours/3?t=61.2');
  });

  it('the watch page reads our links back to the same second (contract with the tours page)', () => {
    for (const ms of [0, 8000, 12_500, 3_599_900]) {
      const t = new URL(`http://x${tourMomentHref(1, ms)}`).searchParams.get('t');
      expect(parseStartTime(t)).toBeCloseTo(Math.floor(ms / 100) / 10, 6);
    }
  });

  it('clock text', () => {
    expect(clockText(8000)).toBe('0:08');
    expect(clockText(61_999)).toBe('1:01');
    expect(clockText(3_725_000)).toBe('1:02:05');
    expect(clockText(-5)).toBe('0:00');
    expect(clockText(Number.NaN)).toBe('0:00');
  });
});

describe('clip addresses (W3C Media Fragments URI 1.0, temporal dimension "#t=start,end" in seconds)', () => {
  it('adds start and end, replacing a fragment already there', () => {
    expect(clipSrc('/media/tours/1/720p.mp4', 8000, 16_000)).toBe('/media/tours/1/720p.mp4#t=8,16');
    expect(clipSrc('/v.mp4#t=1', 2500, 4750)).toBe('/v.mp4#t=2.5,4.75');
  });

  it('a stop without a usable end plays from its start', () => {
    expect(clipSrc('/v.mp4', 3000, 3000)).toBe('/v.mp4#t=3');
  });
});
