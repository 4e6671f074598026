import { describe, expect, it } from 'vitest';
import {
  collectVttTimestamp,
  formatSrtTimestamp,
  formatVttTimestamp,
  parseSrtTimestamp,
  parseVttTimestamp,
} from '@shared/captions/timestamps';

describe('WebVTT timestamps (W3C WebVTT, "collect a WebVTT timestamp")', () => {
  it('reads hh:mm:ss.ttt and mm:ss.ttt, hours optional (spec steps 7 and 12)', () => {
    expect(parseVttTimestamp('00:00:01.000')).toBe(1000);
    expect(parseVttTimestamp('00:01.000')).toBe(1000);
    expect(parseVttTimestamp('01:02:03.004')).toBe(3_723_004);
    expect(parseVttTimestamp('59:59.999')).toBe(3_599_999);
  });

  it('takes one or more than two digits in the first field as hours (spec step 7)', () => {
    expect(parseVttTimestamp('0:00:01.000')).toBe(1000); // web-platform-tests timings-too-short, text1
    expect(parseVttTimestamp('000:00:01.000')).toBe(1000); // web-platform-tests timings-too-long, text1
    expect(parseVttTimestamp('100:00:00.000')).toBe(360_000_000);
    // A first field over 59 means hours, so the seconds field is then required.
    expect(parseVttTimestamp('60:00.000')).toBeNull();
  });

  it('rejects the malformed forms listed in web-platform-tests timings-too-short / timings-too-long', () => {
    for (const bad of ['00:0:00.000', '00:00:0.000', '00:00:00.00', '00:00:00.0000', '00:00', '00:00:00', '0000:00.000', '00::00.000', '00:000.000', '00:60.000', '00:00:60.000', '', '.000']) {
      expect(parseVttTimestamp(bad), bad).toBeNull();
    }
  });

  it('reports where the timestamp ends so timing lines can be split (spec step 11 "remainder")', () => {
    expect(collectVttTimestamp('x 00:01.500align:end', 2)).toEqual({ ms: 1500, next: 11 });
    expect(collectVttTimestamp('00:01.500', 1)).toBeNull();
  });

  it('writes hh:mm:ss.ttt with hours always present', () => {
    expect(formatVttTimestamp(0)).toBe('00:00:00.000');
    expect(formatVttTimestamp(137_440)).toBe('00:02:17.440');
    expect(formatVttTimestamp(3_599_999)).toBe('00:59:59.999');
    expect(formatVttTimestamp(360_000_001)).toBe('100:00:00.001');
    expect(() => formatVttTimestamp(-1)).toThrow(RangeError);
    expect(() => formatVttTimestamp(Number.NaN)).toThrow(RangeError);
  });
});

describe('SRT timestamps (Matroska specification, "SRT Subtitles")', () => {
  it('reads the example 00:02:17,440 as 137.440 s and 00:02:20,375 as 140.375 s', () => {
    expect(parseSrtTimestamp('00:02:17,440')).toBe(137_440);
    expect(parseSrtTimestamp('00:02:20,375')).toBe(140_375);
  });

  it('needs a comma and three millisecond digits; minutes and seconds stay below 60', () => {
    expect(parseSrtTimestamp('00:02:17.440')).toBeNull();
    expect(parseSrtTimestamp('00:02:17,44')).toBeNull();
    expect(parseSrtTimestamp('00:60:00,000')).toBeNull();
    expect(parseSrtTimestamp('00:00:60,000')).toBeNull();
  });

  it('writes HH:MM:SS,mmm', () => {
    expect(formatSrtTimestamp(137_440)).toBe('00:02:17,440');
    expect(formatSrtTimestamp(2_935)).toBe('00:00:02,935'); // the example's BlockDuration, written as a time
    expect(() => formatSrtTimestamp(-5)).toThrow(RangeError);
  });
});
