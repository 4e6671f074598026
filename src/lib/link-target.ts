/**
 * An address as the author typed it, made into a link target: a bare address gets https://,
 * mailto: stays, and every other scheme (javascript:, data:, file:…) is refused, matching the
 * server's allow-list so a link is not silently dropped on save.
 */
export function linkTarget(raw: string): string | null {
  const value = raw.trim();
  if (!value) return null;
  if (/^mailto:[^\s@]+@[^\s@]+$/i.test(value)) return value;
  // "example.org:8080" is a host and port, not a scheme.
  const hasScheme = /^[a-z][a-z0-9+.-]*:(?!\d)/i.test(value);
  try {
    const url = new URL(hasScheme ? value : `https://${value}`);
    if (url.protocol !== 'http:' && url.protocol !== 'https:') return null;
    // A bare word ("maples") is far more often a slip than a host name.
    if (!hasScheme && !url.hostname.includes('.')) return null;
    return url.toString();
  } catch {
    return null;
  }
}

