import { fitsZone, type UsdaZone, type ZoneFit } from '@shared/hardiness';
import type { TreeCard } from '@shared/schemas/watch';
import { formatLength, unitFor, type UnitSystem } from '@shared/units';

const HEIGHT_CLASS_WORDS: Record<string, string> = { dwarf: 'dwarf', small: 'small', medium: 'medium-sized', large: 'large' };

/** One line of the "Size" row, e.g. "Height 2–3 m" or "Height 6.6–9.8 ft". */
export interface SizeLine {
  label: string;
  value: string;
}

/**
 * The record's mature size in the reader's unit (metres or feet, NIST factors through
 * shared/units), height then spread; a record with only a height class says that instead.
 */
export function sizeLines(size: TreeCard['size'], system: UnitSystem): SizeLine[] {
  const unit = unitFor(system, 'tree');
  const out: SizeLine[] = [];
  if (size.heightM) out.push({ label: 'Height', value: formatLength(size.heightM, unit) });
  if (size.spreadM) out.push({ label: 'Spread', value: formatLength(size.spreadM, unit) });
  if (out.length === 0 && size.heightClass) out.push({ label: 'Size', value: `A ${HEIGHT_CLASS_WORDS[size.heightClass] ?? size.heightClass} tree` });
  return out;
}

function signed(value: number, decimals: number): string {
  const text = value.toFixed(decimals);
  const clean = /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
  return clean.replace('-', '\u2212');
}

/**
 * "Zones 5b to 8a: winters down to −15 °F (−26.1 °C)". The coldest edge of the coldest zone is
 * the one that matters for survival (USDA Plant Hardiness Zone Map: zones are bands of average
 * annual extreme minimum temperature).
 */
export function hardinessText(h: NonNullable<TreeCard['hardiness']>): string {
  const zones = h.min === h.max ? `Zone ${h.min}` : `Zones ${h.min} to ${h.max}`;
  return `${zones}: winters down to ${signed(h.coldestF, 0)} °F (${signed(h.coldestC, 1)} °C)`;
}

/** The reader's zone fit for the card, or null when the reader has not set a zone. */
export function cardZoneFit(h: TreeCard['hardiness'], readerZone: UsdaZone | null, container: boolean): ZoneFit | null {
  if (!readerZone) return null;
  return fitsZone(h ? { min: h.min, max: h.max } : null, readerZone, { container });
}

/** Season names as the card's colour rows say them. */
export const SEASON_WORDS = { spring: 'Spring', summer: 'Summer', autumn: 'Autumn' } as const;
