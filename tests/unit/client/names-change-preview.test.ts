import { describe, expect, it } from 'vitest';
import { replaceVariant } from '@shared/names/replace';
import { buildPreview } from '@/features/spelling/lib/change-preview';

// Captions from the fictional demo club's walks (server/db/seed/demo-cultivars.ts); expected
// texts are worked out by hand. The preview must agree with shared/names/replace.ts, which is
// what the server's accept runs, so every case is also checked against it.
const cases: [string, string, string][] = [
  ['And back to Sora no hani, now scarlet.', 'Sora no hani', 'Sora-no-hane'],
  ['First the tall one by the gate: Amber Lantern.', 'Amber Lantern', 'Ember Lantern'],
  ['sora  no-HANI at the start, and Sora no hani again', 'Sora no hani', 'Sora-no-hane'],
  ['Sora no hani', 'Sora no hani', 'Sora-no-hane'],
];

describe('preview of a spelling fix on one caption', () => {
  it.each(cases)('agrees with the replacement the server runs: %s', (text, variant, accepted) => {
    const p = buildPreview(text, variant, accepted)!;
    const real = replaceVariant(text, variant, accepted);
    expect(p.afterText).toBe(real.text);
    expect(p.count).toBe(real.count);
    expect(p.before.map((s) => s.text).join('')).toBe(text);
    expect(p.after.map((s) => s.text).join('')).toBe(real.text);
  });

  it('marks exactly the misheard words before and the accepted name after', () => {
    const p = buildPreview('And back to Sora no hani, now scarlet.', 'Sora no hani', 'Sora-no-hane')!;
    expect(p.before).toEqual([
      { text: 'And back to ', changed: false },
      { text: 'Sora no hani', changed: true },
      { text: ', now scarlet.', changed: false },
    ]);
    expect(p.after).toEqual([
      { text: 'And back to ', changed: false },
      { text: 'Sora-no-hane', changed: true },
      { text: ', now scarlet.', changed: false },
    ]);
  });

  it('marks each of several occurrences, keeping the text between them', () => {
    const p = buildPreview('sora  no-HANI at the start, and Sora no hani again', 'Sora no hani', 'Sora-no-hane')!;
    expect(p.before.filter((s) => s.changed).map((s) => s.text)).toEqual(['sora  no-HANI', 'Sora no hani']);
    expect(p.after.filter((s) => s.changed).map((s) => s.text)).toEqual(['Sora-no-hane', 'Sora-no-hane']);
    expect(p.count).toBe(2);
  });

  it('has nothing to preview when the words are absent or only part of a longer word', () => {
    expect(buildPreview('Ember Lantern turns butter yellow in autumn.', 'Amber Lantern', 'Ember Lantern')).toBeNull();
    expect(buildPreview('The Amber Lanterns glow.', 'Amber Lantern', 'Ember Lantern')).toBeNull();
  });
});
