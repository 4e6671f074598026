// A base that can never be a real site; only used to resolve and compare.
const BASE = 'http://grovewalk.invalid';

/**
 * Where to go after signing in: only a path inside this site, so a crafted link cannot send a
 * freshly signed-in person to another origin. The candidate is resolved with the browser's own
 * URL rules (which drop tabs and newlines and read "\" as "/"), and anything that would leave
 * this origin falls back to the home page.
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/')) return '/';
  let url: URL;
  try {
    url = new URL(next, BASE);
  } catch {
    return '/';
  }
  if (url.origin !== BASE || url.pathname.startsWith('//')) return '/';
  return url.pathname + url.search + url.hash;
}

/** Rough wait in words for a rate-limit answer that says how long to wait. */
export function waitInWords(seconds: number | null): string | null {
  if (seconds === null) return null;
  if (seconds < 60) return 'You can try again in less than a minute.';
  const minutes = Math.ceil(seconds / 60);
  return `You can try again in about ${minutes} minute${minutes === 1 ? '' : 's'}.`;
}
