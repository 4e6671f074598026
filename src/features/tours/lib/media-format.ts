// Byte sizes use SI (decimal) prefixes, 1 kB = 1000 B and 1 MB = 10^6 B, the way file managers on
// most systems and disk makers count; a space separates a number from "%" as the SI writes it.

const UNITS = ['B', 'kB', 'MB', 'GB', 'TB'] as const;

/**
 * A file size an author recognises from their file manager ("80.0 MB"): SI prefixes, one decimal
 * from kB up, whole bytes below.
 */
export function formatBytes(bytes: number): string {
  if (!Number.isFinite(bytes) || bytes < 0) return '—';
  if (bytes < 1000) return `${Math.round(bytes)} B`;
  let value = bytes;
  let unit = 0;
  // 999.95 would print as "1000.0", so it already moves up a unit.
  while (value >= 999.95 && unit < UNITS.length - 1) {
    value /= 1000;
    unit += 1;
  }
  return `${value.toFixed(1)} ${UNITS[unit]}`;
}

/** Whole percent of work done, never 100 before the last byte so a bar does not claim to be finished early. */
export function percentOf(done: number, total: number): number {
  if (!(total > 0) || !(done > 0)) return 0;
  if (done >= total) return 100;
  return Math.min(99, Math.floor((done / total) * 100));
}

/** "12.3 MB of 80.0 MB · 15 %": what the upload bar says in words (also its aria-valuetext). */
export function uploadProgressText(sent: number, total: number): string {
  return `${formatBytes(sent)} of ${formatBytes(total)} · ${percentOf(sent, total)} %`;
}

/** A time in words for screen readers and titles, "4 minutes 5 seconds" (the clock itself is `clockText`). */
export function durationInWords(totalSeconds: number): string {
  const s = Math.max(0, Math.floor(totalSeconds + 1e-6));
  const parts: string[] = [];
  const h = Math.floor(s / 3600);
  const m = Math.floor((s % 3600) / 60);
  const sec = s % 60;
  if (h) parts.push(`${h} hour${h === 1 ? '' : 's'}`);
  if (m) parts.push(`${m} minute${m === 1 ? '' : 's'}`);
  if (sec || parts.length === 0) parts.push(`${sec} second${sec === 1 ? '' : 's'}`);
  return parts.join(' ');
}

/**
 * The worker's estimate of time left, rounded the way people say it: exact seconds would jump
 * about on every poll and suggest more precision than an estimate has.
 */
export function timeLeftText(etaSeconds: number | null | undefined): string {
  if (etaSeconds == null || !Number.isFinite(etaSeconds) || etaSeconds < 0) return 'working out the time left';
  if (etaSeconds < 10) return 'a few seconds left';
  if (etaSeconds < 60) return `about ${Math.round(etaSeconds / 5) * 5} seconds left`;
  const minutes = Math.round(etaSeconds / 60);
  if (minutes < 60) return `about ${minutes} minute${minutes === 1 ? '' : 's'} left`;
  const hours = Math.floor(minutes / 60);
  const rest = minutes % 60;
  return `about ${hours} h ${rest} min left`;
}

const dayFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });

/**
 * A calendar date from the API ("2026-05-14") as "14 May 2026". Read in UTC: the value is a day,
 * not a moment, and must not shift to the day before in time zones west of Greenwich.
 */
export function formatDay(isoDate: string | null | undefined): string | null {
  if (!isoDate) return null;
  const m = /^(\d{4})-(\d{2})-(\d{2})/.exec(isoDate);
  if (!m) return null;
  const date = new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])));
  return Number.isNaN(date.getTime()) ? null : dayFormat.format(date);
}
