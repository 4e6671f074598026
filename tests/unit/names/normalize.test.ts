import { describe, expect, it } from 'vitest';
import { normalizeName } from '../../../shared/names/normalize';

describe('normalizeName', () => {
  it('folds case, accents, hyphens and spacing (invented names)', () => {
    expect(normalizeName('Sora-no-Hane')).toBe('sora no hane');
    expect(normalizeName('  sora   no–hane ')).toBe('sora no hane');
    expect(normalizeName('Kumo-tsubasa')).toBe(normalizeName('kumo tsubasa'));
  });
  // Unicode NFKD decomposition (Unicode Standard Annex #15) separates base letters from marks.
  it('removes combining marks after NFKD decomposition (UAX #15)', () => {
    expect(normalizeName('Ryōkan')).toBe('ryokan');
    expect(normalizeName('Ryo\u0304kan')).toBe('ryokan');
  });
  it('keeps digits and letters of other scripts', () => {
    expect(normalizeName('Nishiki No. 2')).toBe('nishiki no 2');
    expect(normalizeName('紅葉')).toBe('紅葉');
  });
});
