import { formatVttTimestamp, parseVttTimestamp } from '@shared/captions/timestamps';

/** The hint every time field shows, so authors learn one way of typing a moment. */
export const TIME_INPUT_HINT = 'minutes:seconds.milliseconds, e.g. 01:02.500';

/**
 * A moment as the caption and stop editors show it in their time fields: WebVTT's own timestamp
 * form with the hours left out under an hour ("01:02.500"), and kept past it ("01:00:02.500").
 */
export function formatTimeInput(ms: number): string {
  const full = formatVttTimestamp(Math.max(0, Math.round(ms)));
  return full.startsWith('00:') ? full.slice(3) : full;
}

// Friendlier forms than the strict WebVTT syntax, rewritten into it before the shared parser reads
// them: one-digit minutes ("1:02.5"), no fraction ("01:02"), a fraction of one or two digits.
const LOOSE = /^(?:(\d+):)?(\d{1,2}):(\d{2})(?:[.,](\d{1,3}))?$/;

/**
 * Reads what an author typed into a time field. The text is brought into WebVTT timestamp form
 * and then read with the same parser the caption import uses, so a field accepts exactly the
 * moments a caption file can hold; null when it is not a time.
 */
export function parseTimeInput(text: string): number | null {
  const trimmed = text.trim();
  const m = LOOSE.exec(trimmed);
  if (!m) return null;
  const [, hours, minutes, seconds, fraction] = m;
  const mm = (minutes ?? '').padStart(2, '0');
  const ms = (fraction ?? '').padEnd(3, '0');
  const vtt = hours !== undefined ? `${hours.padStart(2, '0')}:${mm}:${seconds}.${ms}` : `${mm}:${seconds}.${ms}`;
  return parseVttTimestamp(vtt);
}

/** The result of checking a time field: the moment, or the sentence to show under the field. */
export type TimeInputCheck = { ok: true; ms: number } | { ok: false; message: string };

/**
 * Checks a time field against the video: it must read as a time and, when the length is known,
 * not lie after the end (a cue or stop there would never show).
 */
export function checkTimeInput(text: string, durationMs: number | null | undefined): TimeInputCheck {
  const ms = parseTimeInput(text);
  if (ms === null) return { ok: false, message: `Type the time as ${TIME_INPUT_HINT}.` };
  if (durationMs != null && ms > durationMs) return { ok: false, message: `The video ends at ${formatTimeInput(durationMs)}.` };
  return { ok: true, ms };
}
