import { LearningInputError, assertFinite } from './learning-error';

/**
 * Exact by definition (NIST SP 811, Appendix B): cultivar records store metres and centimetres,
 * readers who prefer imperial see feet and inches, and both directions must round-trip.
 */
export const METRES_PER_FOOT = 0.3048;
/** Exact by definition (NIST SP 811, Appendix B). */
export const CENTIMETRES_PER_INCH = 2.54;

/** Units a reader can choose; records always hold metres (tree size) or centimetres (leaf size). */
export type LengthUnit = 'm' | 'ft' | 'cm' | 'in';
/** A reader preference; `unitFor` turns it into a unit for the size being shown. */
export type UnitSystem = 'metric' | 'imperial';
/** A length range in metres, e.g. a mature height "3–4 m". */
export interface LengthRange {
  min: number;
  max: number;
}

/** Tree heights read best in m/ft, leaves in cm/in. */
export function unitFor(system: UnitSystem, scale: 'tree' | 'leaf'): LengthUnit {
  if (system === 'metric') return scale === 'tree' ? 'm' : 'cm';
  return scale === 'tree' ? 'ft' : 'in';
}

/** Metres to feet with the exact NIST factor. */
export function metresToFeet(metres: number): number {
  assertFinite(metres, 'Length in metres');
  return metres / METRES_PER_FOOT;
}

/** Feet to metres with the exact NIST factor. */
export function feetToMetres(feet: number): number {
  assertFinite(feet, 'Length in feet');
  return feet * METRES_PER_FOOT;
}

/** Centimetres to inches with the exact NIST factor. */
export function centimetresToInches(cm: number): number {
  assertFinite(cm, 'Length in centimetres');
  return cm / CENTIMETRES_PER_INCH;
}

/** Inches to centimetres with the exact NIST factor. */
export function inchesToCentimetres(inches: number): number {
  assertFinite(inches, 'Length in inches');
  return inches * CENTIMETRES_PER_INCH;
}

/** A length given in metres, expressed in `unit`. */
export function convertFromMetres(metres: number, unit: LengthUnit): number {
  assertFinite(metres, 'Length in metres');
  switch (unit) {
    case 'm':
      return metres;
    case 'ft':
      return metres / METRES_PER_FOOT;
    case 'cm':
      return metres * 100;
    case 'in':
      return (metres * 100) / CENTIMETRES_PER_INCH;
  }
}

/** Display options; the default rounding suits estimates of garden sizes. */
export interface FormatLengthOptions {
  /**
   * Fixed number of decimals, trailing zeros kept. Left out, the rounding is "sensible": whole
   * numbers from 10 up ("26 ft"), two significant digits below 10 ("8 m", "1.8 m", "0.45 m"),
   * trailing zeros dropped — a garden size is an estimate, and more digits would suggest a
   * precision nobody measured. A range takes the precision of its larger end.
   */
  decimals?: number;
}

/** Decimals for "sensible" rounding: none from 10 up, otherwise enough for two significant digits. */
function autoDecimals(value: number): number {
  const v = Math.abs(value);
  if (v >= 10 || v === 0) return 0;
  return Math.max(0, 1 - Math.floor(Math.log10(v)));
}

function numberText(value: number, decimals: number, trimZeros: boolean): string {
  const f = 10 ** decimals;
  const text = (Math.round(value * f) / f).toFixed(decimals);
  // Plain digits with "." whatever the locale; "8", not "8.0", unless decimals were asked for.
  return trimZeros && text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}

function checkLength(value: number, what: string): void {
  assertFinite(value, what);
  if (value < 0) throw new LearningInputError('invalid_length', `${what} cannot be negative (got ${value}).`);
}

/**
 * Shows a size stored in metres in the reader's unit: "8 m", "26 ft", a range "3–4 m" (en dash,
 * no spaces). A range whose ends round to the same figure collapses to one ("4 m"). The number and
 * the unit symbol are separated by a space (NIST SP 811, 7.2). Negative, NaN or reversed
 * lengths throw `LearningInputError`.
 */
export function formatLength(metres: number | LengthRange, unit: LengthUnit, opts: FormatLengthOptions = {}): string {
  if (opts.decimals !== undefined && (!Number.isInteger(opts.decimals) || opts.decimals < 0 || opts.decimals > 6)) {
    throw new LearningInputError('invalid_argument', `decimals must be a whole number from 0 to 6 (got ${opts.decimals}).`);
  }
  if (typeof metres === 'number') {
    checkLength(metres, 'Length');
    const v = convertFromMetres(metres, unit);
    return `${numberText(v, opts.decimals ?? autoDecimals(v), opts.decimals === undefined)} ${unit}`;
  }
  checkLength(metres.min, 'Range start');
  checkLength(metres.max, 'Range end');
  if (metres.min > metres.max) {
    throw new LearningInputError('invalid_length', `Range start ${metres.min} is above its end ${metres.max}.`);
  }
  // Both ends share the precision of the larger one: "10–13 ft", not "9.8–13 ft".
  const hiValue = convertFromMetres(metres.max, unit);
  const decimals = opts.decimals ?? autoDecimals(hiValue);
  const lo = numberText(convertFromMetres(metres.min, unit), decimals, opts.decimals === undefined);
  const hi = numberText(hiValue, decimals, opts.decimals === undefined);
  return lo === hi ? `${lo} ${unit}` : `${lo}–${hi} ${unit}`;
}
