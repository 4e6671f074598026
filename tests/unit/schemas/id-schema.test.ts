// The id rule shared by API paths (server/middleware/validate.ts) and the client's address reading
// (src/lib/route-params.ts): 1 to 9 decimal digits, from 1 (ids are INT UNSIGNED, whose largest
// value, 4,294,967,295, has 10 digits — MariaDB documentation, "INT"; nine digits always fit).
import { describe, expect, it } from 'vitest';
import { idSchema } from '../../../shared/schemas/common';

describe('idSchema', () => {
  it('reads plain decimal ids from 1 up to nine digits', () => {
    expect(idSchema.parse('1')).toBe(1);
    expect(idSchema.parse('42')).toBe(42);
    expect(idSchema.parse('007')).toBe(7);
    expect(idSchema.parse('999999999')).toBe(999_999_999);
  });

  it('refuses zero, signs, fractions, exponents, hex, spaces, ten digits and words', () => {
    for (const raw of ['', '0', '000', '-1', '+1', '1.5', '1e3', '0x10', ' 7', '7 ', '1234567890', 'abc', '12abc']) {
      expect(idSchema.safeParse(raw).success, JSON.stringify(raw)).toBe(false);
    }
  });
});
