import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { safeNextPath, waitInWords } from '@/lib/next-path';

const SITE = 'https://grove.example';

describe('safeNextPath (after sign-in, never leave the site)', () => {
  it('keeps ordinary in-site paths with their query and fragment', () => {
    expect(safeNextPath('/account')).toBe('/account');
    expect(safeNextPath('/admin/users?q=ann&page=2#list')).toBe('/admin/users?q=ann&page=2#list');
  });

  // WHATWG URL Standard: "//host" is scheme-relative, "\" counts as "/" in http(s) URLs, and tab
  // and newline characters are removed before parsing, so each of these points at another origin.
  it.each(['//evil.example', '/\\evil.example', '/\t/evil.example', '/\n/evil.example', 'https://evil.example', 'evil', '', null, undefined])(
    'falls back to the home page for %j (WHATWG URL parsing rules)',
    (input) => {
      expect(safeNextPath(input)).toBe('/');
    },
  );

  it('never returns a path that starts with two slashes, even after dot segments are removed', () => {
    expect(safeNextPath('/.//evil.example')).toBe('/');
  });

  // Property checked against the WHATWG URL parser (Node's URL): whatever comes in, the result
  // resolves to this site's origin, is a plain path, and is stable when checked again.
  it('every result stays on the site under the WHATWG URL parser (property, fast-check)', () => {
    const tricky = fc.constantFrom('/', '\\', '.', '\t', '\n', ' ', '@', ':', '%', '2', 'F', '?', '#', 'e', 'x', 'h');
    fc.assert(
      fc.property(fc.array(tricky, { maxLength: 14 }), (chars) => {
        const out = safeNextPath(chars.join(''));
        expect(out.startsWith('/')).toBe(true);
        expect(out.startsWith('//')).toBe(false);
        expect(new URL(out, SITE).origin).toBe(SITE);
        expect(safeNextPath(out)).toBe(out);
      }),
      { numRuns: 3000 },
    );
  });
});

describe('waitInWords', () => {
  it('rounds a Retry-After wait up to whole minutes', () => {
    expect(waitInWords(null)).toBeNull();
    expect(waitInWords(30)).toBe('You can try again in less than a minute.');
    expect(waitInWords(60)).toBe('You can try again in about 1 minute.');
    expect(waitInWords(61)).toBe('You can try again in about 2 minutes.');
    expect(waitInWords(900)).toBe('You can try again in about 15 minutes.');
  });
});
