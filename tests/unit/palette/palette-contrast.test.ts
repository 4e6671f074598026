import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

// Lives outside tests/unit/client because it reads src/styles.css from disk (a Node API), and that
// folder is type-checked with the browser-only client config.

// WCAG 2.2, definitions of "relative luminance" and "contrast ratio": (L1 + 0.05) / (L2 + 0.05)
// with sRGB channels linearised. SC 1.4.3 asks 4.5:1 for body text; SC 1.4.11 asks 3:1 for the
// edges of inputs and for focus indicators against what surrounds them.
// (WCAG's text quotes the older 0.03928 sRGB threshold; 0.04045 from IEC 61966-2-1 gives the same
// result to well under 0.01 for 8-bit colours.)
function channel(value: number): number {
  const c = value / 255;
  return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}

function luminance(hex: string): number {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!m) throw new Error(`not a #rrggbb colour: ${hex}`);
  const [r, g, b] = [m[1]!, m[2]!, m[3]!].map((h) => channel(parseInt(h, 16)));
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
}

function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi! + 0.05) / (lo! + 0.05);
}

/** The palette as written in src/styles.css (`--color-name: #rrggbb;` inside @theme). */
function palette(): Record<string, string> {
  const css = readFileSync(new URL('../../../src/styles.css', import.meta.url), 'utf8');
  const theme = /@theme\s*{([\s\S]*?)}/.exec(css)?.[1] ?? '';
  const colours: Record<string, string> = {};
  for (const m of theme.matchAll(/--color-([a-z-]+):\s*(#[0-9a-fA-F]{6})\s*;/g)) colours[m[1]!] = m[2]!;
  return colours;
}

describe('contrast formula', () => {
  it('black on white is 21:1 and a colour on itself is 1:1 (WCAG 2.2 definition of contrast ratio)', () => {
    expect(contrast('#000000', '#ffffff')).toBeCloseTo(21, 6);
    expect(contrast('#5a7d3c', '#5a7d3c')).toBeCloseTo(1, 6);
  });

  it('#767676 on white is about 4.54:1 and #777777 about 4.48:1 (from memory: the usual "lightest AA grey" example)', () => {
    expect(contrast('#767676', '#ffffff')).toBeCloseTo(4.54, 2);
    expect(contrast('#777777', '#ffffff')).toBeCloseTo(4.48, 2);
  });
});

describe('Grovewalk palette meets WCAG 2.2 AA where it is used', () => {
  const colours = palette();

  // Text colour → the surfaces it is set on somewhere in src/.
  const textPairs: Array<[string, string[]]> = [
    ['ink', ['paper', 'card', 'moss-wash', 'bark-wash', 'maple-wash', 'ochre-wash']],
    ['ink-soft', ['paper', 'card', 'bark-wash']],
    ['moss', ['paper', 'card', 'moss-wash']],
    ['moss-deep', ['paper', 'card', 'moss-wash', 'bark-wash']],
    ['bark', ['paper', 'card', 'bark-wash']],
    ['maple', ['paper', 'card', 'maple-wash']],
    ['ochre', ['paper', 'ochre-wash']],
    ['card', ['moss', 'moss-deep', 'maple', 'maple-deep', 'bark']],
  ];
  // Input borders and the focus ring (drawn 2px outside the element, so on the page surface).
  const edgePairs: Array<[string, string[]]> = [
    ['edge', ['paper', 'card']],
    ['focus', ['paper', 'card', 'bark-wash']],
    ['maple', ['card']],
  ];

  it('defines every colour the checks refer to', () => {
    const names = new Set([...textPairs, ...edgePairs].flatMap(([fg, bgs]) => [fg, ...bgs]));
    expect([...names].filter((n) => !(n in colours))).toEqual([]);
  });

  it.each(textPairs)('text in %s reaches 4.5:1 on its surfaces (SC 1.4.3)', (fg, bgs) => {
    for (const bg of bgs) expect(contrast(colours[fg]!, colours[bg]!), `${fg} on ${bg}`).toBeGreaterThanOrEqual(4.5);
  });

  it.each(edgePairs)('%s reaches 3:1 against its surroundings (SC 1.4.11)', (fg, bgs) => {
    for (const bg of bgs) expect(contrast(colours[fg]!, colours[bg]!), `${fg} on ${bg}`).toBeGreaterThanOrEqual(3);
  });
});
