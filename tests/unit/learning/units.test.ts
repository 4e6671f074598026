import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  CENTIMETRES_PER_INCH,
  METRES_PER_FOOT,
  centimetresToInches,
  convertFromMetres,
  feetToMetres,
  formatLength,
  inchesToCentimetres,
  metresToFeet,
  unitFor,
} from '@shared/units';
import { LearningInputError } from '@shared/learning-error';

function codeOf(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (e) {
    return e instanceof LearningInputError ? e.code : `not a LearningInputError: ${String(e)}`;
  }
  return undefined;
}

describe('length factors (NIST SP 811, Appendix B: 1 ft = 0.3048 m exactly, 1 in = 2.54 cm exactly)', () => {
  it('uses the exact defining factors', () => {
    expect(METRES_PER_FOOT).toBe(0.3048);
    expect(CENTIMETRES_PER_INCH).toBe(2.54);
  });

  it('8 m ≈ 26.2 ft and 4 m ≈ 13.1 ft (check values from NIST SP 811 factor, domain.md)', () => {
    // By hand: 8 / 0.3048 = 26.2467…; 4 / 0.3048 = 13.1233…
    expect(metresToFeet(8)).toBeCloseTo(26.2467, 4);
    expect(metresToFeet(8).toFixed(1)).toBe('26.2');
    expect(metresToFeet(4)).toBeCloseTo(13.1234, 3);
    expect(metresToFeet(4).toFixed(1)).toBe('13.1');
  });

  it('feet and inches back to metric match the defining values (NIST SP 811, Appendix B)', () => {
    expect(feetToMetres(1)).toBe(0.3048);
    expect(feetToMetres(100)).toBeCloseTo(30.48, 10);
    expect(inchesToCentimetres(1)).toBe(2.54);
    // 12 in = 1 ft: 12 × 2.54 cm = 30.48 cm = 0.3048 m
    expect(inchesToCentimetres(12) / 100).toBeCloseTo(feetToMetres(1), 12);
    expect(centimetresToInches(30.48)).toBeCloseTo(12, 12);
  });

  it('converts metres to every reader unit (NIST SP 811, Appendix B)', () => {
    expect(convertFromMetres(2, 'm')).toBe(2);
    expect(convertFromMetres(2, 'cm')).toBe(200);
    expect(convertFromMetres(0.0254, 'in')).toBeCloseTo(1, 12);
    expect(convertFromMetres(0.3048, 'ft')).toBeCloseTo(1, 12);
  });

  it('round-trips metres → feet → metres for any garden-sized length (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 200, noNaN: true }), (m) => {
        expect(feetToMetres(metresToFeet(m))).toBeCloseTo(m, 9);
      }),
    );
  });
});

describe('formatLength', () => {
  it('shows whole numbers from 10 up and two significant digits below (8 m = 26.2467 ft shows as "26 ft")', () => {
    expect(formatLength(8, 'm')).toBe('8 m');
    expect(formatLength(8, 'ft')).toBe('26 ft');
    expect(formatLength(4, 'ft')).toBe('13 ft');
    expect(formatLength(1.84, 'm')).toBe('1.8 m');
    expect(formatLength(0.456, 'm')).toBe('0.46 m');
    expect(formatLength(0, 'm')).toBe('0 m');
    // 6 cm leaf = 6 / 2.54 = 2.362… in
    expect(formatLength(0.06, 'cm')).toBe('6 cm');
    expect(formatLength(0.06, 'in')).toBe('2.4 in');
  });

  it('writes ranges with an en dash and one unit ("3–4 m"), both ends at the precision of the larger', () => {
    expect(formatLength({ min: 3, max: 4 }, 'm')).toBe('3–4 m');
    // 3 m = 9.84 ft, 4 m = 13.12 ft → both whole: "10–13 ft"
    expect(formatLength({ min: 3, max: 4 }, 'ft')).toBe('10–13 ft');
    expect(formatLength({ min: 1.5, max: 2.5 }, 'm')).toBe('1.5–2.5 m');
  });

  it('collapses a range only when both ends round to the same figure', () => {
    expect(formatLength({ min: 3.9, max: 4.04 }, 'm')).toBe('3.9–4 m');
    expect(formatLength({ min: 12.2, max: 12.4 }, 'm')).toBe('12 m');
  });

  it('keeps fixed decimals when asked', () => {
    expect(formatLength(8, 'ft', { decimals: 1 })).toBe('26.2 ft');
    expect(formatLength(4, 'm', { decimals: 1 })).toBe('4.0 m');
  });

  it('rejects impossible lengths with a typed error', () => {
    expect(codeOf(() => formatLength(Number.NaN, 'm'))).toBe('not_a_number');
    expect(codeOf(() => formatLength(-1, 'm'))).toBe('invalid_length');
    expect(codeOf(() => formatLength({ min: 5, max: 3 }, 'm'))).toBe('invalid_length');
    expect(codeOf(() => formatLength(1, 'm', { decimals: 1.5 }))).toBe('invalid_argument');
    expect(codeOf(() => metresToFeet(Number.POSITIVE_INFINITY))).toBe('not_a_number');
  });

  it('picks the unit from the reader preference and the size shown', () => {
    expect(unitFor('metric', 'tree')).toBe('m');
    expect(unitFor('metric', 'leaf')).toBe('cm');
    expect(unitFor('imperial', 'tree')).toBe('ft');
    expect(unitFor('imperial', 'leaf')).toBe('in');
  });
});
