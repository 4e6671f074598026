import { describe, expect, it } from 'vitest';
import { compareRecords } from '@shared/finder/compare';
import type { FinderRecord } from '@shared/finder/score';
import { LearningInputError } from '@shared/learning-error';

function codeOf(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (e) {
    return e instanceof LearningInputError ? e.code : `not a LearningInputError: ${String(e)}`;
  }
  return undefined;
}

// INVENTED records (fictional Millbrook Garden Club cultivars), compared by hand below.
const ember: FinderRecord = {
  id: 'invented-ember',
  traits: {
    leafForm: 'dissectum',
    colours: { autumn: ['orange', 'gold'] },
    habit: ['weeping'],
    bark: ['green'],
    hardiness: { min: '6a', max: '9a' },
  },
};
const brook: FinderRecord = {
  id: 'invented-brook',
  traits: {
    leafForm: 'dissectum',
    colours: { autumn: ['gold', 'orange'] }, // same colours, other order: not a difference
    habit: ['mounding'],
    hardiness: { min: '5b', max: '9a' },
  },
};
const blank: FinderRecord = { id: 'invented-blank', traits: {} };

describe('compareRecords (side by side)', () => {
  it('puts differences first, then rows only some records give, then agreements (worked by hand)', () => {
    const { ids, rows } = compareRecords([ember, brook]);
    expect(ids).toEqual(['invented-ember', 'invented-brook']);
    // differ: habit, hardiness; partly known: bark; same: leafForm, autumn colour
    expect(rows.map((r) => [r.trait, r.differs, r.known])).toEqual([
      ['habit', true, 2],
      ['hardiness', true, 2],
      ['bark', false, 1],
      ['leafForm', false, 2],
      ['colours.autumn', false, 2],
    ]);
    expect(rows[0]?.values).toEqual([['weeping'], ['mounding']]);
    expect(rows[2]?.values).toEqual([['green'], null]);
    expect(rows.find((r) => r.trait === 'colours.autumn')?.label).toBe('Leaf colour in autumn');
  });

  it('works for three records, one with no traits (shown as gaps)', () => {
    const { rows } = compareRecords([ember, brook, blank]);
    expect(rows.every((r) => r.values.length === 3 && r.values[2] === null)).toBe(true);
    expect(rows.filter((r) => r.differs).map((r) => r.trait)).toEqual(['habit', 'hardiness']);
    // with a blank third record no row is fully known, so the rest are all "partly known"
    expect(rows.slice(2).map((r) => r.trait)).toEqual(['leafForm', 'colours.autumn', 'bark']);
  });

  it('gives no rows when neither record has traits', () => {
    expect(compareRecords([blank, { id: 'invented-blank-2', traits: {} }]).rows).toEqual([]);
  });

  it('rejects fewer than two or more than three records, and repeated ids', () => {
    expect(codeOf(() => compareRecords([]))).toBe('too_few_records');
    expect(codeOf(() => compareRecords([ember]))).toBe('too_few_records');
    expect(codeOf(() => compareRecords([ember, brook, blank, { id: 'invented-4', traits: {} }]))).toBe('too_many_records');
    expect(codeOf(() => compareRecords([ember, ember]))).toBe('invalid_records');
  });
});
