import { describe, expect, it } from 'vitest';
import { checkTimeInput, formatTimeInput, parseTimeInput } from '@/lib/time-input';

// Check values: W3C "WebVTT: The Web Video Text Tracks Format" timestamp syntax (hours optional;
// minutes and seconds two digits 00-59; "." and three digits of milliseconds), and the Matroska
// specification's SRT example 00:02:17,440, which starts at 137.440 s.

describe('time fields read WebVTT timestamps', () => {
  it('reads mm:ss.ttt and hh:mm:ss.ttt as the spec defines them', () => {
    expect(parseTimeInput('02:17.440')).toBe(137_440);
    expect(parseTimeInput('00:02:17.440')).toBe(137_440);
    expect(parseTimeInput('01:00:00.000')).toBe(3_600_000);
    expect(parseTimeInput('00:00.000')).toBe(0);
  });

  it('accepts the friendlier forms people type: one-digit minutes, no or short fraction, a comma as in SRT', () => {
    expect(parseTimeInput('2:17.44')).toBe(137_440);
    expect(parseTimeInput('02:17')).toBe(137_000);
    expect(parseTimeInput(' 2:17.4 ')).toBe(137_400);
    expect(parseTimeInput('00:02:17,440')).toBe(137_440);
  });

  it('refuses what is not a WebVTT time: seconds or minutes over 59, missing parts, letters', () => {
    for (const bad of ['02:60.000', '60:00.000', '17.440', '2:7.440', 'abc', '', '01:02.5000', '-00:01.000']) {
      expect(parseTimeInput(bad), bad).toBeNull();
    }
  });

  it('writes times without hours under an hour and with them past it, and reads its own output back', () => {
    expect(formatTimeInput(137_440)).toBe('02:17.440');
    expect(formatTimeInput(3_723_004)).toBe('01:02:03.004');
    for (const ms of [0, 1, 999, 59_999, 60_000, 3_599_999, 3_600_000, 86_399_999]) {
      expect(parseTimeInput(formatTimeInput(ms))).toBe(ms);
    }
  });

  it('checks a field against the video length and says how to type a time', () => {
    expect(checkTimeInput('00:05.000', 4000)).toEqual({ ok: false, message: 'The video ends at 00:04.000.' });
    expect(checkTimeInput('00:04.000', 4000)).toEqual({ ok: true, ms: 4000 });
    const bad = checkTimeInput('soon', null);
    expect(bad.ok).toBe(false);
    expect(bad.ok ? '' : bad.message).toMatch(/01:02\.500/);
  });
});
