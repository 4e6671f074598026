import { describe, expect, it } from 'vitest';
import {
  HEIGHT_CLASS_M,
  LEAF_FORMS,
  PLANT_COLOURS,
  TRAIT_LABELS,
  heightClassOf,
  traitProfileSchema,
} from '@shared/traits';

// Grovewalk's own vocabulary: these tests check its internal consistency; no outside source applies
// except where named.
describe('trait vocabulary', () => {
  it('names the Acer palmatum leaf classes from domain.md as plain leaf forms (common practice, from memory)', () => {
    for (const v of ['amoenum', 'palmatum', 'matsumurae', 'dissectum', 'linearilobum']) {
      expect(LEAF_FORMS).toContain(v);
    }
  });

  it('has a palette of 14 distinct colours, each with a 6-digit hex swatch', () => {
    expect(PLANT_COLOURS).toHaveLength(14);
    expect(new Set(PLANT_COLOURS.map((c) => c.id)).size).toBe(14);
    expect(new Set(PLANT_COLOURS.map((c) => c.hex)).size).toBe(14);
    for (const c of PLANT_COLOURS) expect(c.hex).toMatch(/^#[0-9a-f]{6}$/);
  });

  it('height bands tile 0–30 m without gaps', () => {
    expect(HEIGHT_CLASS_M.dwarf.max).toBe(HEIGHT_CLASS_M.small.min);
    expect(HEIGHT_CLASS_M.small.max).toBe(HEIGHT_CLASS_M.medium.min);
    expect(HEIGHT_CLASS_M.medium.max).toBe(HEIGHT_CLASS_M.large.min);
    expect(heightClassOf(1.99)).toBe('dwarf');
    expect(heightClassOf(2)).toBe('small');
    expect(heightClassOf(8)).toBe('large');
    expect(heightClassOf(45)).toBe('large');
  });

  it('labels every profile field', () => {
    expect(Object.keys(TRAIT_LABELS).sort()).toEqual(Object.keys(traitProfileSchema.shape).sort());
  });
});

describe('traitProfileSchema', () => {
  // Invented example (fictional cultivar of the Millbrook Garden Club demo), not a real plant.
  const invented = {
    leafForm: 'dissectum',
    lobeCount: { min: 7, max: 9 },
    leafSize: 'small',
    colours: { spring: ['purple-red'], autumn: ['scarlet', 'orange'] },
    bark: ['green'],
    habit: ['weeping', 'mounding'],
    heightClass: 'dwarf',
    heightM: { min: 1.5, max: 2.5 },
    growthRate: 'slow',
    sunTolerance: ['part-shade'],
    containerSuitability: 'good',
    hardiness: { min: '6a', max: '9a' },
  };

  it('accepts a full profile and an empty one (every trait optional)', () => {
    expect(traitProfileSchema.parse(invented)).toEqual(invented);
    expect(traitProfileSchema.parse({})).toEqual({});
  });

  it('rejects reversed ranges, unknown values, repeated list values and unknown fields', () => {
    expect(traitProfileSchema.safeParse({ lobeCount: { min: 9, max: 7 } }).success).toBe(false);
    expect(traitProfileSchema.safeParse({ lobeCount: { min: 5.5, max: 7 } }).success).toBe(false);
    expect(traitProfileSchema.safeParse({ colours: { autumn: ['teal'] } }).success).toBe(false);
    expect(traitProfileSchema.safeParse({ colours: { winter: ['green'] } }).success).toBe(false);
    expect(traitProfileSchema.safeParse({ bark: ['green', 'green'] }).success).toBe(false);
    expect(traitProfileSchema.safeParse({ habit: [] }).success).toBe(false);
    expect(traitProfileSchema.safeParse({ hardiness: { min: '9a', max: '6a' } }).success).toBe(false);
    expect(traitProfileSchema.safeParse({ hardiness: { min: '6a', max: '14a' } }).success).toBe(false);
    expect(traitProfileSchema.safeParse({ leafColour: 'red' }).success).toBe(false);
  });
});
