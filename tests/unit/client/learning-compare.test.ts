import { describe, expect, it } from 'vitest';
import { compareRecords } from '@shared/finder/compare';
import { compareHref, parseCompareIds } from '@/features/compare/lib/compare-ids';
import { formatCompareCell } from '@/features/compare/lib/compare-values';
import { noteFor, pairsOf } from '@/features/compare/lib/pair-notes';

describe('record ids from the address', () => {
  it('keeps positive whole numbers in order, once each', () => {
    expect(parseCompareIds('7,3')).toEqual({ ids: [7, 3], status: 'ok' });
    expect(parseCompareIds(' 3,,x,3,7 ,0,-2,1.5')).toEqual({ ids: [3, 7], status: 'ok' });
  });

  it('fewer than two or more than three are named, not thrown (the page shows the picker)', () => {
    expect(parseCompareIds(null)).toEqual({ ids: [], status: 'too_few' });
    expect(parseCompareIds('4')).toEqual({ ids: [4], status: 'too_few' });
    expect(parseCompareIds('4,4')).toEqual({ ids: [4], status: 'too_few' });
    expect(parseCompareIds('1,2,3,4').status).toBe('too_many');
  });

  it('builds the address back', () => {
    expect(compareHref([5, 2])).toBe('/compare?ids=5,2');
    expect(compareHref([])).toBe('/compare');
  });
});

describe('pair notes', () => {
  it('every pair once, lower id first', () => {
    expect(pairsOf([9, 4])).toEqual([[4, 9]]);
    expect(pairsOf([5, 2, 8])).toEqual([
      [2, 5],
      [5, 8],
      [2, 8],
    ]);
    expect(pairsOf([1])).toEqual([]);
  });

  it('finds a note whichever way round the pair is asked for', () => {
    const notes = [{ aId: 2, bId: 5, notesHtml: '<p>x</p>' }];
    expect(noteFor(notes, 5, 2)).toBe(notes[0]);
    expect(noteFor(notes, 2, 8)).toBeUndefined();
  });

});

describe('side by side cells', () => {
  // Two invented records (fictional, for this test only).
  const a = { id: '1', traits: { colours: { spring: ['deep-red' as const] }, heightM: { min: 1.5, max: 2.5 }, hardiness: { min: '6a' as const, max: '8b' as const } } };
  const b = { id: '2', traits: { colours: { spring: ['lime' as const] }, heightM: { min: 1.5, max: 2.5 } } };
  const rows = compareRecords([a, b]).rows;

  it('the shared comparison puts the spring colour first as a difference', () => {
    expect(rows[0]).toMatchObject({ trait: 'colours.spring', differs: true });
    expect(formatCompareCell('colours.spring', rows[0]!.values[0], 'metric')).toEqual({ text: 'Deep red', colours: ['deep-red'] });
  });

  it('sizes in the reader unit (NIST SP 811: 1 ft = 0.3048 m; 2.5 m = 8.2 ft)', () => {
    const height = rows.find((r) => r.trait === 'heightM')!;
    expect(formatCompareCell('heightM', height.values[1], 'imperial').text).toBe('4.9–8.2 ft');
  });

  it('a missing value reads "Not recorded"; zones read as a range', () => {
    const zones = rows.find((r) => r.trait === 'hardiness')!;
    expect(formatCompareCell('hardiness', zones.values[0], 'metric').text).toBe('Zones 6a–8b');
    expect(formatCompareCell('hardiness', zones.values[1], 'metric').text).toBe('Not recorded');
    expect(formatCompareCell('bark', ['green', 'striped'], 'metric').text).toBe('Green, striped');
  });
});
