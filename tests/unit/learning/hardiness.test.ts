import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  CONTAINER_CAUTION,
  RHS_HARDINESS_RATINGS,
  USDA_ZONES,
  celsiusToFahrenheit,
  compareZones,
  fahrenheitToCelsius,
  fitsZone,
  parseZone,
  parseZoneRange,
  zoneBounds,
  zoneFromTemperature,
  type UsdaZone,
} from '@shared/hardiness';
import { LearningInputError } from '@shared/learning-error';

function codeOf(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (e) {
    return e instanceof LearningInputError ? e.code : `not a LearningInputError: ${String(e)}`;
  }
  return undefined;
}

/**
 * Source: USDA-ARS Plant Hardiness Zone Map, 2012 and 2023 editions (with Oregon State University
 * PRISM). Each half zone is a 5 °F band of average annual extreme minimum temperature; zone n starts
 * at −60 + 10(n − 1) °F and "b" adds 5 °F. °C columns are (°F − 32) × 5/9 rounded to 0.1 °C as the
 * map legend prints them. Written out here from that definition, not computed by the code under test.
 */
const USDA_TABLE: [UsdaZone, number, number, number, number][] = [
  ['1a', -60, -55, -51.1, -48.3],
  ['1b', -55, -50, -48.3, -45.6],
  ['2a', -50, -45, -45.6, -42.8],
  ['2b', -45, -40, -42.8, -40.0],
  ['3a', -40, -35, -40.0, -37.2],
  ['3b', -35, -30, -37.2, -34.4],
  ['4a', -30, -25, -34.4, -31.7],
  ['4b', -25, -20, -31.7, -28.9],
  ['5a', -20, -15, -28.9, -26.1],
  ['5b', -15, -10, -26.1, -23.3],
  ['6a', -10, -5, -23.3, -20.6],
  ['6b', -5, 0, -20.6, -17.8],
  ['7a', 0, 5, -17.8, -15.0],
  ['7b', 5, 10, -15.0, -12.2],
  ['8a', 10, 15, -12.2, -9.4],
  ['8b', 15, 20, -9.4, -6.7],
  ['9a', 20, 25, -6.7, -3.9],
  ['9b', 25, 30, -3.9, -1.1],
  ['10a', 30, 35, -1.1, 1.7],
  ['10b', 35, 40, 1.7, 4.4],
  ['11a', 40, 45, 4.4, 7.2],
  ['11b', 45, 50, 7.2, 10.0],
  ['12a', 50, 55, 10.0, 12.8],
  ['12b', 55, 60, 12.8, 15.6],
  ['13a', 60, 65, 15.6, 18.3],
  ['13b', 65, 70, 18.3, 21.1],
];

describe('USDA zone bounds, every zone 1a–13b (USDA-ARS Plant Hardiness Zone Map 2012/2023)', () => {
  it('has exactly the 26 half zones of the map, coldest first', () => {
    expect([...USDA_ZONES]).toEqual(USDA_TABLE.map((r) => r[0]));
  });

  it.each(USDA_TABLE)('%s is %s…%s °F (%s…%s °C)', (zone, minF, maxF, minC, maxC) => {
    const b = zoneBounds(zone);
    expect(b.zone).toBe(zone);
    expect(b.minF).toBe(minF);
    expect(b.maxF).toBe(maxF);
    expect(b.minC).toBeCloseTo(minC, 1);
    expect(b.maxC).toBeCloseTo(maxC, 1);
  });

  it.each(USDA_TABLE)('minima from the lower edge of %s (%s °F) up to just below its upper edge fall in that zone', (zone, minF) => {
    expect(zoneFromTemperature(minF, 'F')).toBe(zone);
    expect(zoneFromTemperature(minF + 2.5, 'F')).toBe(zone);
    expect(zoneFromTemperature(minF + 4.99, 'F')).toBe(zone);
  });

  it('check values from domain.md: 6a −10…−5 °F (−23.3…−20.6 °C), 7b 5…10 °F (−15.0…−12.2 °C), 10a 30…35 °F (−1.1…1.7 °C), 1a −60…−55 °F, 13b 65…70 °F', () => {
    expect(zoneBounds('6a')).toMatchObject({ minF: -10, maxF: -5 });
    expect(zoneBounds('6a').minC.toFixed(1)).toBe('-23.3');
    expect(zoneBounds('6a').maxC.toFixed(1)).toBe('-20.6');
    expect(zoneBounds('7b')).toMatchObject({ minF: 5, maxF: 10 });
    expect(zoneBounds('7b').minC.toFixed(1)).toBe('-15.0');
    expect(zoneBounds('7b').maxC.toFixed(1)).toBe('-12.2');
    expect(zoneBounds('10a')).toMatchObject({ minF: 30, maxF: 35 });
    expect(zoneBounds('10a').minC.toFixed(1)).toBe('-1.1');
    expect(zoneBounds('10a').maxC.toFixed(1)).toBe('1.7');
    expect(zoneBounds('1a')).toMatchObject({ minF: -60, maxF: -55 });
    expect(zoneBounds('13b')).toMatchObject({ minF: 65, maxF: 70 });
  });

  it('reads °C minima into zones on the same bands (USDA map legend °C values)', () => {
    expect(zoneFromTemperature(-23.3, 'C')).toBe('6a'); // −9.94 °F
    expect(zoneFromTemperature(-23.4, 'C')).toBe('5b'); // −10.12 °F
    expect(zoneFromTemperature(-15, 'C')).toBe('7b'); // exactly 5 °F, the edge belongs to 7b
    expect(zoneFromTemperature((-10 - 32) * (5 / 9), 'C')).toBe('6a'); // −23.333… °C typed from the edge
    expect(zoneFromTemperature(0, 'C')).toBe('10a'); // 32 °F
    expect(zoneFromTemperature(70, 'F')).toBe('13b'); // the top of the map is still 13b
  });
});

describe('°F ↔ °C (NIST SP 811, Appendix B: t/°C = (t/°F − 32)/1.8)', () => {
  it('converts the fixed points', () => {
    expect(fahrenheitToCelsius(32)).toBe(0);
    expect(fahrenheitToCelsius(212)).toBe(100);
    expect(fahrenheitToCelsius(-40)).toBe(-40);
    expect(celsiusToFahrenheit(100)).toBe(212);
    expect(celsiusToFahrenheit(-40)).toBe(-40);
    expect(fahrenheitToCelsius(-10)).toBeCloseTo(-23.3333, 4);
  });

  it('round-trips any plausible temperature (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -100, max: 100, noNaN: true }), (f) => {
        expect(celsiusToFahrenheit(fahrenheitToCelsius(f))).toBeCloseTo(f, 9);
      }),
    );
  });
});

describe('RHS hardiness ratings (RHS: H3 1…−5 °C, H4 −5…−10 °C, H5 −10…−15 °C, H6 −15…−20 °C, H7 below −20 °C)', () => {
  it('holds the published bands', () => {
    expect(RHS_HARDINESS_RATINGS.map((r) => [r.rating, r.maxC, r.minC])).toEqual([
      ['H3', 1, -5],
      ['H4', -5, -10],
      ['H5', -10, -15],
      ['H6', -15, -20],
      ['H7', -20, null],
    ]);
  });
});

describe('parsing and ordering zones', () => {
  it('reads the usual spellings', () => {
    expect(parseZone('7b')).toBe('7b');
    expect(parseZone(' Zone 7B ')).toBe('7b');
    expect(parseZone('usda 10a')).toBe('10a');
    expect(parseZone('7', { wholeZoneAs: 'a' })).toBe('7a');
  });

  it('reads ranges, a whole zone meaning its colder half at the cold end and warmer half at the warm end', () => {
    expect(parseZoneRange('5–8')).toEqual({ min: '5a', max: '8b' });
    expect(parseZoneRange('zones 6a to 9b')).toEqual({ min: '6a', max: '9b' });
    expect(parseZoneRange('7')).toEqual({ min: '7a', max: '7b' });
  });

  it('orders zones in half-zone steps', () => {
    expect(compareZones('6a', '7b')).toBe(-3);
    expect(compareZones('13b', '1a')).toBe(25);
    expect(compareZones('7b', '7b')).toBe(0);
    expect(['9a', '1b', '10a', '6b'].sort(compareZones)).toEqual(['1b', '6b', '9a', '10a']);
  });
});

describe('bad input (consistent typed errors: LearningInputError with a code)', () => {
  it('rejects impossible minima, NaN and off-map temperatures', () => {
    expect(codeOf(() => zoneFromTemperature(Number.NaN, 'F'))).toBe('not_a_number');
    expect(codeOf(() => zoneFromTemperature(-101, 'F'))).toBe('impossible_temperature');
    expect(codeOf(() => zoneFromTemperature(101, 'F'))).toBe('impossible_temperature');
    expect(codeOf(() => zoneFromTemperature(-80, 'C'))).toBe('impossible_temperature'); // −112 °F
    expect(codeOf(() => zoneFromTemperature(-80, 'F'))).toBe('outside_zone_map');
    expect(codeOf(() => zoneFromTemperature(75, 'F'))).toBe('outside_zone_map');
    expect(codeOf(() => zoneFromTemperature(5, 'K' as 'F'))).toBe('invalid_argument');
  });

  it('rejects unknown zones', () => {
    for (const bad of ['14a', '0b', '7c', 'seven', '', '7']) {
      expect(codeOf(() => parseZone(bad)), bad).toBe('unknown_zone');
    }
    expect(codeOf(() => zoneBounds('13c'))).toBe('unknown_zone');
    expect(codeOf(() => compareZones('6a', 'tropical'))).toBe('unknown_zone');
    expect(codeOf(() => fitsZone({ min: '5a', max: '8b' }, '15a', { container: false }))).toBe('unknown_zone');
    expect(codeOf(() => parseZoneRange('8–5'))).toBe('invalid_argument');
    expect(codeOf(() => fitsZone({ min: '8a', max: '5a' }, '6a', { container: false }))).toBe('invalid_argument');
  });
});

describe('fitsZone', () => {
  const range = { min: '6a', max: '8b' } as const;

  it('fits inside the range and says which range', () => {
    const fit = fitsZone(range, '7b', { container: false });
    expect(fit.fits).toBe('yes');
    expect(fit.rootZone).toBe('7b');
    expect(fit.reason).toContain('6a–8b');
    expect(fit.caution).toBeUndefined();
  });

  it('half a zone beyond either end is marginal, more is no', () => {
    expect(fitsZone(range, '5b', { container: false }).fits).toBe('marginal');
    expect(fitsZone(range, '5a', { container: false }).fits).toBe('no');
    expect(fitsZone(range, '9a', { container: false }).fits).toBe('marginal');
    expect(fitsZone(range, '9b', { container: false }).fits).toBe('no');
    expect(fitsZone(range, '9b', { container: false }).reason).toContain('1 zone warmer');
  });

  it('treats a container above ground as one zone colder at the roots (common practice, no source) and says so', () => {
    const inGround = fitsZone(range, '7a', { container: false });
    const pot = fitsZone(range, '7a', { container: true });
    expect(inGround.fits).toBe('yes');
    expect(pot.rootZone).toBe('6a');
    expect(pot.fits).toBe('yes');
    expect(pot.reason).toMatch(/common practice/);

    const cold = fitsZone(range, '6b', { container: true });
    expect(cold.rootZone).toBe('5b');
    expect(cold.fits).toBe('marginal');
    expect(cold.caution).toBe(CONTAINER_CAUTION);
    expect(fitsZone(range, '6a', { container: true }).fits).toBe('no');
  });

  it('treats a buried container as in the ground', () => {
    const fit = fitsZone(range, '6a', { container: true, buried: true });
    expect(fit.fits).toBe('yes');
    expect(fit.rootZone).toBe('6a');
    expect(fit.reason).toMatch(/buried/i);
  });

  it('keeps the warm side on the reader zone even for a container', () => {
    expect(fitsZone(range, '9b', { container: true }).fits).toBe('no');
  });

  it('goes below the map for a container in 1a without failing', () => {
    const fit = fitsZone({ min: '1a', max: '4b' }, '1a', { container: true });
    expect(fit.rootZone).toBeNull();
    expect(fit.fits).toBe('no');
  });

  it('is unknown, not guessed, when the record has no range or no coldest zone', () => {
    expect(fitsZone(null, '7b', { container: false }).fits).toBe('unknown');
    expect(fitsZone(undefined, '7b', { container: true }).fits).toBe('unknown');
    expect(fitsZone({ max: '8b' }, '7b', { container: false }).fits).toBe('unknown');
    // …but a warm side that is clearly wrong still says no
    expect(fitsZone({ max: '8b' }, '10b', { container: false }).fits).toBe('no');
  });
});
