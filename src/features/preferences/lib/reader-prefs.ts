import { isUsdaZone, zoneBounds, zoneFromTemperature, type TemperatureScale, type UsdaZone } from '@shared/hardiness';
import { LearningInputError } from '@shared/learning-error';
import type { UnitSystem } from '@shared/units';

/** What a reader has told Grovewalk about their garden; every screen that shows sizes or zone fit reads it. */
export interface ReaderPrefs {
  unitSystem: UnitSystem;
  zone: UsdaZone | null;
  /** The tree would stand in a container above ground (checked one zone colder at the roots). */
  container: boolean;
}

/** Until a reader says otherwise: metres, no zone, in the ground. */
export const DEFAULT_READER_PREFS: ReaderPrefs = { unitSystem: 'metric', zone: null, container: false };

/** localStorage key for visitors' choices (and for the container choice of everyone). */
export const READER_PREFS_STORAGE_KEY = 'grovewalk.reader-prefs';

/**
 * Reads stored choices leniently: anything missing, unreadable or out of range falls back to the
 * default for that field, so a hand-edited or old entry never breaks a page.
 */
export function parseStoredPrefs(raw: string | null | undefined): ReaderPrefs {
  if (!raw) return { ...DEFAULT_READER_PREFS };
  let data: unknown;
  try {
    data = JSON.parse(raw);
  } catch {
    return { ...DEFAULT_READER_PREFS };
  }
  if (typeof data !== 'object' || data === null || Array.isArray(data)) return { ...DEFAULT_READER_PREFS };
  const d = data as Record<string, unknown>;
  return {
    unitSystem: d.unitSystem === 'imperial' || d.unitSystem === 'metric' ? d.unitSystem : DEFAULT_READER_PREFS.unitSystem,
    zone: isUsdaZone(d.zone) ? d.zone : null,
    container: d.container === true,
  };
}

/** What each unit system is called wherever a reader chooses it (garden settings, account, sign-up). */
export const UNIT_SYSTEM_LABELS: Record<UnitSystem, string> = { metric: 'Metres and centimetres', imperial: 'Feet and inches' };

/**
 * The units and zone stored on this browser, as a new account takes them (sign-up), so choices
 * made as a visitor are not lost on joining. Nothing when none were stored.
 */
export function accountPrefsFromStored(raw: string | null): { unitSystem?: UnitSystem; hardinessZone?: UsdaZone } {
  if (!raw) return {};
  const stored = parseStoredPrefs(raw);
  return { unitSystem: stored.unitSystem, ...(stored.zone ? { hardinessZone: stored.zone } : {}) };
}

/** The stored form of the choices (only the known fields). */
export function serializePrefs(prefs: ReaderPrefs): string {
  return JSON.stringify({ unitSystem: prefs.unitSystem, zone: prefs.zone, container: prefs.container });
}

/** The outcome of working a zone out from a typed temperature. */
export type TypedZoneResult = { ok: true; zone: UsdaZone } | { ok: false; message: string };

/**
 * The zone for a typed average annual extreme minimum, or a plain message. Accepts the minus sign
 * (−) as well as "-", and a decimal comma. Impossible or off-map temperatures get the shared
 * rules' own explanation.
 */
export function zoneFromTypedTemperature(text: string, scale: TemperatureScale): TypedZoneResult {
  const cleaned = text.trim().replace(/[\u2212\u2013]/g, '-').replace(',', '.').replace(/\s+/g, '').replace(/°?[cf]$/i, '');
  if (cleaned === '') return { ok: false, message: 'Type the temperature first.' };
  if (!/^[-+]?\d+(\.\d+)?$/.test(cleaned)) return { ok: false, message: `"${text.trim()}" is not a number of degrees.` };
  try {
    return { ok: true, zone: zoneFromTemperature(Number(cleaned), scale) };
  } catch (error) {
    if (error instanceof LearningInputError) return { ok: false, message: error.message };
    throw error;
  }
}

function degrees(value: number, decimals: number): string {
  const text = value.toFixed(decimals);
  const clean = /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
  // A real minus sign reads better than a hyphen in running text.
  return clean.replace('-', '\u2212');
}

/**
 * A zone's band of average annual extreme minimum temperature in both scales, e.g.
 * "5 to 10 °F (−15.0 to −12.2 °C)": °F as the map defines it, °C to one decimal.
 */
export function zoneBandText(zone: UsdaZone): string {
  const b = zoneBounds(zone);
  return `${degrees(b.minF, 0)} to ${degrees(b.maxF, 0)} °F (${degrees(b.minC, 1)} to ${degrees(b.maxC, 1)} °C)`;
}
