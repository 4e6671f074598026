// Trait words in a search, read in Grovewalk's own trait vocabulary (shared/traits.ts; the synonyms are
// Grovewalk's plain-English choices, common practice, no source). Zone checks follow the USDA Plant
// Hardiness Zone Map's half zones (a colder, b warmer; docs/domain.md). Every record here is invented.
import { describe, expect, it } from 'vitest';
import { parseTraitWords, traitReason } from '../../../shared/search/trait-words';
import type { TraitProfile } from '../../../shared/traits';

const terms = (q: string) => parseTraitWords(q).terms.map(({ trait, value, label }) => ({ trait, value, label }));

describe('parseTraitWords', () => {
  it('reads habits, leaf forms, sizes, containers and bark', () => {
    expect(terms('weeping')).toEqual([{ trait: 'habit', value: 'weeping', label: 'Weeping habit' }]);
    expect(terms('lace')).toEqual([{ trait: 'leafForm', value: 'dissectum', label: 'Cut to the base, lace-like (Dissectum-like)' }]);
    expect(terms('dwarf for a container')).toEqual([
      { trait: 'heightClass', value: 'dwarf', label: 'Dwarf' },
      { trait: 'containerSuitability', value: 'good', label: 'Suits a container' },
    ]);
    expect(terms('upright variegated')).toEqual([
      { trait: 'habit', value: 'upright', label: 'Upright habit' },
      { trait: 'colours', value: 'variegated', label: 'Variegated leaves' },
    ]);
  });

  it('reads the longest phrase: "coral bark" and "coral red bark" are bark, "coral" alone a leaf colour', () => {
    expect(terms('coral bark')).toEqual([{ trait: 'bark', value: 'coral-red', label: 'Coral-red bark' }]);
    expect(terms('coral-red bark')).toEqual([{ trait: 'bark', value: 'coral-red', label: 'Coral-red bark' }]);
    expect(terms('red twigs')).toEqual([{ trait: 'bark', value: 'coral-red', label: 'Coral-red bark' }]);
    expect(terms('coral')).toEqual([{ trait: 'colours', value: 'coral', label: 'Coral leaves' }]);
  });

  it('reads colour families and narrows them to the seasons named anywhere in the search', () => {
    expect(terms('red')).toEqual([{ trait: 'colours', value: 'red', label: 'Red leaves' }]);
    expect(terms('autumn red')).toEqual([{ trait: 'colours', value: 'red', label: 'Red in autumn' }]);
    expect(terms('red in fall')).toEqual([{ trait: 'colours', value: 'red', label: 'Red in autumn' }]);
    expect(terms('weeping red')).toEqual([
      { trait: 'habit', value: 'weeping', label: 'Weeping habit' },
      { trait: 'colours', value: 'red', label: 'Red leaves' },
    ]);
    expect(terms('deep red spring')).toEqual([{ trait: 'colours', value: 'deep-red', label: 'Deep red in spring' }]);
  });

  it('reads hardiness zones as on the USDA map ("zone 6" is 6a and 6b) and ignores zones off the map', () => {
    const [z6] = parseTraitWords('zone 6').terms;
    expect(z6).toMatchObject({ trait: 'hardiness', value: '6', zones: ['6a', '6b'] });
    expect(parseTraitWords('z7b').terms[0]).toMatchObject({ zones: ['7b'] });
    expect(parseTraitWords('zone 14').terms).toEqual([]);
  });

  it('ignores ordinary words and the species epithet "palmatum", and skips words a name already took', () => {
    expect(terms('maple by the gate')).toEqual([]);
    expect(terms('palmatum')).toEqual([]);
    // Words 0 and 1 ("coral lantern") belong to a name; only "weeping" is a trait.
    expect(parseTraitWords('coral lantern weeping', new Set([0, 1])).terms.map((t) => t.trait)).toEqual(['habit']);
  });
});

describe('traitReason', () => {
  // Invented record.
  const profile: TraitProfile = {
    habit: ['weeping', 'mounding'],
    bark: ['coral-red'],
    leafForm: 'dissectum',
    heightM: { min: 1, max: 1.8 },
    containerSuitability: 'good',
    colours: { spring: ['deep-red'], autumn: ['scarlet', 'gold'] },
    hardiness: { min: '5b', max: '8a' },
  };
  const reason = (q: string, p: TraitProfile | null = profile) => parseTraitWords(q).terms.map((t) => traitReason(p, t));

  it('says which seasons and palette colours satisfied a colour term', () => {
    expect(reason('red')[0]).toEqual({ kind: 'trait', trait: 'colours', value: 'red', label: 'Red leaves', seasons: ['spring', 'autumn'], colours: ['deep-red', 'scarlet'] });
    expect(reason('autumn red')[0]).toMatchObject({ seasons: ['autumn'], colours: ['scarlet'] });
    expect(reason('summer red')[0]).toBeNull();
    expect(reason('gold')[0]).toMatchObject({ seasons: ['autumn'], colours: ['gold'] });
  });

  it('checks habit, bark, leaf form, container and dwarf size (under 2 m counts as dwarf)', () => {
    expect(reason('weeping coral bark lace container dwarf').every((r) => r !== null)).toBe(true);
    expect(reason('upright')[0]).toBeNull();
    expect(reason('dwarf', { heightM: { min: 2, max: 3 } })[0]).toBeNull();
    expect(reason('dwarf', { heightClass: 'dwarf' })[0]).toMatchObject({ value: 'dwarf' });
  });

  it('accepts a zone inside the record’s range, half zones included', () => {
    expect(reason('zone 5')[0]).not.toBeNull(); // 5b is in range
    expect(reason('zone 5a')[0]).toBeNull();
    expect(reason('zone 8')[0]).not.toBeNull(); // 8a is in range
    expect(reason('zone 8b')[0]).toBeNull();
  });

  it('treats a missing trait as unknown, never as a match', () => {
    expect(reason('weeping red', null)).toEqual([null, null]);
    expect(reason('weeping', {})).toEqual([null]);
  });
});
