import { describe, expect, it } from 'vitest';
import { clampStart, linkAtMoment, parseStartTime } from '@/features/tours/lib/start-time';

// Check values for the clock forms come from the W3C Media Fragments URI 1.0 (basic)
// Recommendation (25 September 2012), §4.2.1 temporal dimension, Normal Play Time: its examples
// "t=npt:10,20" → [10, 20), "t=npt:,121.5" → [0, 121.5), "t=0:02:00,121.5" → [120, 121.5) and
// "t=npt:120,0:02:01.5" → [120, 121.5) (example strings recalled from memory of the spec text).
// The "1m30s" form is common practice in shared video links (no published source).

describe('parseStartTime: W3C Media Fragments URI 1.0, npt start times', () => {
  it.each([
    ['npt:10,20', 10],
    ['npt:,121.5', 0],
    ['0:02:00,121.5', 120],
    ['npt:120,0:02:01.5', 120],
    ['121.5', 121.5],
    ['02:01.5', 121.5],
    ['1:02:03', 3723],
  ])('%s starts at %d s', (raw, seconds) => {
    expect(parseStartTime(raw)).toBeCloseTo(seconds, 9);
  });

  it('rejects minutes or seconds past 59 in clock form (npt-mm, npt-ss are 0–59)', () => {
    expect(parseStartTime('1:75')).toBeNull();
    expect(parseStartTime('0:60:00')).toBeNull();
  });
});

describe('parseStartTime: unit forms (common practice)', () => {
  it.each([
    ['1m30s', 90],
    ['90s', 90],
    ['2m', 120],
    ['1h2m3s', 3723],
    ['1H', 3600],
    ['2.5s', 2.5],
    ['2', 2],
  ])('%s → %d s', (raw, seconds) => {
    expect(parseStartTime(raw)).toBeCloseTo(seconds, 9);
  });

  it.each([[''], ['   '], ['abc'], ['-5'], ['1.2.3'], ['m'], ['s'], ['1m30'], ['1:2:3:4']])('%j is not a time', (raw) => {
    expect(parseStartTime(raw)).toBeNull();
  });

  it('treats a missing parameter as no start time', () => {
    expect(parseStartTime(null)).toBeNull();
    expect(parseStartTime(undefined)).toBeNull();
  });
});

describe('clampStart: a start time must fall inside the video', () => {
  it('keeps a time inside, drops one at or past the end and anything not positive', () => {
    expect(clampStart(2, 4)).toBe(2);
    expect(clampStart(4, 4)).toBe(0);
    expect(clampStart(10, 4)).toBe(0);
    expect(clampStart(-3, 4)).toBe(0);
    expect(clampStart(null, 4)).toBe(0);
    expect(clampStart(12, null)).toBe(12);
  });
});

describe('linkAtMoment (query parameters per the WHATWG URL Standard, URLSearchParams set/delete)', () => {
  it('adds ?t= in whole seconds, keeping the other parameters and dropping the fragment', () => {
    expect(linkAtMoment('https://grovewalk.invalid/tours/7?ref=club#about', 42.9)).toBe('https://grovewalk.invalid/tours/7?ref=club&t=42');
  });

  it('replaces an earlier t and removes it under one second', () => {
    expect(linkAtMoment('https://grovewalk.invalid/tours/7?t=90', 12)).toBe('https://grovewalk.invalid/tours/7?t=12');
    expect(linkAtMoment('https://grovewalk.invalid/tours/7?t=90', 0.4)).toBe('https://grovewalk.invalid/tours/7');
  });

  it('round-trips through parseStartTime', () => {
    const link = new URL(linkAtMoment('https://grovewalk.invalid/tours/3', 3723.6));
    expect(parseStartTime(link.searchParams.get('t'))).toBe(3723);
  });
});
