import { describe, expect, it } from 'vitest';
import { METRES_PER_FOOT } from '@shared/units';
import { nameInputOf, nameProblemsByField, namePreview, type NameFormValues } from '@/features/cultivars/lib/name-form';
import { colourField, heightForForm, traitsFromForm, type FieldSource } from '@/features/cultivars/lib/trait-form';

const name = (over: Partial<NameFormValues>): NameFormValues => ({
  genus: 'Acer',
  species: 'palmatum',
  infraspecificRank: '',
  infraspecificEpithet: '',
  groupName: '',
  epithet: 'Example Name',
  ...over,
});

describe('name fields checked as typed (ICNCP conventions, RHS "Recommended style for printing plant names"; examples from domain.md)', () => {
  it('accepts the correct forms and prints them with the botanical parts in italics', () => {
    expect(nameProblemsByField(name({}))).toEqual({});
    expect(nameProblemsByField(name({ species: '' }))).toEqual({});
    expect(nameProblemsByField(name({ groupName: 'Dissectum Group' }))).toEqual({});
    expect(namePreview(name({ groupName: 'Dissectum Group' }))).toEqual([
      { text: 'Acer palmatum', italic: true },
      { text: " (Dissectum Group) 'Example Name'", italic: false },
    ]);
  });

  it('puts each incorrect form under the field that holds it', () => {
    expect(Object.keys(nameProblemsByField(name({ epithet: '"Example Name"' })))).toEqual(['epithet']);
    expect(Object.keys(nameProblemsByField(name({ epithet: "cv. 'Example Name'" })))).toEqual(['epithet']);
    expect(Object.keys(nameProblemsByField(name({ epithet: 'example name' })))).toEqual(['epithet']);
    expect(Object.keys(nameProblemsByField(name({ genus: 'acer', species: 'Palmatum' }))).sort()).toEqual(['genus', 'species']);
    expect(Object.keys(nameProblemsByField(name({ groupName: 'dissectum group' })))).toEqual(['groupName']);
    expect(nameProblemsByField(name({ epithet: '' }))).toHaveProperty('epithet');
  });

  it('sends empty optional parts as null', () => {
    expect(nameInputOf(name({ species: ' ', groupName: '' }))).toMatchObject({ genus: 'Acer', species: null, groupName: null, infraspecificRank: null, epithet: 'Example Name' });
  });
});

function source(one: Record<string, string>, all: Record<string, string[]> = {}): FieldSource {
  return { one: (n) => one[n] ?? '', all: (n) => all[n] ?? [] };
}

describe('traits read from the form', () => {
  it('shows stored heights in feet with the exact foot (NIST SP 811: 8 m ≈ 26.2 ft, 4 m ≈ 13.1 ft)', () => {
    expect(heightForForm(8, 'imperial')).toBe('26.2');
    expect(heightForForm(4, 'imperial')).toBe('13.1');
    expect(heightForForm(2.5, 'metric')).toBe('2.5');
  });

  it('stores heights typed in feet as metres (1 ft = 0.3048 m exactly, NIST SP 811), to the centimetre', () => {
    const r = traitsFromForm(source({ heightMin: '10', heightMax: '13.1' }), 'imperial');
    expect(r).toEqual({ ok: true, traits: { heightM: { min: Math.round(10 * METRES_PER_FOOT * 100) / 100, max: 3.99 } } });
    expect(r.ok && r.traits?.heightM?.min).toBe(3.05);
  });

  it('reads a whole profile (fictional demo record Sora-no-hane)', () => {
    const r = traitsFromForm(
      source(
        { leafForm: 'dissectum', lobeMin: '7', lobeMax: '9', leafSize: 'small', heightMin: '1.5', heightMax: '2,5', growthRate: 'slow', container: 'good', zoneMin: '6a', zoneMax: '8b' },
        { [colourField('spring')]: ['deep-red'], [colourField('autumn')]: ['scarlet'], habit: ['weeping', 'mounding'], sun: ['full-sun', 'part-shade'] },
      ),
      'metric',
    );
    expect(r).toEqual({
      ok: true,
      traits: {
        leafForm: 'dissectum',
        lobeCount: { min: 7, max: 9 },
        leafSize: 'small',
        colours: { spring: ['deep-red'], autumn: ['scarlet'] },
        habit: ['weeping', 'mounding'],
        heightM: { min: 1.5, max: 2.5 },
        growthRate: 'slow',
        sunTolerance: ['full-sun', 'part-shade'],
        containerSuitability: 'good',
        hardiness: { min: '6a', max: '8b' },
      },
    });
  });

  it('treats an empty form as "not recorded"', () => {
    expect(traitsFromForm(source({}), 'metric')).toEqual({ ok: true, traits: null });
  });

  it('names the field to fix: half a pair, reversed ranges, the coldest zone after the warmest, too many lobes', () => {
    expect(traitsFromForm(source({ lobeMin: '5' }), 'metric')).toEqual({ ok: false, errors: { lobeMax: expect.stringMatching(/both ends/) } });
    expect(traitsFromForm(source({ lobeMin: '9', lobeMax: '7' }), 'metric')).toEqual({ ok: false, errors: { lobeMax: expect.stringMatching(/not be above/) } });
    expect(traitsFromForm(source({ heightMin: 'tall', heightMax: '3' }), 'metric')).toEqual({ ok: false, errors: { heightMin: expect.stringMatching(/number/) } });
    expect(traitsFromForm(source({ zoneMin: '8b', zoneMax: '6a' }), 'metric')).toEqual({ ok: false, errors: { zoneMax: 'Put the coldest zone first.' } });
    expect(traitsFromForm(source({ zoneMin: '6a' }), 'metric')).toEqual({ ok: false, errors: { zoneMax: expect.stringMatching(/both/) } });
    expect(traitsFromForm(source({ lobeMin: '3', lobeMax: '40' }), 'metric')).toEqual({ ok: false, errors: { lobeMax: expect.stringMatching(/at most 15/) } });
  });
});
