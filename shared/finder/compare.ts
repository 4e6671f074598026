import { LearningInputError } from '../learning-error';
import { TRAIT_LABELS, type Season, type TraitProfile } from '../traits';
import { checkRecords, type FinderRecord } from './score';

/** Rows of side by side, in display order before sorting; each season's colour is its own row. */
export const COMPARE_TRAITS = [
  'leafForm',
  'lobeCount',
  'leafSize',
  'colours.spring',
  'colours.summer',
  'colours.autumn',
  'bark',
  'habit',
  'heightClass',
  'heightM',
  'growthRate',
  'sunTolerance',
  'containerSuitability',
  'hardiness',
] as const;
/** One side by side row key. */
export type CompareTrait = (typeof COMPARE_TRAITS)[number];

/** A trait value as stored on the record: a value id, a list of ids, or a {min, max} range; the UI formats it. */
export type CompareValue = string | readonly string[] | { readonly min: number | string; readonly max: number | string };

/** One row of side by side. */
export interface CompareRow {
  trait: CompareTrait;
  label: string;
  /** One entry per record, in the order the records were given; null where a record does not give the trait. */
  values: (CompareValue | null)[];
  /** True when at least two records give the trait and they do not all agree. */
  differs: boolean;
  /** How many records give the trait. */
  known: number;
}

/** Side by side as the page draws it: columns in `ids` order. */
export interface Comparison {
  ids: string[];
  rows: CompareRow[];
}

const SEASON_LABEL: Record<Season, string> = { spring: 'spring', summer: 'summer', autumn: 'autumn' };

function labelOf(trait: CompareTrait): string {
  if (trait.startsWith('colours.')) {
    const season = trait.slice('colours.'.length) as Season;
    return `${TRAIT_LABELS.colours} in ${SEASON_LABEL[season]}`;
  }
  return TRAIT_LABELS[trait as Exclude<CompareTrait, `colours.${string}`>];
}

function valueOf(trait: CompareTrait, t: TraitProfile): CompareValue | null {
  if (trait.startsWith('colours.')) return t.colours?.[trait.slice('colours.'.length) as Season] ?? null;
  return (t[trait as keyof TraitProfile] as CompareValue | undefined) ?? null;
}

/** Lists compare as sets (order on the record carries no meaning); ranges by both ends. */
function sameValue(a: CompareValue, b: CompareValue): boolean {
  if (Array.isArray(a) || Array.isArray(b)) {
    if (!Array.isArray(a) || !Array.isArray(b)) return false;
    const A = new Set<string>(a);
    const B = new Set<string>(b);
    return A.size === B.size && [...A].every((x) => B.has(x));
  }
  if (typeof a === 'object' || typeof b === 'object') {
    if (typeof a !== 'object' || typeof b !== 'object') return false;
    const x = a as { min: unknown; max: unknown };
    const y = b as { min: unknown; max: unknown };
    return x.min === y.min && x.max === y.max;
  }
  return a === b;
}

/**
 * Side by side for two or three look-alikes. Rows come differences first, then rows that only some
 * records give (the learner cannot tell from the data), then agreements; within each group the
 * `COMPARE_TRAITS` order holds. Rows no record gives are left out. Fewer than two or more than three
 * records, or a repeated id, throw `LearningInputError`; a record with no traits is allowed and
 * shows as gaps.
 */
export function compareRecords(records: readonly FinderRecord[]): Comparison {
  if (!Array.isArray(records) || records.length < 2) {
    throw new LearningInputError('too_few_records', 'Side by side needs at least two cultivar records.');
  }
  if (records.length > 3) throw new LearningInputError('too_many_records', 'Side by side shows at most three cultivar records.');
  checkRecords(records);

  const rows: CompareRow[] = [];
  for (const trait of COMPARE_TRAITS) {
    const values = records.map((r) => valueOf(trait, r.traits ?? {}));
    const present = values.filter((v): v is CompareValue => v !== null);
    if (present.length === 0) continue;
    const first = present[0] as CompareValue;
    const differs = present.length >= 2 && present.some((v) => !sameValue(first, v));
    rows.push({ trait, label: labelOf(trait), values, differs, known: present.length });
  }
  const group = (row: CompareRow) => (row.differs ? 0 : row.known < records.length ? 1 : 2);
  const order = (row: CompareRow) => COMPARE_TRAITS.indexOf(row.trait);
  rows.sort((a, b) => group(a) - group(b) || order(a) - order(b));
  return { ids: records.map((r) => r.id), rows };
}
