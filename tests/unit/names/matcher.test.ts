import talismanDamerauLevenshtein from 'talisman/metrics/damerau-levenshtein';
import { describe, expect, it } from 'vitest';
import { buildNameIndex, findNames, type NameMatch } from '../../../shared/names/matcher';

// INVENTED records and caption lines (fictional Larkspur Lane Maple Circle tours). The
// look-alike pairs (Hoshi-kagura / Hoshi-kazura, Copper Wren / Copper Wick) test precision.
const records = [
  { id: 1, acceptedEpithet: 'Hoshi-kagura' },
  { id: 2, acceptedEpithet: 'Hoshi-kazura' },
  { id: 3, acceptedEpithet: 'Mizu-tsubame', variants: ['Mizu-tsubami'] },
  { id: 4, acceptedEpithet: 'Yuki-hotaru' },
  { id: 5, acceptedEpithet: 'Shindeshoku' },
  { id: 6, acceptedEpithet: 'Copper Wren' },
  { id: 7, acceptedEpithet: 'Copper Wick' },
  { id: 8, acceptedEpithet: 'Lantern Hollow' },
  { id: 9, acceptedEpithet: 'Tsukiyo-no-niwa' },
  { id: 10, acceptedEpithet: 'Aka' },
];
const index = buildNameIndex(records);

function only(text: string): NameMatch {
  const found = findNames(index, text);
  expect(found).toHaveLength(1);
  return found[0]!;
}

describe('findNames on caption lines with invented names', () => {
  it('finds the accepted epithet exactly, with a word-aligned span into the original text', () => {
    const text = 'Here on the left is my Hoshi-kagura, in full autumn colour.';
    const m = only(text);
    expect(m).toMatchObject({ recordId: 1, kind: 'exact', score: 1, matchedText: 'Hoshi-kagura' });
    expect(text.slice(m.start, m.end)).toBe('Hoshi-kagura');
  });

  it('treats a dropped hyphen and other case as the same words', () => {
    expect(only('and this little hoshi kagura was a cutting')).toMatchObject({ recordId: 1, kind: 'exact', matchedText: 'hoshi kagura' });
  });

  it('finds joined words and words split in the wrong place as fuzzy 0.99', () => {
    expect(only('The Hoshikagura by the gate.')).toMatchObject({ recordId: 1, kind: 'fuzzy', score: 0.99 });
    expect(only('This is the Shin deshoku, look at the spring leaves.')).toMatchObject({
      recordId: 5,
      kind: 'fuzzy',
      score: 0.99,
      matchedText: 'Shin deshoku',
    });
    expect(only('Hoshika Gura is next.')).toMatchObject({ recordId: 1, matchedText: 'Hoshika Gura' });
  });

  it('finds vowel swaps and slips, scoring 1 − distance / length (distance checked with talisman, npm reference)', () => {
    const m = only('Next to the shed is Hoshi-kagora, still quite young.');
    expect(m).toMatchObject({ recordId: 1, kind: 'fuzzy', matchedText: 'Hoshi-kagora' });
    const d = talismanDamerauLevenshtein('hoshikagura', 'hoshikagora');
    expect(m.score).toBeCloseTo(1 - d / 11, 3);
    expect(only('We potted up the Mizu subame last March.')).toMatchObject({ recordId: 3, kind: 'fuzzy' });
  });

  it('tells look-alike names apart', () => {
    expect(only('Hoshi-kazura sits in the sunniest corner.').recordId).toBe(2);
    expect(only('And the Hoshi-kagura behind it.').recordId).toBe(1);
    expect(only('I think the copper wik is the best.').recordId).toBe(7);
  });

  it('finds English sound-alikes (mishearings) through double-metaphone', () => {
    expect(only('Then the Yooky hotaru, which Odile grafted.')).toMatchObject({ recordId: 4, kind: 'phonetic', matchedText: 'Yooky hotaru' });
    expect(only('Copper Ren is a slow grower.')).toMatchObject({ recordId: 6, matchedText: 'Copper Ren' });
  });

  it('reports a recorded misspelling as a variant of its record', () => {
    expect(only('Priya brought the Mizu tsubami to the swap.')).toMatchObject({ recordId: 3, kind: 'variant', score: 1 });
  });

  it('returns several names in text order without overlaps', () => {
    const text = 'People confuse Hoshi-kagura with Hoshi-kazura, and the Lanturn Hollow with nothing.';
    const found = findNames(index, text);
    expect(found.map((m) => m.recordId)).toEqual([1, 2, 8]);
    for (let i = 1; i < found.length; i++) expect(found[i]!.start).toBeGreaterThanOrEqual(found[i - 1]!.end);
  });

  it('leaves punctuation, a possessive and caption markup out of the span', () => {
    const text = "<i>Tsukiyo no Niwa's</i> leaves (and Copper Wren!) glow.";
    const found = findNames(index, text);
    expect(found.map((m) => [m.recordId, m.matchedText])).toEqual([
      [9, 'Tsukiyo no Niwa'],
      [6, 'Copper Wren'],
    ]);
    expect(text.slice(found[0]!.start, found[0]!.end)).toBe('Tsukiyo no Niwa');
  });

  it('never puts a function word at the edge of a fuzzy match', () => {
    expect(only('that is the hoshy kagura on the left')).toMatchObject({ recordId: 1, matchedText: 'hoshy kagura' });
  });
});

describe('findNames precision on ordinary English (common practice: precision before recall)', () => {
  it.each([
    'The copper wire around the pot keeps the slugs off.',
    'A wren has nested in the ivy on the back fence again.',
    'We walked down the lane to the hollow oak at dusk.',
    'Mind the hose, I nearly tripped over it filming this.',
    'The garden is lovely in the morning when the sun hits the maples.',
    'Aha, there it is, the key to the shed.',
    'We had sushi and miso soup after the club meeting.',
  ])('finds nothing in: %s', (text) => {
    expect(findNames(index, text)).toEqual([]);
  });

  it('matches a name shorter than five letters only exactly', () => {
    expect(only('The Aka by the pond.')).toMatchObject({ recordId: 10, kind: 'exact' });
    expect(findNames(index, 'The Aki by the pond.')).toEqual([]);
  });
});

describe('findNames options', () => {
  it('a higher threshold turns a fuzzy match into a weaker phonetic one, or drops it without phonetics', () => {
    const text = 'Next to the shed is Hoshi-kagora.';
    expect(only(text)).toMatchObject({ kind: 'fuzzy', score: 0.909 });
    const strict = findNames(index, text, { threshold: 0.95 });
    expect(strict).toHaveLength(1);
    expect(strict[0]!.kind).toBe('phonetic');
    expect(strict[0]!.score).toBeLessThan(0.95);
    expect(findNames(index, text, { threshold: 0.95, phonetic: false })).toEqual([]);
  });

  it('ranks a sound-alike below the fuzzy threshold', () => {
    const m = only('Then the Yooky hotaru.');
    expect(m.kind).toBe('phonetic');
    expect(m.score).toBeLessThan(0.75);
  });

  it('phonetic: false drops sound-alike matches', () => {
    expect(findNames(index, 'Then the Yooky hotaru.', { phonetic: false })).toEqual([]);
  });

  it('maxWindowWords limits how many words a match may span', () => {
    expect(findNames(index, 'The Tsukiyo no Niwa.', { maxWindowWords: 2 })).toEqual([]);
  });

  it('an empty index finds nothing', () => {
    expect(findNames(buildNameIndex([]), 'Hoshi-kagura')).toEqual([]);
  });
});
