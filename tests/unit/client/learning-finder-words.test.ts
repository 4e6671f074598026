import { describe, expect, it } from 'vitest';
import { scoreCandidates } from '@shared/finder/score';
import type { TraitProfile } from '@shared/traits';
import { answerText, evidenceChips, orderedOptions, recordValueText, scorePercent } from '@/features/finder/lib/finder-words';
import { heightClassLabel, leafSizeLabel, seasonForMonth } from '@/lib/trait-words';

// An invented record (fictional, for this test only): a weeping lace-leaf, red in spring.
const FEATHER: TraitProfile = {
  leafForm: 'dissectum',
  lobeCount: { min: 7, max: 9 },
  leafSize: 'small',
  colours: { spring: ['deep-red'], autumn: ['gold', 'orange'] },
  habit: ['weeping', 'mounding'],
  heightM: { min: 1.5, max: 2.5 },
};

describe('sizes in the reader unit (NIST SP 811 App. B: 1 ft = 0.3048 m, 1 in = 2.54 cm exactly)', () => {
  it('height classes: 8 m ≈ 26.2 ft and 4 m ≈ 13.1 ft (NIST check values), shown rounded to whole feet above 10', () => {
    expect(heightClassLabel('large', 'metric')).toBe('Over 8 m');
    expect(heightClassLabel('large', 'imperial')).toBe('Over 26 ft');
    expect(heightClassLabel('small', 'imperial')).toBe('7–13 ft');
    expect(heightClassLabel('dwarf', 'imperial')).toBe('Under 6.6 ft');
  });

  it('leaf sizes: 5 cm = 1.97 in, 10 cm = 3.94 in', () => {
    expect(leafSizeLabel('small', 'metric')).toBe('Small (under 5 cm)');
    expect(leafSizeLabel('small', 'imperial')).toBe('Small (under 2 in)');
    expect(leafSizeLabel('medium', 'imperial')).toBe('Medium (2–3.9 in)');
    expect(leafSizeLabel('large', 'metric')).toBe('Large (over 10 cm)');
  });
});

describe('finder chips say why a record ranks where it does', () => {
  const answers = { leafForm: 'dissectum', habit: 'upright', colour: { season: 'spring', colour: 'scarlet' }, bark: 'grey' } as const;
  const [scored] = scoreCandidates([{ id: 'feather', traits: FEATHER }], answers);

  it('the shared scoring sorts the answers into matched, partial, conflicted and unknown', () => {
    // Hand-worked from shared/finder/score.ts: leaf form equal (1); habit not listed (0);
    // scarlet vs deep red, same red family (0.5); bark not on the record (unknown).
    expect(scored).toMatchObject({ matched: ['leafForm'], partial: ['colour'], conflicted: ['habit'], unknown: ['bark'] });
    // (1 + 0.5 + 0 + 0.5 prior) / (3 + 1) = 0.5
    expect(scorePercent(scored!.score)).toBe(50);
  });

  it('conflicts come first, each chip names the trait and what the record says', () => {
    const chips = evidenceChips({ ...scored!, traits: FEATHER }, answers, 'metric');
    expect(chips.map((c) => [c.kind, c.text])).toEqual([
      ['conflicted', 'Shape: weeping, low mound'],
      ['partial', 'Colour in spring: deep red'],
      ['matched', 'Leaf form: lace, cut to the base'],
    ]);
    expect(chips[0]!.description).toBe('Shape does not match your answer (upright); this record says weeping, low mound.');
  });

  it('values read in the reader unit', () => {
    expect(recordValueText('height', FEATHER, {}, 'imperial')).toBe('4.9–8.2 ft');
    expect(answerText('height', { height: { min: 3, max: 3 } }, 'metric')).toBe('About 3 m');
    expect(answerText('height', { height: 'medium' }, 'metric')).toBe('4–8 m');
    expect(recordValueText('bark', FEATHER, {}, 'metric')).toBeNull();
  });

  it('scores outside 0..1 or NaN cannot draw a broken bar', () => {
    expect(scorePercent(Number.NaN)).toBe(0);
    expect(scorePercent(1.2)).toBe(100);
    expect(scorePercent(0.875)).toBe(88);
  });
});

describe('answer options', () => {
  it('likely answers first in the given order, then the rest of the vocabulary once each', () => {
    const opts = orderedOptions('habit', [{ value: 'weeping' }, { value: 'mounding' }, { value: 'not-a-habit' }]);
    expect(opts.slice(0, 2)).toEqual([
      { value: 'weeping', likely: true },
      { value: 'mounding', likely: true },
    ]);
    expect(opts.map((o) => o.value).sort()).toEqual(['columnar', 'mounding', 'rounded', 'spreading', 'upright', 'vase', 'weeping']);
  });

  it('the season is guessed from the month for the northern hemisphere, none in winter (common practice, no source)', () => {
    expect([1, 3, 6, 9, 12].map(seasonForMonth)).toEqual([null, 'spring', 'summer', 'autumn', null]);
    expect(seasonForMonth(13)).toBeNull();
  });
});
