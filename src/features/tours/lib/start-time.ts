// Forms accepted for ?t=:
// - plain seconds and clock times as the W3C Media Fragments URI 1.0 temporal dimension writes
//   them (npt: "120", "121.5", "0:02:00", "02:01.5", an optional "npt:" prefix, and a "start,end"
//   range of which only the start is used; an empty start means 0);
// - "1m30s", "2h5m", "45s" (common practice in shared video links).

const NPT_SEC = /^(\d+)(?:\.(\d*))?$/;
const NPT_CLOCK = /^(?:(\d+):)?(\d{1,2}):(\d{1,2})(?:\.(\d*))?$/;
const UNITS = /^(?:(\d+)h)?(?:(\d+)m)?(?:(\d+(?:\.\d+)?)s)?$/;

function fraction(digits: string | undefined): number {
  return digits ? Number(`0.${digits}`) : 0;
}

/**
 * Seconds to start a tour at, from a shared link's ?t= value; null when the value is not a time
 * (the page then starts at the beginning instead of guessing).
 */
export function parseStartTime(raw: string | null | undefined): number | null {
  if (raw == null) return null;
  let value = raw.trim().toLowerCase();
  if (value.startsWith('npt:')) value = value.slice(4);
  const comma = value.indexOf(',');
  if (comma >= 0) {
    value = value.slice(0, comma);
    if (value === '') return 0;
  }
  if (value === '') return null;

  const sec = NPT_SEC.exec(value);
  if (sec) return Number(sec[1]) + fraction(sec[2]);

  const clock = NPT_CLOCK.exec(value);
  if (clock) {
    const hours = clock[1] ? Number(clock[1]) : 0;
    const minutes = Number(clock[2]);
    const seconds = Number(clock[3]);
    if (minutes > 59 || seconds > 59) return null;
    return hours * 3600 + minutes * 60 + seconds + fraction(clock[4]);
  }

  const units = UNITS.exec(value);
  if (units && (units[1] || units[2] || units[3])) {
    return Number(units[1] ?? 0) * 3600 + Number(units[2] ?? 0) * 60 + Number(units[3] ?? 0);
  }
  return null;
}

/** A start time that fits the video: inside [0, duration), or 0 when the link points past the end. */
export function clampStart(seconds: number | null, durationSec: number | null | undefined): number {
  if (seconds == null || !(seconds > 0)) return 0;
  if (durationSec != null && durationSec > 0 && seconds >= durationSec) return 0;
  return seconds;
}

/**
 * The address of this page at a moment of the video, whole seconds, for "Copy link at this
 * moment"; other query parameters stay as they are and a moment under a second drops ?t=.
 */
export function linkAtMoment(href: string, seconds: number): string {
  const url = new URL(href);
  const whole = Math.floor(Math.max(0, seconds));
  if (whole >= 1) url.searchParams.set('t', String(whole));
  else url.searchParams.delete('t');
  url.hash = '';
  return url.toString();
}
