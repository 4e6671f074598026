import { feetToMetres, metresToFeet, type UnitSystem } from '@shared/units';
import { LOBE_COUNT_MAX, SEASONS, traitProfileSchema, type TraitProfile } from '@shared/traits';

/** Reads one form's fields: single values and repeated checkboxes. */
export interface FieldSource {
  one(name: string): string;
  all(name: string): string[];
}

/** A FieldSource over the browser's FormData. */
export function fieldSourceOf(data: FormData): FieldSource {
  return {
    one: (name) => {
      const v = data.get(name);
      return typeof v === 'string' ? v.trim() : '';
    },
    all: (name) => data.getAll(name).filter((v): v is string => typeof v === 'string'),
  };
}

/** Field name of each season's colour checkboxes. */
export const colourField = (season: string) => `colour-${season}`;

/** Traits read from the form, or a message per field that could not be read. */
export type TraitFormResult = { ok: true; traits: TraitProfile | null } | { ok: false; errors: Record<string, string> };

/** Heights are typed in the reader's unit; stored to the centimetre (NIST SP 811 foot). */
function toMetres(value: number, system: UnitSystem): number {
  const m = system === 'imperial' ? feetToMetres(value) : value;
  return Math.round(m * 100) / 100;
}

/** A stored height in the reader's unit, to one decimal place (tenths of a foot or metre). */
export function heightForForm(metres: number, system: UnitSystem): string {
  const v = system === 'imperial' ? metresToFeet(metres) : metres;
  return String(Math.round(v * 10) / 10);
}

// Where a schema problem is reported: the field that a person can change.
const FIELD_OF_PATH: Record<string, string> = {
  lobeCount: 'lobeMax',
  heightM: 'heightMax',
  hardiness: 'zoneMax',
};

/**
 * The trait profile a moderator or author filled in. Empty fields mean "not recorded" and are
 * left out; a pair (lobes, height, zones) needs both ends or neither. Heights are converted from
 * feet with the exact NIST factor when the reader works in feet. Checked with the shared schema.
 */
export function traitsFromForm(src: FieldSource, system: UnitSystem): TraitFormResult {
  const errors: Record<string, string> = {};
  const draft: Record<string, unknown> = {};
  const set = (key: string, value: unknown) => {
    if (value !== '' && value !== undefined && !(Array.isArray(value) && value.length === 0)) draft[key] = value;
  };

  const pair = (minName: string, maxName: string, what: string, parse: (s: string) => number | null): { min: number; max: number } | undefined => {
    const a = src.one(minName);
    const b = src.one(maxName);
    if (!a && !b) return undefined;
    if (!a || !b) {
      errors[a ? maxName : minName] = `Give both ends of the ${what}, or leave both empty.`;
      return undefined;
    }
    const min = parse(a);
    const max = parse(b);
    if (min === null) errors[minName] = `Type a number for the ${what}.`;
    if (max === null) errors[maxName] = `Type a number for the ${what}.`;
    if (min === null || max === null) return undefined;
    return { min, max };
  };
  const int = (s: string) => (/^\d{1,3}$/.test(s) ? Number(s) : null);
  const decimal = (s: string) => {
    const t = s.replace(',', '.');
    return /^\d{1,4}(\.\d+)?$/.test(t) ? Number(t) : null;
  };

  set('leafForm', src.one('leafForm'));
  set('lobeCount', pair('lobeMin', 'lobeMax', 'number of lobes', int));
  set('leafSize', src.one('leafSize'));
  const colours: Record<string, string[]> = {};
  for (const season of SEASONS) {
    const picked = src.all(colourField(season));
    if (picked.length) colours[season] = picked;
  }
  if (Object.keys(colours).length) draft.colours = colours;
  set('bark', src.all('bark'));
  set('habit', src.all('habit'));
  set('heightClass', src.one('heightClass'));
  const height = pair('heightMin', 'heightMax', 'height at maturity', decimal);
  if (height) draft.heightM = { min: toMetres(height.min, system), max: toMetres(height.max, system) };
  set('growthRate', src.one('growthRate'));
  set('sunTolerance', src.all('sun'));
  set('containerSuitability', src.one('container'));
  const zMin = src.one('zoneMin');
  const zMax = src.one('zoneMax');
  if (zMin || zMax) {
    if (!zMin || !zMax) errors[zMin ? 'zoneMax' : 'zoneMin'] = 'Choose both the coldest and the warmest zone, or neither.';
    else draft.hardiness = { min: zMin, max: zMax };
  }

  if (Object.keys(errors).length) return { ok: false, errors };
  if (Object.keys(draft).length === 0) return { ok: true, traits: null };
  const parsed = traitProfileSchema.safeParse(draft);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const top = String(issue.path[0] ?? '_traits');
      const field = FIELD_OF_PATH[top] ?? (top === 'colours' ? colourField(String(issue.path[1] ?? 'spring')) : top === 'sunTolerance' ? 'sun' : top === 'containerSuitability' ? 'container' : top);
      const message =
        issue.code === 'too_big' && top === 'lobeCount'
          ? `A leaf has at most ${LOBE_COUNT_MAX} lobes here; count again.`
          : issue.code === 'too_big' && top === 'heightM'
            ? 'That height is above 100 m; check the number and the unit.'
            : top === 'lobeCount' || top === 'heightM'
          ? 'The first number must not be above the second.'
          : top === 'hardiness'
            ? 'Put the coldest zone first.'
            : issue.message;
      errors[field] ??= message;
    }
    return { ok: false, errors };
  }
  return { ok: true, traits: parsed.data };
}
