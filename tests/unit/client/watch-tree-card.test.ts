import { describe, expect, it } from 'vitest';
import { zoneBounds } from '@shared/hardiness';
import { cardZoneFit, hardinessText, sizeLines } from '@/features/tours/lib/tree-card-view';
import { filtersFromParams, hasFilters, listParams, paramsFromFilters } from '@/features/tours/lib/browse-filters';

// Units: NIST SP 811, Appendix B (1 ft = 0.3048 m exactly; check values 8 m ≈ 26.2 ft, 4 m ≈ 13.1 ft).
// Hardiness: USDA Plant Hardiness Zone Map (zone 6a is −10 to −5 °F, −23.3 to −20.6 °C; 7b is
// 5 to 10 °F). The record values are invented (fictional demo cultivars).

const card = (h: { min: '6a' | '5b' | '7b'; max: '8b' | '7b' }) => ({
  min: h.min,
  max: h.max,
  coldestF: zoneBounds(h.min).minF,
  coldestC: Math.round(zoneBounds(h.min).minC * 10) / 10,
  warmestF: zoneBounds(h.max).maxF,
  warmestC: Math.round(zoneBounds(h.max).maxC * 10) / 10,
});

describe('sizeLines (NIST SP 811 conversions)', () => {
  it('shows metres to metric readers and feet to imperial ones', () => {
    expect(sizeLines({ heightM: { min: 4, max: 8 }, spreadM: null, heightClass: 'medium' }, 'metric')).toEqual([{ label: 'Height', value: '4–8 m' }]);
    // 4 m ≈ 13.1 ft and 8 m ≈ 26.2 ft (NIST); a range shares the precision of its larger end.
    expect(sizeLines({ heightM: { min: 4, max: 8 }, spreadM: null, heightClass: null }, 'imperial')).toEqual([{ label: 'Height', value: '13–26 ft' }]);
    expect(sizeLines({ heightM: { min: 8, max: 8 }, spreadM: { min: 4, max: 4 }, heightClass: null }, 'imperial')).toEqual([
      { label: 'Height', value: '26 ft' },
      { label: 'Spread', value: '13 ft' },
    ]);
  });

  it('falls back to the height class, and to nothing', () => {
    expect(sizeLines({ heightM: null, spreadM: null, heightClass: 'dwarf' }, 'metric')).toEqual([{ label: 'Size', value: 'A dwarf tree' }]);
    expect(sizeLines({ heightM: null, spreadM: null, heightClass: null }, 'metric')).toEqual([]);
  });
});

describe('hardinessText (USDA zone map check values)', () => {
  it('gives the coldest edge of the coldest zone in °F and °C', () => {
    expect(hardinessText(card({ min: '6a', max: '8b' }))).toBe('Zones 6a to 8b: winters down to −10 °F (−23.3 °C)');
    expect(hardinessText(card({ min: '7b', max: '7b' }))).toBe('Zone 7b: winters down to 5 °F (−15.0 °C)');
  });

  it('judges the reader’s zone only when one is set', () => {
    expect(cardZoneFit(card({ min: '6a', max: '8b' }), null, false)).toBeNull();
    expect(cardZoneFit(card({ min: '6a', max: '8b' }), '7a', false)?.fits).toBe('yes');
    expect(cardZoneFit(card({ min: '6a', max: '8b' }), '5a', false)?.fits).toBe('no');
    expect(cardZoneFit(null, '7a', false)?.fits).toBe('unknown');
  });
});

describe('browse filters in the address', () => {
  it('round-trip and drop what is empty', () => {
    const f = { author: 4, garden: 'Pellworth', cultivar: 'acer-palmatum-sora-no-hane', group: 'Dissectum' };
    expect(filtersFromParams(paramsFromFilters(f))).toEqual(f);
    expect(paramsFromFilters({ garden: '  ' }, 1).toString()).toBe('');
    expect(paramsFromFilters({}, 3).toString()).toBe('page=3');
    expect(hasFilters({})).toBe(false);
    expect(hasFilters({ group: 'Dwarf' })).toBe(true);
  });

  it('reads leniently: a bad author id is no filter, "Dissectum Group" is the Dissectum Group', () => {
    expect(filtersFromParams(new URLSearchParams('author=abc&group=Dissectum%20Group&garden='))).toEqual({ group: 'Dissectum' });
    expect(listParams({ group: 'Dwarf' }, 2, 12)).toEqual({ page: 2, pageSize: 12, group: 'Dwarf' });
  });
});
