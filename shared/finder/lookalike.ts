import { LearningInputError } from '../learning-error';
import {
  HEIGHT_CLASSES,
  LEAF_SIZES,
  LOBE_COUNT_MAX,
  LOBE_COUNT_MIN,
  SEASONS,
  colourFamily,
  heightClassOf,
  type HeightClass,
  type PlantColour,
  type TraitProfile,
} from '../traits';
import { checkRecords, type FinderRecord } from './score';

/**
 * Traits that make two trees look alike, each counted once (each season's colour is its own trait).
 * Care traits (growth rate, sun, container, hardiness) are left out: two trees that need the same
 * care do not look alike for that.
 */
export const LOOKALIKE_TRAITS = [
  'leafForm',
  'lobeCount',
  'leafSize',
  'colours.spring',
  'colours.summer',
  'colours.autumn',
  'bark',
  'habit',
  'height',
] as const;
/** One trait counted in look-alike distance. */
export type LookalikeTrait = (typeof LOOKALIKE_TRAITS)[number];

/** Jaccard distance 1 − |A ∩ B| / |A ∪ B| for lists of values (Jaccard 1912). */
export function jaccardDistance<T>(a: readonly T[], b: readonly T[]): number {
  const A = new Set(a);
  const B = new Set(b);
  let both = 0;
  for (const x of A) if (B.has(x)) both++;
  const union = A.size + B.size - both;
  return union === 0 ? 0 : 1 - both / union;
}

/**
 * Colour lists compared with partial credit for the same colour family (1 same colour, 0.5 same
 * family, 0 otherwise): each colour takes its best match on the other side, and the two directions
 * are averaged so the distance is symmetric. Grovewalk's own rule.
 */
export function colourSetDistance(a: readonly PlantColour[], b: readonly PlantColour[]): number {
  const sim = (x: PlantColour, y: PlantColour) => (x === y ? 1 : colourFamily(x) === colourFamily(y) ? 0.5 : 0);
  const best = (from: readonly PlantColour[], to: readonly PlantColour[]) =>
    from.reduce((s, x) => s + Math.max(...to.map((y) => sim(x, y))), 0) / from.length;
  return 1 - (best(a, b) + best(b, a)) / 2;
}

function heightClassFor(t: TraitProfile): HeightClass | null {
  if (t.heightClass) return t.heightClass;
  if (t.heightM) return heightClassOf((t.heightM.min + t.heightM.max) / 2);
  return null;
}

/** Per-trait distance 0..1, or null when either side lacks the trait. */
function partDistance(trait: LookalikeTrait, a: TraitProfile, b: TraitProfile): number | null {
  switch (trait) {
    case 'leafForm':
      return a.leafForm && b.leafForm ? (a.leafForm === b.leafForm ? 0 : 1) : null;
    case 'lobeCount': {
      if (!a.lobeCount || !b.lobeCount) return null;
      // Gower's quantitative term |x − y| / R on range midpoints, R the vocabulary's full span.
      const mid = (r: { min: number; max: number }) => (r.min + r.max) / 2;
      return Math.abs(mid(a.lobeCount) - mid(b.lobeCount)) / (LOBE_COUNT_MAX - LOBE_COUNT_MIN);
    }
    case 'leafSize':
      return a.leafSize && b.leafSize ? Math.abs(LEAF_SIZES.indexOf(a.leafSize) - LEAF_SIZES.indexOf(b.leafSize)) / (LEAF_SIZES.length - 1) : null;
    case 'colours.spring':
    case 'colours.summer':
    case 'colours.autumn': {
      const season = trait.slice('colours.'.length) as (typeof SEASONS)[number];
      const x = a.colours?.[season];
      const y = b.colours?.[season];
      return x && y ? colourSetDistance(x, y) : null;
    }
    case 'bark':
      return a.bark && b.bark ? jaccardDistance(a.bark, b.bark) : null;
    case 'habit':
      return a.habit && b.habit ? jaccardDistance(a.habit, b.habit) : null;
    case 'height': {
      const x = heightClassFor(a);
      const y = heightClassFor(b);
      return x && y ? Math.abs(HEIGHT_CLASSES.indexOf(x) - HEIGHT_CLASSES.indexOf(y)) / (HEIGHT_CLASSES.length - 1) : null;
    }
  }
}

/** A distance with the number of traits behind it, so weak comparisons can be filtered. */
export interface TraitDistance {
  /** 0 = look the same on every shared trait, 1 = differ on all of them. */
  distance: number;
  /** How many traits both records give; a distance over one or two traits is weak evidence. */
  shared: number;
}

/**
 * Gower-style distance (Gower 1971): the mean of per-trait distances over the traits both records
 * give, each scaled to 0..1 (categorical 0/1, ordinal and counts by the span of the scale, lists by
 * Jaccard, colours by `colourSetDistance`). Ranges of the scale are the vocabulary's, not the
 * sample's, so a pair's distance does not change when other records are added. Returns null when
 * the two records share no trait (e.g. one has no traits at all).
 */
export function traitDistanceDetail(a: TraitProfile, b: TraitProfile): TraitDistance | null {
  let sum = 0;
  let shared = 0;
  for (const trait of LOOKALIKE_TRAITS) {
    const d = partDistance(trait, a ?? {}, b ?? {});
    if (d === null) continue;
    sum += d;
    shared += 1;
  }
  return shared === 0 ? null : { distance: sum / shared, shared };
}

/** Look-alike distance in 0..1, or null when the records share no trait to compare. */
export function traitDistance(a: TraitProfile, b: TraitProfile): number | null {
  return traitDistanceDetail(a, b)?.distance ?? null;
}

/** One look-alike for the "compare" link. */
export interface Lookalike {
  id: string;
  distance: number;
  shared: number;
}

/** Filters for the look-alike list. */
export interface LookalikeOptions {
  /** Leave out pairs that share fewer traits than this (default 1). */
  minShared?: number;
}

/**
 * The k records that look most like `record`, nearest first; ties go to the pair sharing more traits,
 * then to the id. The record itself and records with no shared trait are left out, so a record with
 * no traits has no look-alikes (an empty list, not an error). k must be a positive whole number.
 */
export function nearestLookalikes(
  record: FinderRecord,
  others: readonly FinderRecord[],
  k: number,
  opts: LookalikeOptions = {},
): Lookalike[] {
  if (!Number.isInteger(k) || k < 1) throw new LearningInputError('invalid_argument', `k must be a whole number of at least 1 (got ${k}).`);
  const minShared = opts.minShared ?? 1;
  if (!Number.isInteger(minShared) || minShared < 1) {
    throw new LearningInputError('invalid_argument', `minShared must be a whole number of at least 1 (got ${minShared}).`);
  }
  checkRecords([record]);
  checkRecords(others);
  const found: Lookalike[] = [];
  for (const other of others) {
    if (other.id === record.id) continue;
    const d = traitDistanceDetail(record.traits, other.traits);
    if (d && d.shared >= minShared) found.push({ id: other.id, distance: d.distance, shared: d.shared });
  }
  found.sort((x, y) => (Math.abs(x.distance - y.distance) > 1e-12 ? x.distance - y.distance : 0) || y.shared - x.shared || (x.id < y.id ? -1 : x.id > y.id ? 1 : 0));
  return found.slice(0, k);
}
