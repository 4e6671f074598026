// Folding, search words and highlight offsets. Outside sources: Unicode Standard Annex #15 (NFKD
// decomposes "é" to "e" + U+0301 and the "ﬁ" ligature to "fi"); the full-text operators are those of
// MariaDB's ft_boolean_syntax default "+ -><()~*:""&|" (MariaDB documentation). Whether the folding
// agrees with the database collation is checked against MariaDB itself in tests/integration/search.test.ts.
import { describe, expect, it } from 'vitest';
import { foldedWords, foldText, foldWithMap, markWords, mergeSpans, searchWords, snippetAround } from '../../../shared/search/text-fold';

describe('foldText', () => {
  it('removes accents after NFKD decomposition and lower-cases (UAX #15)', () => {
    expect(foldText('Café Ōtaki NAÏVE')).toBe('cafe otaki naive');
    expect(foldText('ﬁre')).toBe('fire');
    // Decomposed input folds the same as precomposed.
    expect(foldText('Cafe\u0301')).toBe(foldText('Café'));
  });
  it('expands ß to ss (common practice in collations; checked against MariaDB in the integration test)', () => {
    expect(foldText('Straße')).toBe('strasse');
  });
});

describe('foldText on plain ASCII', () => {
  it('gives what NFKD plus lower case gives for every ASCII character, alone and mixed with accented text (UAX #15)', () => {
    const all = Array.from({ length: 128 }, (_, i) => String.fromCharCode(i)).join('');
    const byDefinition = (t: string) => t.normalize('NFKD').replace(/\p{M}+/gu, '').toLowerCase();
    expect(foldText(all)).toBe(byDefinition(all));
    expect(foldText(`${all}é`)).toBe(`${byDefinition(all)}e`);
  });
});

describe('foldedWords', () => {
  it('keeps every word in order, repeats included', () => {
    expect(foldedWords('Érable, érable and the <i>Érable</i>.')).toEqual(['erable', 'erable', 'and', 'the', 'i', 'erable', 'i']);
  });
});

describe('foldWithMap', () => {
  it('maps every folded character back to the original characters it came from', () => {
    const { folded, starts, ends } = foldWithMap('aßé');
    expect(folded).toBe('asse');
    expect(starts).toEqual([0, 1, 1, 2]);
    expect(ends).toEqual([1, 2, 2, 3]);
  });
});

describe('searchWords', () => {
  it('keeps letters and digits only, so no full-text operator or LIKE wildcard survives (MariaDB ft_boolean_syntax)', () => {
    expect(searchWords('+Hoshi* -kagura "lace" (red) ~x <y> z: a&b | c@2 50% a_b')).toEqual(['hoshi', 'kagura', 'lace', 'red', 'x', 'y', 'z', 'a', 'b', 'c', '2', '50']);
    expect(searchWords('%_*+')).toEqual([]);
  });
  it('folds and drops repeats, keeping the first order', () => {
    expect(searchWords('Red red RÉD weeping')).toEqual(['red', 'weeping']);
  });
});

describe('markWords', () => {
  it('marks word starts (prefix) or whole words, in original offsets, merged', () => {
    const text = 'The Brindlewick Flame, brindled bark';
    const spans = markWords(text, [{ word: 'brind', prefix: true }]);
    expect(spans.map((s) => text.slice(s.start, s.end))).toEqual(['Brindlewick', 'brindled']);
    expect(markWords('kaori ao-shidare Ao', [{ word: 'ao', prefix: false }]).map((s) => [s.start, s.end])).toEqual([
      [6, 8],
      [17, 19],
    ]);
    // Not inside a word.
    expect(markWords('Kaori', [{ word: 'ao', prefix: true }])).toEqual([]);
  });
  it('maps matches on expanded letters back onto the original characters', () => {
    const text = 'In der Straße';
    const [s] = markWords(text, [{ word: 'strasse', prefix: false }]);
    expect(text.slice(s!.start, s!.end)).toBe('Straße');
    const accented = 'près du Café';
    const [c] = markWords(accented, [{ word: 'cafe', prefix: false }]);
    expect(accented.slice(c!.start, c!.end)).toBe('Café');
  });
});

describe('mergeSpans and snippetAround', () => {
  it('merges overlapping and touching spans', () => {
    expect(mergeSpans([{ start: 5, end: 8 }, { start: 0, end: 3 }, { start: 3, end: 4 }, { start: 7, end: 10 }])).toEqual([
      { start: 0, end: 4 },
      { start: 5, end: 10 },
    ]);
  });
  it('cuts a long text around the first hit at word breaks and moves the spans', () => {
    const words = Array.from({ length: 60 }, (_, i) => `word${i}`);
    words[40] = 'maple';
    const text = words.join(' ');
    const at = text.indexOf('maple');
    const snip = snippetAround(text, [{ start: at, end: at + 5 }], 80);
    expect(snip.text.startsWith('…')).toBe(true);
    expect(snip.text.endsWith('…')).toBe(true);
    expect(snip.highlights).toHaveLength(1);
    expect(snip.text.slice(snip.highlights[0]!.start, snip.highlights[0]!.end)).toBe('maple');
    // No word is cut in half.
    for (const w of snip.text.replace(/…/g, '').split(' ')) expect(w).toMatch(/^(word\d+|maple)$/);
    const short = snippetAround('A short text', [{ start: 2, end: 7 }]);
    expect(short).toEqual({ text: 'A short text', highlights: [{ start: 2, end: 7 }] });
  });
});
