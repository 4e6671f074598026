import { describe, expect, it } from 'vitest';
import { DEFAULT_READER_PREFS, parseStoredPrefs, serializePrefs, zoneBandText, zoneFromTypedTemperature } from '@/features/preferences/lib/reader-prefs';

describe('zone bands as the reader sees them', () => {
  // USDA Plant Hardiness Zone Map (2012/2023), check values from domain.md:
  // 6a −10…−5 °F (−23.3…−20.6 °C); 7b 5…10 °F (−15.0…−12.2 °C); 10a 30…35 °F (−1.1…1.7 °C).
  it('6a, 7b and 10a read as the published bands in °F and °C (USDA map)', () => {
    expect(zoneBandText('6a')).toBe('−10 to −5 °F (−23.3 to −20.6 °C)');
    expect(zoneBandText('7b')).toBe('5 to 10 °F (−15.0 to −12.2 °C)');
    expect(zoneBandText('10a')).toBe('30 to 35 °F (−1.1 to 1.7 °C)');
  });

  it('the map ends are 1a −60…−55 °F and 13b 65…70 °F (USDA map)', () => {
    expect(zoneBandText('1a')).toMatch(/^−60 to −55 °F/);
    expect(zoneBandText('13b')).toMatch(/^65 to 70 °F/);
  });

  it('10b is 35…40 °F = 1.7…4.4 °C (°C = (°F − 32) × 5/9, domain.md)', () => {
    expect(zoneBandText('10b')).toBe('35 to 40 °F (1.7 to 4.4 °C)');
  });
});

describe('working a zone out from a typed temperature', () => {
  it('−15 °C is 5 °F, the bottom edge of 7b: an edge belongs to the warmer band (USDA map, domain.md)', () => {
    expect(zoneFromTypedTemperature('-15', 'C')).toEqual({ ok: true, zone: '7b' });
  });

  it('accepts the minus sign, a decimal comma and a trailing unit', () => {
    expect(zoneFromTypedTemperature('−7', 'F')).toEqual({ ok: true, zone: '6a' }); // 6a is −10…−5 °F
    // −23.3 °C × 9/5 + 32 = −9.94 °F, inside 6a (−10…−5 °F).
    expect(zoneFromTypedTemperature(' -23,3 °C', 'C')).toEqual({ ok: true, zone: '6a' });
  });

  it('−23.4 °C is −10.12 °F, just below 6a (−10 °F), so 5b (USDA map: 5b −15…−10 °F)', () => {
    expect(zoneFromTypedTemperature('-23.4', 'C')).toEqual({ ok: true, zone: '5b' });
  });

  it('explains empty, non-numeric, impossible and off-map input in words', () => {
    expect(zoneFromTypedTemperature('  ', 'C')).toEqual({ ok: false, message: 'Type the temperature first.' });
    const words = zoneFromTypedTemperature('cold', 'C');
    expect(words.ok).toBe(false);
    const impossible = zoneFromTypedTemperature('-80', 'C');
    expect(impossible.ok === false && impossible.message).toMatch(/not a plausible/);
    const offMap = zoneFromTypedTemperature('-70', 'F');
    expect(offMap.ok === false && offMap.message).toMatch(/outside the USDA zone map/);
  });
});

describe('stored reader preferences', () => {
  it('round-trips what it stores', () => {
    const prefs = { unitSystem: 'imperial' as const, zone: '8a' as const, container: true };
    expect(parseStoredPrefs(serializePrefs(prefs))).toEqual(prefs);
  });

  it('falls back field by field on missing, broken or out-of-range values', () => {
    expect(parseStoredPrefs(null)).toEqual(DEFAULT_READER_PREFS);
    expect(parseStoredPrefs('{not json')).toEqual(DEFAULT_READER_PREFS);
    expect(parseStoredPrefs('[1,2]')).toEqual(DEFAULT_READER_PREFS);
    expect(parseStoredPrefs(JSON.stringify({ unitSystem: 'cubits', zone: '14a', container: 'yes' }))).toEqual(DEFAULT_READER_PREFS);
    expect(parseStoredPrefs(JSON.stringify({ zone: '5b' }))).toEqual({ ...DEFAULT_READER_PREFS, zone: '5b' });
  });
});
