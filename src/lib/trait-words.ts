import { formatLength, unitFor, type UnitSystem } from '@shared/units';
import {
  HEIGHT_CLASS_M,
  LEAF_FORM_LABELS,
  LEAF_SIZE_CM,
  PLANT_COLOURS,
  type Bark,
  type ContainerSuitability,
  type GrowthRate,
  type Habit,
  type HeightClass,
  type LeafForm,
  type LeafSize,
  type Season,
  type SunTolerance,
} from '@shared/traits';

/*
 * Plain words for trait values, shared by the tree finder, side by side and learn mode so a value
 * reads the same on every screen. Sizes come out in the reader's unit.
 */

/** Short leaf-form words for chips and table cells; the long forms are `LEAF_FORM_LABELS`. */
export const LEAF_FORM_SHORT: Record<LeafForm, string> = {
  unlobed: 'Not lobed',
  'shallow-lobed': 'Shallow lobes',
  amoenum: 'Lobed to two-thirds',
  palmatum: 'Lobed to three-quarters',
  matsumurae: 'Lobed nearly to the base',
  dissectum: 'Lace, cut to the base',
  linearilobum: 'Narrow straps',
  compound: 'Separate leaflets',
};

/** Bark values in words. */
export const BARK_LABELS: Record<Bark, string> = {
  green: 'Green',
  grey: 'Grey',
  brown: 'Brown',
  'coral-red': 'Coral red',
  yellow: 'Yellow',
  striped: 'Striped',
  corky: 'Corky',
  peeling: 'Peeling',
};

/** Habit values in words. */
export const HABIT_LABELS: Record<Habit, string> = {
  upright: 'Upright',
  weeping: 'Weeping',
  mounding: 'Low mound',
  rounded: 'Rounded',
  vase: 'Vase-shaped',
  spreading: 'Spreading',
  columnar: 'Narrow column',
};

/** Season names as they appear in sentences ("Colour in spring"). */
export const SEASON_LABELS: Record<Season, string> = { spring: 'spring', summer: 'summer', autumn: 'autumn' };

/** Growth rates in words. */
export const GROWTH_LABELS: Record<GrowthRate, string> = { slow: 'Slow', moderate: 'Moderate', fast: 'Fast' };

/** Light tolerances in words. */
export const SUN_LABELS: Record<SunTolerance, string> = { 'full-sun': 'Full sun', 'part-shade': 'Part shade', shade: 'Shade' };

/** Container suitability in words. */
export const CONTAINER_LABELS: Record<ContainerSuitability, string> = { good: 'Suits a container', fair: 'Copes in a container', poor: 'Better in the ground' };

/** A palette entry by id, or a neutral stand-in so unknown ids never break a page. */
export function colourOf(id: string): { id: string; label: string; hex: string; accentHex?: string } {
  const found = PLANT_COLOURS.find((c) => c.id === id);
  if (!found) return { id, label: id, hex: '#857560' };
  return 'accentHex' in found ? { id: found.id, label: found.label, hex: found.hex, accentHex: found.accentHex } : { id: found.id, label: found.label, hex: found.hex };
}

/** Colour ids as words, e.g. "Gold, orange". */
export function colourListText(ids: readonly string[]): string {
  return joinList(ids.map((id) => colourOf(id).label));
}

/**
 * Values a record lists together, e.g. "Weeping, low mound": the plant shows all of them, so they
 * are listed with commas, the first word capitalised and the rest lower-cased.
 */
export function joinList(words: readonly string[]): string {
  return words.map((x, i) => (i === 0 ? x : x.charAt(0).toLowerCase() + x.slice(1))).join(', ');
}

/** Leaf size with its width band in the reader's unit: "Small (under 5 cm)". */
export function leafSizeLabel(size: LeafSize, system: UnitSystem): string {
  const unit = unitFor(system, 'leaf');
  const band = LEAF_SIZE_CM[size];
  const m = (cm: number) => cm / 100;
  const name = size.charAt(0).toUpperCase() + size.slice(1);
  if (band.min === 0) return `${name} (under ${formatLength(m(band.max), unit)})`;
  if (size === 'large') return `${name} (over ${formatLength(m(band.min), unit)})`;
  return `${name} (${formatLength({ min: m(band.min), max: m(band.max) }, unit)})`;
}

/** A height class as a band in the reader's unit: "Under 2 m", "2–4 m", "Over 8 m". */
export function heightClassLabel(c: HeightClass, system: UnitSystem): string {
  const unit = unitFor(system, 'tree');
  const band = HEIGHT_CLASS_M[c];
  if (band.min === 0) return `Under ${formatLength(band.max, unit)}`;
  if (c === 'large') return `Over ${formatLength(band.min, unit)}`;
  return formatLength(band, unit);
}

/** A height in metres (a range or a point) in the reader's unit. */
export function heightText(metres: { min: number; max: number }, system: UnitSystem): string {
  return formatLength(metres, unitFor(system, 'tree'));
}

/** A lobe range: "7–9", or "7" when both ends agree; 0 lobes reads "no lobes". */
export function lobeText(range: { min: number; max: number }): string {
  if (range.min === range.max) return range.min === 0 ? 'No lobes' : String(range.min);
  return `${range.min}–${range.max}`;
}

/** The long leaf-form wording, for questions and explanations. */
export function leafFormLong(form: LeafForm): string {
  return LEAF_FORM_LABELS[form];
}

/** Position of a season in the year, northern hemisphere: Mar–May spring, Jun–Aug summer, Sep–Nov autumn, else none (winter). Common practice, no source. */
export function seasonForMonth(month: number): Season | null {
  if (!Number.isInteger(month) || month < 1 || month > 12) return null;
  if (month >= 3 && month <= 5) return 'spring';
  if (month >= 6 && month <= 8) return 'summer';
  if (month >= 9 && month <= 11) return 'autumn';
  return null;
}
