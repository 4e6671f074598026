import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { replaceVariant } from '../../../shared/names/replace';

// Names are INVENTED (fictional Larkspur Lane Maple Circle).
describe('replaceVariant', () => {
  it('replaces whole-word occurrences, case-insensitively, keeping punctuation and possessives', () => {
    const text = "The hoshi kagura's bark; HOSHI KAGURA! and Hoshi Kagura, again.";
    expect(replaceVariant(text, 'hoshi kagura', 'Hoshi-kagura')).toEqual({
      text: "The Hoshi-kagura's bark; Hoshi-kagura! and Hoshi-kagura, again.",
      count: 3,
    });
  });

  it('tolerates extra spaces and hyphens between the words of the variant', () => {
    expect(replaceVariant('See the hoshi  -  kagura and the hoshi\u00a0kagura.', 'hoshi kagura', 'Hoshi-kagura')).toEqual({
      text: 'See the Hoshi-kagura and the Hoshi-kagura.',
      count: 2,
    });
  });

  it('never replaces part of a longer word, including accented letters', () => {
    const text = 'Hoshikagurani, xhoshi kagura, hoshi kaguras and éhoshi kagura stay.';
    expect(replaceVariant(text, 'hoshi kagura', 'Hoshi-kagura')).toEqual({ text, count: 0 });
  });

  it('treats regular-expression characters in the variant literally', () => {
    expect(replaceVariant('A.B. Lantern and AxB Lantern', 'A.B. Lantern', 'A.B. Lantern Hollow')).toEqual({
      text: 'A.B. Lantern Hollow and AxB Lantern',
      count: 1,
    });
    expect(replaceVariant('$& (Copper Wren)', '(Copper Wren)', '$&')).toEqual({ text: '$& $&', count: 1 });
  });

  it('does not count occurrences already spelt as accepted', () => {
    expect(replaceVariant('Copper Wren and copper wren', 'copper wren', 'Copper Wren')).toEqual({
      text: 'Copper Wren and Copper Wren',
      count: 1,
    });
  });

  it('returns the text untouched for an empty variant', () => {
    expect(replaceVariant('Copper Wren', '  ', 'X')).toEqual({ text: 'Copper Wren', count: 0 });
  });

  it('for one-word variants in ASCII text it agrees with ECMAScript \\b word boundaries (ECMA-262, RegExp)', () => {
    const word = fc.constantFrom('kagura', 'Kagura', 'KAGURA', 'kaguras', 'xkagura', 'the', 'tree', '42', 'kagura9');
    const gap = fc.constantFrom(' ', ', ', '. ', '-', ' (', ') ', '!', "'", '  ');
    fc.assert(
      fc.property(fc.array(fc.tuple(word, gap), { minLength: 1, maxLength: 12 }), (parts) => {
        const text = parts.map(([w, g]) => w + g).join('');
        const reference = text.replace(/\bkagura\b/gi, 'Kagura-X');
        const expectedCount = (text.match(/\bkagura\b/gi) ?? []).length;
        expect(replaceVariant(text, 'kagura', 'Kagura-X')).toEqual({ text: reference, count: expectedCount });
      }),
      { numRuns: 300, seed: 20250917 },
    );
  });
});
