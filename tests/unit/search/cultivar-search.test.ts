// Ranking and reasons of cultivar-record search over an in-memory catalogue of invented records
// (fictional epithets). The misspelling evidence comes from the shared name matcher, whose fuzzy
// scores are 1 − restricted Damerau-Levenshtein distance / length (checked against the talisman
// reference library in tests/unit/names/similarity.test.ts); here: "Brindlewik" is one deletion
// from "Brindlewick" (11 letters + "Flame", 16 letters joined → 1 − 1/16 = 0.9375). The order of
// the kinds of match (exact, variant, prefix, fuzzy, contains, traits) is Grovewalk's own rule.
import { describe, expect, it } from 'vitest';
import type { Cultivar } from '../../../server/db/entities/cultivar.entity';
import { buildNameIndex } from '../../../shared/names/matcher';
import { normalizeName } from '../../../shared/names/normalize';
import type { Catalogue } from '../../../server/modules/search/cultivar-catalogue';
import { searchCultivars } from '../../../server/modules/search/cultivar-search';
import type { TraitProfile } from '../../../shared/traits';

function catalogue(rows: { id: number; epithet: string; variants?: string[]; traits?: TraitProfile }[]): Catalogue {
  const records = rows.map((r) => {
    const cultivar = { id: r.id, epithet: r.epithet, acceptedName: `Acer palmatum '${r.epithet}'`, traits: r.traits ?? null } as Cultivar;
    return {
      cultivar,
      epithetFold: normalizeName(r.epithet),
      nameFold: normalizeName(cultivar.acceptedName),
      variants: (r.variants ?? []).map((text) => ({ text, fold: normalizeName(text) })),
    };
  });
  return {
    records,
    byId: new Map(records.map((r) => [r.cultivar.id, r])),
    index: buildNameIndex(rows.map((r) => ({ id: r.id, acceptedEpithet: r.epithet, variants: r.variants ?? [] }))),
  };
}

const cat = catalogue([
  { id: 1, epithet: 'Brindlewick Flame', variants: ['Brindelwick Flame'], traits: { habit: ['upright'], colours: { autumn: ['scarlet'] } } },
  { id: 2, epithet: 'Brindlewick', traits: { habit: ['weeping'] } },
  { id: 3, epithet: 'Ember Brindlewood', traits: { habit: ['weeping'], colours: { autumn: ['deep-red'] } } },
  { id: 4, epithet: 'Coral Lantern', traits: { bark: ['coral-red'], habit: ['weeping'] } },
]);

describe('searchCultivars', () => {
  it('ranks an exact name above a prefix match of another record', () => {
    const r = searchCultivars(cat, 'Brindlewick');
    expect(r.matches.map((m) => [m.record.cultivar.id, m.nameHow])).toEqual([
      [2, 'exact'],
      [1, 'prefix'],
    ]);
  });

  it('finds a recorded variant and a one-letter slip, with the matcher’s score', () => {
    expect(searchCultivars(cat, 'brindelwick flame').matches[0]).toMatchObject({ nameHow: 'variant', record: { cultivar: { id: 1 } } });
    const slip = searchCultivars(cat, 'Brindlewik Flame').matches[0]!;
    expect(slip.record.cultivar.id).toBe(1);
    expect(slip.reasons[0]).toMatchObject({ kind: 'name', how: 'fuzzy', heard: 'Brindlewik Flame' });
    expect((slip.reasons[0] as { score: number }).score).toBeCloseTo(1 - 1 / 16, 2);
  });

  it('finds part of a name at a word start above part inside a word', () => {
    const r = searchCultivars(cat, 'brindlewood');
    expect(r.matches.map((m) => m.record.cultivar.id)).toEqual([3]);
    expect(r.matches[0]!.reasons[0]).toMatchObject({ how: 'contains', score: 1 });
    const inside = searchCultivars(cat, 'ndlewo');
    expect(inside.matches[0]!.reasons[0]).toMatchObject({ how: 'contains', score: 0.8 });
  });

  it('requires every trait word, and ranks trait-only records below name matches', () => {
    const weepingRed = searchCultivars(cat, 'weeping red');
    expect(weepingRed.matches.map((m) => m.record.cultivar.id)).toEqual([3]);
    const weeping = searchCultivars(cat, 'weeping');
    expect(weeping.matches.map((m) => m.record.cultivar.id).sort()).toEqual([2, 3, 4]);
    expect(weeping.matches.every((m) => m.nameScore === 0 && m.score === 0.5)).toBe(true);
  });

  it('falls back to the records meeting the most trait words when none meets all', () => {
    const r = searchCultivars(cat, 'upright coral bark');
    // Record 1 is upright, record 4 has coral bark; neither has both.
    expect(r.matches.map((m) => m.record.cultivar.id).sort()).toEqual([1, 4]);
    expect(r.matches.every((m) => m.reasons.length === 1)).toBe(true);
  });

  it('does not read the words of a name it found as traits', () => {
    const r = searchCultivars(cat, 'Coral Lantern');
    expect(r.terms).toEqual([]);
    expect(r.matches.map((m) => m.record.cultivar.id)).toEqual([4]);
    const mixed = searchCultivars(cat, 'coral lantern weeping');
    expect(mixed.terms.map((t) => t.trait)).toEqual(['habit']);
  });
});
