import type { CompareTrait } from '@shared/finder/compare';
import type { UnitSystem } from '@shared/units';
import {
  BARK_LABELS,
  CONTAINER_LABELS,
  colourOf,
  GROWTH_LABELS,
  HABIT_LABELS,
  heightClassLabel,
  heightText,
  joinList,
  LEAF_FORM_SHORT,
  leafSizeLabel,
  lobeText,
  SUN_LABELS,
} from '@/lib/trait-words';

/** A side by side cell: its words, and the colour swatches to draw for colour rows. */
export interface CompareCell {
  text: string;
  colours?: string[];
}

const label = <T extends string>(labels: Record<T, string>, v: unknown): string => (typeof v === 'string' && v in labels ? labels[v as T] : String(v));

function list(v: unknown): string[] {
  return Array.isArray(v) ? v.map(String) : typeof v === 'string' ? [v] : [];
}

function range(v: unknown): { min: number; max: number } | null {
  if (typeof v !== 'object' || v === null || Array.isArray(v)) return null;
  const r = v as { min?: unknown; max?: unknown };
  return typeof r.min === 'number' && typeof r.max === 'number' && r.min <= r.max ? { min: r.min, max: r.max } : null;
}

/**
 * One stored trait value in words for side by side, sizes in the reader's unit; null (the record
 * does not give the trait) reads "Not recorded". Values the page does not recognise are shown as
 * they are rather than hidden.
 */
export function formatCompareCell(trait: CompareTrait, value: unknown, system: UnitSystem): CompareCell {
  if (value === null || value === undefined) return { text: 'Not recorded' };
  switch (trait) {
    case 'leafForm':
      return { text: label(LEAF_FORM_SHORT, value) };
    case 'lobeCount': {
      const r = range(value);
      return { text: r ? lobeText(r) : String(value) };
    }
    case 'leafSize':
      return { text: typeof value === 'string' && ['small', 'medium', 'large'].includes(value) ? leafSizeLabel(value as 'small', system) : String(value) };
    case 'colours.spring':
    case 'colours.summer':
    case 'colours.autumn': {
      const ids = list(value);
      return { text: joinList(ids.map((id) => colourOf(id).label)), colours: ids };
    }
    case 'bark':
      return { text: joinList(list(value).map((v) => label(BARK_LABELS, v))) };
    case 'habit':
      return { text: joinList(list(value).map((v) => label(HABIT_LABELS, v))) };
    case 'heightClass':
      return { text: typeof value === 'string' && ['dwarf', 'small', 'medium', 'large'].includes(value) ? heightClassLabel(value as 'dwarf', system) : String(value) };
    case 'heightM': {
      const r = range(value);
      return { text: r ? heightText(r, system) : String(value) };
    }
    case 'growthRate':
      return { text: label(GROWTH_LABELS, value) };
    case 'sunTolerance':
      return { text: joinList(list(value).map((v) => label(SUN_LABELS, v))) };
    case 'containerSuitability':
      return { text: label(CONTAINER_LABELS, value) };
    case 'hardiness': {
      const r = value as { min?: unknown; max?: unknown };
      return { text: typeof r === 'object' && r && typeof r.min === 'string' && typeof r.max === 'string' ? `Zones ${r.min}–${r.max}` : String(value) };
    }
  }
}
