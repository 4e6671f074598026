import fc from 'fast-check';
import talismanDamerauLevenshtein from 'talisman/metrics/damerau-levenshtein';
import talismanJaro from 'talisman/metrics/jaro';
import talismanJaroWinkler from 'talisman/metrics/jaro-winkler';
import { describe, expect, it } from 'vitest';
import {
  damerauLevenshtein,
  damerauLevenshteinCodes,
  editSimilarity,
  jaro,
  jaroWinkler,
  keysShare,
  phoneticKeys,
} from '../../../shared/names/similarity';

const codes = (s: string) => Uint16Array.from(s, (c) => c.charCodeAt(0));
// Random strings over a small alphabet so swaps, repeats and shared letters are frequent.
const smallWord = fc.string({ unit: fc.constantFrom('a', 'b', 'c', 'd', 'e', 'k', 'o'), minLength: 0, maxLength: 12 });
const SEED = 20250917;

describe('damerauLevenshtein (restricted / optimal string alignment)', () => {
  it('CA → ABC is 3 in the restricted form (docs/domain.md check value; the true form gives 2)', () => {
    expect(damerauLevenshtein('CA', 'ABC')).toBe(3);
  });

  it('kitten → sitting is 3 (the classic Levenshtein worked example: two substitutions and one insertion)', () => {
    expect(damerauLevenshtein('kitten', 'sitting')).toBe(3);
  });

  it('counts an adjacent swap as one edit, where plain Levenshtein needs two (Damerau 1964, common practice)', () => {
    expect(damerauLevenshtein('hoshi', 'hsohi')).toBe(1);
    expect(damerauLevenshtein('', 'abc')).toBe(3);
    expect(damerauLevenshtein('abc', '')).toBe(3);
  });

  it('with a bound, reports bound + 1 once the distance exceeds it', () => {
    expect(damerauLevenshtein('kitten', 'sitting', 1)).toBe(2);
    expect(damerauLevenshtein('kitten', 'sitting', 3)).toBe(3);
  });

  it("agrees with talisman's damerau-levenshtein (npm reference implementation) on 500 random pairs", () => {
    fc.assert(
      fc.property(smallWord, smallWord, (a, b) => {
        expect(damerauLevenshtein(a, b)).toBe(talismanDamerauLevenshtein(a, b));
      }),
      { numRuns: 500, seed: SEED },
    );
  });

  it("the code-buffer form agrees with talisman, bounded or not, on 300 random pairs", () => {
    fc.assert(
      fc.property(smallWord, smallWord, fc.integer({ min: 0, max: 6 }), (a, b, max) => {
        const reference = talismanDamerauLevenshtein(a, b);
        expect(damerauLevenshteinCodes(codes(a), a.length, codes(b), b.length)).toBe(reference);
        expect(damerauLevenshteinCodes(codes(a), a.length, codes(b), b.length, max)).toBe(Math.min(reference, max + 1));
      }),
      { numRuns: 300, seed: SEED + 1 },
    );
  });

  it('editSimilarity scales by the longer length (1 − 3/7 for kitten/sitting)', () => {
    expect(editSimilarity('kitten', 'sitting')).toBeCloseTo(1 - 3 / 7, 12);
    expect(editSimilarity('', '')).toBe(1);
  });
});

describe('Jaro and Jaro-Winkler (p = 0.1)', () => {
  // Published check values listed in docs/domain.md (Winkler's worked examples).
  const cases: [string, string, number, number][] = [
    ['MARTHA', 'MARHTA', 0.944, 0.961],
    ['DWAYNE', 'DUANE', 0.822, 0.84],
    ['DIXON', 'DICKSONX', 0.767, 0.813],
  ];
  for (const [a, b, j, jw] of cases) {
    it(`${a}/${b}: Jaro ${j}, Jaro-Winkler ${jw} (docs/domain.md check values)`, () => {
      expect(jaro(a, b)).toBeCloseTo(j, 3);
      expect(jaroWinkler(a, b)).toBeCloseTo(jw, 3);
    });
  }

  it('gives 1 for identical strings and 0 with nothing in common', () => {
    expect(jaroWinkler('kagura', 'kagura')).toBe(1);
    expect(jaro('abc', 'xyz')).toBe(0);
    expect(jaro('', 'abc')).toBe(0);
  });

  it("agrees with talisman's jaro and jaro-winkler (npm reference implementation) on 500 random pairs", () => {
    fc.assert(
      fc.property(smallWord, smallWord, (a, b) => {
        expect(jaro(a, b)).toBeCloseTo(talismanJaro(a, b), 12);
        expect(jaroWinkler(a, b)).toBeCloseTo(talismanJaroWinkler(a, b), 12);
      }),
      { numRuns: 500, seed: SEED + 2 },
    );
  });
});

describe('phoneticKeys (double-metaphone)', () => {
  // Examples from the double-metaphone package README ("Use" section), v2.0.1.
  const readme: [string, [string, string]][] = [
    ['michael', ['MKL', 'MXL']],
    ['crevalle', ['KRFL', 'KRF']],
    ['Filipowitz', ['FLPTS', 'FLPFX']],
    ['Xavier', ['SF', 'SFR']],
    ['delicious', ['TLSS', 'TLXS']],
    ['acceptingness', ['AKSPTNNS', 'AKSPTNKNS']],
    ['allegrettos', ['ALKRTS', 'AKRTS']],
  ];
  for (const [word, keys] of readme) {
    it(`${word} → ${keys.join(' / ')} (double-metaphone README)`, () => {
      expect(phoneticKeys(word)).toEqual(keys);
    });
  }

  it('keysShare is true when any primary or alternate key is shared', () => {
    expect(keysShare(['MKL', 'MXL'], ['MXL', 'MXL'])).toBe(true);
    expect(keysShare(['SF', 'SFR'], ['KRFL', 'KRF'])).toBe(false);
  });
});
