import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { colourSetDistance, jaccardDistance, nearestLookalikes, traitDistance, traitDistanceDetail } from '@shared/finder/lookalike';
import type { FinderRecord } from '@shared/finder/score';
import type { TraitProfile } from '@shared/traits';
import { LearningInputError } from '@shared/learning-error';

describe('Jaccard distance (Jaccard 1912: similarity = |A ∩ B| / |A ∪ B|)', () => {
  it('matches values worked by hand', () => {
    expect(jaccardDistance([1, 2, 3], [2, 3, 4])).toBeCloseTo(0.5, 12); // 2 shared of 4
    expect(jaccardDistance(['a'], ['a'])).toBe(0);
    expect(jaccardDistance(['a'], ['b'])).toBe(1);
    expect(jaccardDistance(['weeping', 'mounding'], ['weeping'])).toBeCloseTo(0.5, 12);
  });
});

describe('colour list distance with family credit (Grovewalk rule, worked by hand)', () => {
  it('averages the best matches both ways', () => {
    // gold→orange 0 (yellow vs orange family), orange→orange 1: mean 0.5; orange→{gold,orange}: 1;
    // similarity (0.5 + 1)/2 = 0.75 → distance 0.25
    expect(colourSetDistance(['gold', 'orange'], ['orange'])).toBeCloseTo(0.25, 12);
    // scarlet vs deep-red: same red family, 0.5 both ways → 0.5
    expect(colourSetDistance(['scarlet'], ['deep-red'])).toBeCloseTo(0.5, 12);
    expect(colourSetDistance(['lime'], ['near-black'])).toBe(1);
  });
});

// INVENTED profiles (fictional Millbrook Garden Club cultivars).
const ember: TraitProfile = {
  leafForm: 'dissectum',
  lobeCount: { min: 7, max: 9 },
  leafSize: 'small',
  colours: { autumn: ['gold', 'orange'] },
  habit: ['weeping', 'mounding'],
  heightClass: 'dwarf',
  bark: ['green'],
};
const brook: TraitProfile = {
  leafForm: 'dissectum',
  lobeCount: { min: 5, max: 7 },
  leafSize: 'medium',
  colours: { autumn: ['orange'] },
  habit: ['weeping'],
  heightM: { min: 1, max: 3 },
  sunTolerance: ['shade'],
};

/*
 * Gower's general coefficient (Gower 1971, Biometrics 27: 857–871, from memory): the mean of per-trait
 * distances, each scaled to 0..1, over the traits both records give.
 *   leafForm   dissectum = dissectum                              0
 *   lobeCount  midpoints 8 and 6, span 0–15: |8 − 6| / 15         0.133333
 *   leafSize   small (0) vs medium (1), 3 levels: 1/2             0.5
 *   autumn     {gold, orange} vs {orange} (see above)             0.25
 *   habit      Jaccard {weeping, mounding} vs {weeping}           0.5
 *   height     dwarf (0) vs 1–3 m → midpoint 2 m → small (1), 4 levels: 1/3   0.333333
 *   bark, sunTolerance: only one side gives them → not counted
 *   sum 1.716667 over 6 shared traits → 0.286111
 */
describe('traitDistance (Gower-style, hand-worked)', () => {
  it('gives the hand-computed distance over the 6 shared traits', () => {
    const d = traitDistanceDetail(ember, brook);
    expect(d?.shared).toBe(6);
    expect(d?.distance).toBeCloseTo(1.716667 / 6, 6);
  });

  it('is 0 for identical records, 1 for records that differ on every shared trait', () => {
    expect(traitDistance(ember, ember)).toBe(0);
    expect(traitDistance({ leafForm: 'dissectum', bark: ['green'] }, { leafForm: 'palmatum', bark: ['grey'] })).toBe(1);
  });

  it('is null (excluded) when a record has no traits or none are shared', () => {
    expect(traitDistance(ember, {})).toBeNull();
    expect(traitDistance({}, {})).toBeNull();
    expect(traitDistance({ bark: ['green'] }, { habit: ['upright'] })).toBeNull();
    // care traits are not looks: sharing only sun tolerance is "nothing to compare"
    expect(traitDistance({ sunTolerance: ['shade'] }, { sunTolerance: ['shade'] })).toBeNull();
  });

  it('is symmetric and within 0..1 (property)', () => {
    const profile = fc.record(
      {
        leafForm: fc.constantFrom('dissectum', 'palmatum', 'amoenum' as const),
        leafSize: fc.constantFrom('small', 'medium', 'large' as const),
        habit: fc.uniqueArray(fc.constantFrom('weeping', 'upright', 'vase' as const), { minLength: 1 }),
        heightClass: fc.constantFrom('dwarf', 'small', 'medium', 'large' as const),
        colours: fc.record({ autumn: fc.uniqueArray(fc.constantFrom('scarlet', 'gold', 'deep-red', 'orange' as const), { minLength: 1 }) }),
      },
      { requiredKeys: [] },
    );
    fc.assert(
      fc.property(profile, profile, (a, b) => {
        const ab = traitDistance(a, b);
        const ba = traitDistance(b, a);
        if (ab === null) {
          expect(ba).toBeNull();
        } else {
          expect(ba).toBeCloseTo(ab, 12);
          expect(ab).toBeGreaterThanOrEqual(0);
          expect(ab).toBeLessThanOrEqual(1);
        }
      }),
    );
  });
});

describe('nearestLookalikes', () => {
  const me: FinderRecord = { id: 'invented-ember', traits: ember };
  const others: FinderRecord[] = [
    me,
    { id: 'invented-brook', traits: brook },
    { id: 'invented-twin', traits: { ...ember, bark: ['grey'] } }, // differs only in bark: 1/7
    { id: 'invented-blank', traits: {} },
    { id: 'invented-far', traits: { leafForm: 'palmatum', leafSize: 'large', heightClass: 'large' } }, // 1, 1, 1 → 1
  ];

  it('lists the nearest first, leaving out the record itself and records with no traits', () => {
    const near = nearestLookalikes(me, others, 5);
    expect(near.map((n) => n.id)).toEqual(['invented-twin', 'invented-brook', 'invented-far']);
    expect(near[0]?.distance).toBeCloseTo(1 / 7, 12);
    expect(near[0]?.shared).toBe(7);
    expect(near[2]?.distance).toBe(1);
  });

  it('honours k and minShared', () => {
    expect(nearestLookalikes(me, others, 1).map((n) => n.id)).toEqual(['invented-twin']);
    expect(nearestLookalikes(me, others, 5, { minShared: 4 }).map((n) => n.id)).toEqual(['invented-twin', 'invented-brook']);
  });

  it('a record with no traits has no look-alikes; bad k throws', () => {
    expect(nearestLookalikes({ id: 'invented-blank', traits: {} }, others, 3)).toEqual([]);
    expect(() => nearestLookalikes(me, others, 0)).toThrow(LearningInputError);
    expect(() => nearestLookalikes(me, others, 1.5)).toThrow(LearningInputError);
    expect(() => nearestLookalikes(me, [...others, others[1] as FinderRecord], 2)).toThrow(LearningInputError);
  });
});
