import { LearningInputError, assertFinite } from './learning-error';

/**
 * USDA Plant Hardiness Zone Map (2012 and 2023 editions, USDA-ARS with Oregon State University
 * PRISM): 10 °F bands of the average annual extreme minimum temperature, split into 5 °F halves
 * "a" (colder) and "b" (warmer). Zone n starts at −60 + 10(n − 1) °F; 1a is −60…−55 °F and 13b is
 * 65…70 °F. Listed coldest first, so the array index orders zones.
 */
export const USDA_ZONES = [
  '1a', '1b', '2a', '2b', '3a', '3b', '4a', '4b', '5a', '5b', '6a', '6b', '7a', '7b',
  '8a', '8b', '9a', '9b', '10a', '10b', '11a', '11b', '12a', '12b', '13a', '13b',
] as const;
/** A half zone of the USDA map, the unit readers and records use. */
export type UsdaZone = (typeof USDA_ZONES)[number];
/** Readers type minima in either scale; the map is defined in °F. */
export type TemperatureScale = 'F' | 'C';

/** Coldest and warmest edge of the map, °F. */
export const ZONE_MAP_MIN_F = -60;
/** Warmest edge of the map (top of 13b), °F. */
export const ZONE_MAP_MAX_F = 70;
/**
 * Plausibility limits for an average annual extreme *minimum*: anything outside −100…100 °F is a
 * typo or a wrong unit, not a garden (the coldest map band starts at −60 °F, the warmest ends at 70 °F).
 */
export const PLAUSIBLE_MIN_F = -100;
/** Upper plausibility limit for an average annual extreme minimum, °F. */
export const PLAUSIBLE_MAX_F = 100;

/**
 * RHS hardiness ratings H3–H7 (Royal Horticultural Society), as reference data for readers who
 * know the UK scale. `minC: null` means "below −20 °C" (H7 has no lower bound).
 */
export const RHS_HARDINESS_RATINGS = [
  { rating: 'H3', minC: -5, maxC: 1 },
  { rating: 'H4', minC: -10, maxC: -5 },
  { rating: 'H5', minC: -15, maxC: -10 },
  { rating: 'H6', minC: -20, maxC: -15 },
  { rating: 'H7', minC: null, maxC: -20 },
] as const;
/** The RHS ratings kept as reference data (H3–H7, the range relevant to hardy trees). */
export type RhsRating = (typeof RHS_HARDINESS_RATINGS)[number]['rating'];

/** A zone's band of average annual extreme minimum temperature; `min` inclusive, `max` exclusive (13b includes 70 °F). */
export interface ZoneBounds {
  zone: UsdaZone;
  minF: number;
  maxF: number;
  minC: number;
  maxC: number;
}

/** A cultivar's hardiness range: coldest and warmest zone where it is grown in the ground. */
export interface ZoneRange {
  min: UsdaZone;
  max: UsdaZone;
}

/** °C = (°F − 32) × 5/9; kept unrounded so callers choose the display precision. */
export function fahrenheitToCelsius(f: number): number {
  assertFinite(f, 'Temperature in °F');
  return ((f - 32) * 5) / 9;
}

/** °F = °C × 9/5 + 32. */
export function celsiusToFahrenheit(c: number): number {
  assertFinite(c, 'Temperature in °C');
  return (c * 9) / 5 + 32;
}

/** True for the 26 half-zone names exactly as written in `USDA_ZONES`. */
export function isUsdaZone(value: unknown): value is UsdaZone {
  return typeof value === 'string' && (USDA_ZONES as readonly string[]).includes(value);
}

const ZONE_TEXT = /^\s*(?:usda\s*)?(?:zone\s*)?(\d{1,2})\s*([ab])?\s*$/i;

/** Lets range parsing read whole zones without guessing for single zones. */
export interface ParseZoneOptions {
  /** How to read a whole zone ("7"): as its colder ('a') or warmer ('b') half. Left out, "7" is an error. */
  wholeZoneAs?: 'a' | 'b';
}

/**
 * Reads what people type ("7b", " Zone 7B ", "usda 10a"). A whole zone without a half is
 * ambiguous for a single zone, so it throws unless `wholeZoneAs` says which half is meant.
 * Anything else (zone 0, 14, "7c") throws `unknown_zone`.
 */
export function parseZone(text: string, opts: ParseZoneOptions = {}): UsdaZone {
  const m = typeof text === 'string' ? ZONE_TEXT.exec(text) : null;
  if (!m) throw new LearningInputError('unknown_zone', `"${String(text)}" is not a USDA hardiness zone (1a to 13b).`);
  const n = Number(m[1]);
  if (n < 1 || n > 13) throw new LearningInputError('unknown_zone', `Zone ${n} is not on the USDA map (zones 1 to 13).`);
  const half = m[2]?.toLowerCase() ?? opts.wholeZoneAs;
  if (!half) {
    throw new LearningInputError('unknown_zone', `Zone ${n} needs its half: ${n}a (colder) or ${n}b (warmer).`);
  }
  return `${n}${half}` as UsdaZone;
}

/**
 * Reads a record's range as nurseries write it: "5–8", "5-8", "zones 5a to 8b". A whole zone at the
 * cold end means its "a" half and at the warm end its "b" half, so "5–8" covers 5a…8b.
 */
export function parseZoneRange(text: string): ZoneRange {
  const parts = String(text)
    .replace(/^\s*(?:usda\s*)?zones?\s*/i, '')
    .split(/\s*(?:–|—|-|\bto\b)\s*/i)
    .filter((p) => p.trim() !== '');
  if (parts.length === 1) {
    const only = parts[0] as string;
    return { min: parseZone(only, { wholeZoneAs: 'a' }), max: parseZone(only, { wholeZoneAs: 'b' }) };
  }
  if (parts.length !== 2) throw new LearningInputError('unknown_zone', `"${text}" is not a zone range such as "5–8" or "6a to 9b".`);
  const min = parseZone(parts[0] as string, { wholeZoneAs: 'a' });
  const max = parseZone(parts[1] as string, { wholeZoneAs: 'b' });
  if (zoneIndex(min) > zoneIndex(max)) {
    throw new LearningInputError('invalid_argument', `Zone range "${text}" runs from warmer to colder.`);
  }
  return { min, max };
}

function toZone(zone: UsdaZone | string): UsdaZone {
  return isUsdaZone(zone) ? zone : parseZone(zone);
}

/** Position in `USDA_ZONES` (1a = 0 … 13b = 25); one step is a half zone, 5 °F. */
export function zoneIndex(zone: UsdaZone | string): number {
  return USDA_ZONES.indexOf(toZone(zone));
}

/** Sort comparator: negative when `a` is colder, in half-zone steps ("6a" vs "7b" is −3). */
export function compareZones(a: UsdaZone | string, b: UsdaZone | string): number {
  return zoneIndex(a) - zoneIndex(b);
}

/** The published band of a zone in °F and °C. Throws `unknown_zone` for names not on the map. */
export function zoneBounds(zone: UsdaZone | string): ZoneBounds {
  const z = toZone(zone);
  const minF = ZONE_MAP_MIN_F + 5 * USDA_ZONES.indexOf(z);
  const maxF = minF + 5;
  return { zone: z, minF, maxF, minC: fahrenheitToCelsius(minF), maxC: fahrenheitToCelsius(maxF) };
}

/**
 * The zone of a place from its average annual extreme minimum temperature. A value on a band edge
 * belongs to the warmer band (−10 °F is 6a), except 70 °F, the top of 13b. Throws
 * `not_a_number` for NaN, `impossible_temperature` outside −100…100 °F (or the same in °C), and
 * `outside_zone_map` for plausible values colder than 1a or warmer than 13b.
 */
export function zoneFromTemperature(value: number, scale: TemperatureScale): UsdaZone {
  assertFinite(value, 'Temperature');
  if (scale !== 'F' && scale !== 'C') throw new LearningInputError('invalid_argument', `Scale must be "F" or "C" (got ${String(scale)}).`);
  // Rounded to 1e-9 °F so that a °C value typed from a band edge (−23.3333… °C) lands on the edge.
  const f = Math.round((scale === 'C' ? celsiusToFahrenheit(value) : value) * 1e9) / 1e9;
  if (f < PLAUSIBLE_MIN_F || f > PLAUSIBLE_MAX_F) {
    throw new LearningInputError(
      'impossible_temperature',
      `${value} °${scale} is not a plausible average annual extreme minimum (allowed −100…100 °F, about −73…38 °C).`,
    );
  }
  if (f < ZONE_MAP_MIN_F || f > ZONE_MAP_MAX_F) {
    throw new LearningInputError('outside_zone_map', `${value} °${scale} is outside the USDA zone map (−60…70 °F).`);
  }
  const idx = Math.min(USDA_ZONES.length - 1, Math.floor((f - ZONE_MAP_MIN_F) / 5));
  return USDA_ZONES[idx] as UsdaZone;
}

/**
 * Half zones a container above ground is shifted colder at the roots: one full zone. Common
 * practice, no published source — roots in a pot above ground are exposed to air on all sides.
 * A buried container is treated as in the ground (also common practice, no source).
 */
export const CONTAINER_ROOT_SHIFT_HALF_ZONES = 2;

/** Shown beside container advice: moving, sheltering or burying a pot can hurt people. */
export const CONTAINER_CAUTION =
  'Large containers are heavy: lift with help or a trolley. Before digging to bury one, have buried cables and pipes located as local rules require. When in doubt, ask a local nursery or a licensed arborist.';

/** "unknown" is kept apart from "no" so a missing range is never shown as unsuitable. */
export type ZoneFitVerdict = 'yes' | 'marginal' | 'no' | 'unknown';

/** A verdict the tree card can show as it is, with its reason in words. */
export interface ZoneFit {
  fits: ZoneFitVerdict;
  /** Plain English for the tree card, including the container assumption when one was made. */
  reason: string;
  /** The zone used for the cold check: the reader's zone, or one zone colder for a container above ground; null when that falls off the map. */
  rootZone: UsdaZone | null;
  /** Safety note when the reason suggests sheltering or burying a container. */
  caution?: string;
}

/** Where the tree will grow; a container above ground changes the cold check. */
export interface FitOptions {
  container: boolean;
  /** A container sunk in the ground; roots are then treated as in the ground. */
  buried?: boolean;
}

function zonesText(halfSteps: number): string {
  if (halfSteps === 1) return 'half a zone';
  const zones = halfSteps / 2;
  return `${zones} zone${zones === 1 ? '' : 's'}`;
}

/**
 * Whether a cultivar suits the reader's zone. The cold side compares the zone at the roots with the
 * record's coldest zone; the warm side compares the reader's own zone with the record's warmest
 * zone. Half a zone beyond either end is "marginal", more is "no". A missing record range (or a
 * missing coldest zone) gives "unknown" rather than a guess; an unreadable reader zone throws.
 */
export function fitsZone(
  recordRange: Partial<ZoneRange> | null | undefined,
  readerZone: UsdaZone | string,
  opts: FitOptions,
): ZoneFit {
  const reader = toZone(readerZone);
  const r = USDA_ZONES.indexOf(reader);
  const aboveGround = opts.container && !opts.buried;
  const rootIdx = aboveGround ? r - CONTAINER_ROOT_SHIFT_HALF_ZONES : r;
  const rootZone = rootIdx >= 0 ? (USDA_ZONES[rootIdx] as UsdaZone) : null;
  const rootName = rootZone ?? `colder than ${USDA_ZONES[0]}`;
  const containerNote = aboveGround
    ? ` In a container above ground the roots are taken as about one zone colder (${rootName}); that is common practice, not a published rule.`
    : opts.container
      ? ' A buried container is treated as in the ground (common practice, not a published rule).'
      : '';

  const min = recordRange?.min != null ? toZone(recordRange.min) : null;
  const max = recordRange?.max != null ? toZone(recordRange.max) : null;
  if (min && max && zoneIndex(min) > zoneIndex(max)) {
    throw new LearningInputError('invalid_argument', `Record range ${min}–${max} runs from warmer to colder.`);
  }

  const parts: string[] = [];
  let cold: ZoneFitVerdict = 'unknown';
  if (min) {
    const gap = zoneIndex(min) - rootIdx; // half zones the roots are colder than the record allows
    if (gap <= 0) cold = 'yes';
    else {
      cold = gap === 1 ? 'marginal' : 'no';
      const subject = aboveGround ? `The roots (${rootName}) are` : `Zone ${reader} is`;
      parts.push(
        gap === 1
          ? `${subject} half a zone colder than this cultivar's coldest zone (${min}): it may come through a mild winter but is at risk in a hard one.`
          : `${subject} ${zonesText(gap)} colder than this cultivar's coldest zone (${min}).`,
      );
    }
  }
  let warm: ZoneFitVerdict = 'unknown';
  if (max) {
    const gap = r - zoneIndex(max);
    if (gap <= 0) warm = 'yes';
    else {
      warm = gap === 1 ? 'marginal' : 'no';
      parts.push(
        `Zone ${reader} is ${zonesText(gap)} warmer than this cultivar's warmest zone (${max}): winters may be too mild or summers too hot for it.`,
      );
    }
  }

  let fits: ZoneFitVerdict;
  if (cold === 'no' || warm === 'no') fits = 'no';
  else if (cold === 'unknown') fits = 'unknown';
  else if (cold === 'marginal' || warm === 'marginal') fits = 'marginal';
  else fits = 'yes';

  let reason: string;
  const rangeText = min && max ? `${min}–${max}` : min ? `${min} and warmer` : null;
  if (fits === 'unknown') {
    reason = parts.length
      ? `This record gives no coldest zone, so cold hardiness is unknown. ${parts.join(' ')}`
      : 'This record has no hardiness range yet, so the fit is unknown.';
  } else if (fits === 'yes') {
    reason = `Zone ${reader} is inside this cultivar's range (${rangeText}).`;
  } else {
    reason = parts.join(' ');
  }
  const suggestShelter = aboveGround && (cold === 'marginal' || cold === 'no');
  if (suggestShelter) reason += ' Burying the container or sheltering it in winter keeps the roots warmer.';
  reason += containerNote;
  return suggestShelter ? { fits, reason, rootZone, caution: CONTAINER_CAUTION } : { fits, reason, rootZone };
}
