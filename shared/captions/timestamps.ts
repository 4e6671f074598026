// Timestamps for the two caption formats, always as integer milliseconds.
//
// WebVTT: W3C "WebVTT: The Web Video Text Tracks Format", "collect a WebVTT timestamp"
// (hours optional; when present two or more digits; minutes and seconds exactly two digits 00-59;
// "." and exactly three digits of milliseconds).
// SRT: no formal specification; the Matroska specification ("SRT Subtitles") shows
// hours:minutes:seconds,milliseconds, e.g. 00:02:17,440.

const MS_PER_SECOND = 1000;
const MS_PER_MINUTE = 60 * MS_PER_SECOND;
const MS_PER_HOUR = 60 * MS_PER_MINUTE;

function isDigit(ch: string | undefined): boolean {
  return ch !== undefined && ch >= '0' && ch <= '9';
}

function collectDigits(input: string, start: number): string {
  let end = start;
  while (isDigit(input[end])) end++;
  return input.slice(start, end);
}

/**
 * Reads a WebVTT timestamp starting at `position`, following the spec's "collect a WebVTT
 * timestamp" steps, so timing lines can be split exactly where a conforming parser would split
 * them (the settings start right after the returned `next` index).
 */
export function collectVttTimestamp(
  input: string,
  position: number,
): { ms: number; next: number } | null {
  let pos = position;
  if (!isDigit(input[pos])) return null;
  const first = collectDigits(input, pos);
  pos += first.length;
  const firstIsHours = first.length !== 2 || Number(first) > 59;
  if (input[pos] !== ':') return null;
  pos++;
  const second = collectDigits(input, pos);
  pos += second.length;
  if (second.length !== 2) return null;

  let hours: string;
  let minutes: string;
  let seconds: string;
  if (firstIsHours || input[pos] === ':') {
    if (input[pos] !== ':') return null;
    pos++;
    const third = collectDigits(input, pos);
    pos += third.length;
    if (third.length !== 2) return null;
    hours = first;
    minutes = second;
    seconds = third;
  } else {
    hours = '0';
    minutes = first;
    seconds = second;
  }
  if (input[pos] !== '.') return null;
  pos++;
  const fraction = collectDigits(input, pos);
  pos += fraction.length;
  if (fraction.length !== 3) return null;
  if (Number(minutes) > 59 || Number(seconds) > 59) return null;

  const ms =
    Number(hours) * MS_PER_HOUR +
    Number(minutes) * MS_PER_MINUTE +
    Number(seconds) * MS_PER_SECOND +
    Number(fraction);
  // Absurdly long hour fields would lose precision; treat them as unreadable.
  if (!Number.isSafeInteger(ms)) return null;
  return { ms, next: pos };
}

/** Parses a whole string as one WebVTT timestamp (e.g. "01:02.500" or "1:00:02.500"); null if it is not one. */
export function parseVttTimestamp(text: string): number | null {
  const result = collectVttTimestamp(text, 0);
  if (result === null || result.next !== text.length) return null;
  return result.ms;
}

function splitMs(ms: number, what: string): [string, string, string, string] {
  if (!Number.isFinite(ms) || ms < 0) {
    throw new RangeError(`${what} must be a finite, non-negative number of milliseconds (got ${ms})`);
  }
  const whole = Math.round(ms);
  const hours = Math.floor(whole / MS_PER_HOUR);
  const minutes = Math.floor((whole % MS_PER_HOUR) / MS_PER_MINUTE);
  const seconds = Math.floor((whole % MS_PER_MINUTE) / MS_PER_SECOND);
  const millis = whole % MS_PER_SECOND;
  return [
    String(hours).padStart(2, '0'),
    String(minutes).padStart(2, '0'),
    String(seconds).padStart(2, '0'),
    String(millis).padStart(3, '0'),
  ];
}

/** Writes hh:mm:ss.ttt (hours always present, so every cue line in our output has the same shape). */
export function formatVttTimestamp(ms: number): string {
  const [h, m, s, t] = splitMs(ms, 'A WebVTT timestamp');
  return `${h}:${m}:${s}.${t}`;
}

const SRT_TIMESTAMP = /^(\d+):(\d{2}):(\d{2}),(\d{3})$/;

/**
 * Parses one SRT timestamp, HH:MM:SS,mmm (hours may have more than two digits); null if the text
 * is not one. Lenient variants (a "." separator) are handled by the SRT parser, which reports them.
 */
export function parseSrtTimestamp(text: string): number | null {
  const match = SRT_TIMESTAMP.exec(text);
  if (!match) return null;
  const [, h, m, s, t] = match as unknown as [string, string, string, string, string];
  if (Number(m) > 59 || Number(s) > 59) return null;
  const ms = Number(h) * MS_PER_HOUR + Number(m) * MS_PER_MINUTE + Number(s) * MS_PER_SECOND + Number(t);
  return Number.isSafeInteger(ms) ? ms : null;
}

/** Writes HH:MM:SS,mmm, the form SRT readers expect. */
export function formatSrtTimestamp(ms: number): string {
  const [h, m, s, t] = splitMs(ms, 'An SRT timestamp');
  return `${h}:${m}:${s},${t}`;
}
