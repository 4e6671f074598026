import { describe, expect, it } from 'vitest';
import { durationInWords, formatBytes, formatDay, percentOf, timeLeftText, uploadProgressText } from '@/features/tours/lib/media-format';
import { clockText } from '@/lib/tour-moment';

// Sources for the check values:
// - SI prefixes (BIPM, The International System of Units, 9th edition 2019, Table 7): k = 10^3,
//   M = 10^6, G = 10^9, T = 10^12, and the symbol for kilo is a lower-case "k". IEC 80000-13 keeps
//   Ki/Mi/Gi for powers of two, which is why 1 048 576 bytes is 1.0 MB here and not "1 MB" exactly.
// - A space between a number and "%" (SI Brochure, 9th edition, §5.4.7 — section number from memory).
// - Calendar dates YYYY-MM-DD (ISO 8601-1:2019, calendar date, extended format); 2024 is a leap year
//   in the Gregorian calendar (divisible by 4, not a century), 2023 is not.

describe('formatBytes: SI (decimal) prefixes, BIPM SI Brochure Table 7', () => {
  it.each([
    [0, '0 B'],
    [999, '999 B'],
    [1000, '1.0 kB'],
    [1500, '1.5 kB'],
    [12_300_000, '12.3 MB'],
    [80_000_000, '80.0 MB'],
    [1_048_576, '1.0 MB'], // 2^20 bytes: 1.048576 × 10^6, one MiB in IEC 80000-13 terms
    [4 * 1024 ** 3, '4.3 GB'], // 4 GiB = 4 294 967 296 B
    [2.5e12, '2.5 TB'],
  ])('%d bytes → %s', (bytes, text) => {
    expect(formatBytes(bytes)).toBe(text);
  });

  it('moves up a unit instead of printing 1000.0 (999 960 B rounds to 1000.0 kB → 1.0 MB)', () => {
    expect(formatBytes(999_960)).toBe('1.0 MB');
    expect(formatBytes(999_940)).toBe('999.9 kB');
  });

  it('refuses nonsense with a dash', () => {
    expect(formatBytes(-1)).toBe('—');
    expect(formatBytes(Number.NaN)).toBe('—');
  });
});

describe('upload progress wording (the example in the tours brief; % spacing per SI Brochure §5.4.7)', () => {
  it('reads "12.3 MB of 80.0 MB · 15 %"', () => {
    expect(uploadProgressText(12_300_000, 80_000_000)).toBe('12.3 MB of 80.0 MB · 15 %');
  });

  it('never says 100 % before the last byte, and says it after', () => {
    expect(percentOf(79_999_999, 80_000_000)).toBe(99);
    expect(percentOf(80_000_000, 80_000_000)).toBe(100);
    expect(percentOf(0, 80_000_000)).toBe(0);
    expect(percentOf(5, 0)).toBe(0);
  });
});

describe('clockText and durationInWords (h:mm:ss clock, common practice)', () => {
  it.each([
    [0, '0:00'],
    [7.9, '0:07'],
    [245, '4:05'],
    [3723, '1:02:03'],
    [36_000, '10:00:00'],
  ])('%d s → %s', (s, text) => {
    expect(clockText(s * 1000)).toBe(text);
  });

  it('says the same time in words', () => {
    expect(durationInWords(245)).toBe('4 minutes 5 seconds');
    expect(durationInWords(3601)).toBe('1 hour 1 second');
    expect(durationInWords(0)).toBe('0 seconds');
  });
});

describe('timeLeftText (rounded estimates, common practice)', () => {
  it('rounds the way people say it', () => {
    expect(timeLeftText(null)).toBe('working out the time left');
    expect(timeLeftText(4)).toBe('a few seconds left');
    expect(timeLeftText(33)).toBe('about 35 seconds left');
    expect(timeLeftText(61)).toBe('about 1 minute left');
    expect(timeLeftText(150)).toBe('about 3 minutes left');
    expect(timeLeftText(3 * 3600 + 10 * 60)).toBe('about 3 h 10 min left');
  });
});

describe('formatDay: ISO 8601 calendar dates read as days, not moments', () => {
  it('shows the day the author typed', () => {
    expect(formatDay('2026-05-14')).toBe('14 May 2026');
    expect(formatDay('2024-01-01')).toBe('1 January 2024');
  });

  it('knows 29 February only in leap years (Gregorian rule)', () => {
    expect(formatDay('2024-02-29')).toBe('29 February 2024');
    // Date.UTC rolls an impossible day over; the API never sends one, and the check shows the rule is applied.
    expect(formatDay('2023-02-29')).toBe('1 March 2023');
  });

  it('gives null for no date or a malformed one', () => {
    expect(formatDay(null)).toBeNull();
    expect(formatDay('14/05/2026')).toBeNull();
  });
});
