import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { decodeCaptionBytes } from '@server/modules/captions/caption-decode';

// Caption texts are invented for Grovewalk's fictional demo garden club ('Mossgate Ember' is a
// made-up epithet). Expected bytes and characters are cross-checked with Node's own encoders
// (Buffer) and its TextDecoder where those are exact; see each test.

const vtt = "WEBVTT\n\n00:01.000 --> 00:03.000\nL'\u00e9rable 'Mossgate Ember' \u00fcber alles (fictional)\n";

describe('decodeCaptionBytes', () => {
  it('accepts UTF-8 without a byte order mark', () => {
    expect(decodeCaptionBytes(Buffer.from(vtt, 'utf8'))).toEqual({ text: vtt, encoding: 'UTF-8', problems: [] });
  });

  it('accepts UTF-8 with a byte order mark (EF BB BF, as Node encodes U+FEFF) and removes the mark', () => {
    const bytes = Buffer.from(`\uFEFF${vtt}`, 'utf8');
    expect([...bytes.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    expect(decodeCaptionBytes(bytes)).toEqual({ text: vtt, encoding: 'UTF-8', problems: [] });
  });

  it('converts UTF-16LE with a byte order mark (bytes from Node\'s utf16le encoder: FF FE ...)', () => {
    const bytes = Buffer.from(`\uFEFF${vtt}`, 'utf16le');
    expect([...bytes.subarray(0, 2)]).toEqual([0xff, 0xfe]);
    const result = decodeCaptionBytes(bytes);
    expect(result.text).toBe(vtt);
    expect(result.encoding).toBe('UTF-16LE');
    expect(result.problems).toEqual([expect.objectContaining({ severity: 'warning' })]);
  });

  it('converts UTF-16BE with a byte order mark (Node\'s utf16le bytes swapped: FE FF ...)', () => {
    const bytes = Buffer.from(`\uFEFF${vtt}`, 'utf16le').swap16();
    expect([...bytes.subarray(0, 2)]).toEqual([0xfe, 0xff]);
    const result = decodeCaptionBytes(bytes);
    expect(result.text).toBe(vtt);
    expect(result.encoding).toBe('UTF-16BE');
  });

  it('converts windows-1252 text with é and ü, naming the encoding in a warning', () => {
    // windows-1252 bytes, from memory of Unicode's CP1252.TXT mapping table: E9 = é, FC = ü,
    // 80 = €, 93/94 = curly double quotes. E9 and FC are also checked against Node's TextDecoder
    // below; Node decodes 80-9F as C1 controls, so those three are checked as literals only.
    const ascii = (s: string) => [...Buffer.from(s, 'latin1')];
    const bytes = Buffer.from([
      ...ascii('1\r\n00:00:01,000 --> 00:00:02,000\r\nCaf'), 0xe9, ...ascii(' M'), 0xfc, ...ascii('ller '),
      0x93, ...ascii('Mossgate Ember'), 0x94, ...ascii(' 5 '), 0x80, ...ascii(' (fictional)\r\n'),
    ]);
    expect(new TextDecoder('windows-1252').decode(Buffer.from([0xe9, 0xfc]))).toBe('\u00e9\u00fc');
    const result = decodeCaptionBytes(bytes);
    expect(result.text).toBe('1\r\n00:00:01,000 --> 00:00:02,000\r\nCaf\u00e9 M\u00fcller \u201cMossgate Ember\u201d 5 \u20ac (fictional)\r\n');
    expect(result.encoding).toBe('windows-1252');
    expect(result.problems).toHaveLength(1);
    expect(result.problems[0]?.severity).toBe('warning');
    expect(result.problems[0]?.message).toContain('windows-1252');
  });

  it('reads Latin-1 text (no bytes 80-9F) as windows-1252, its superset, as the WHATWG Encoding Standard maps the "iso-8859-1" label (from memory)', () => {
    const bytes = Buffer.from(vtt, 'latin1');
    const result = decodeCaptionBytes(bytes);
    expect(result.text).toBe(new TextDecoder('iso-8859-1').decode(bytes));
    expect(result.text).toBe(vtt);
    expect(result.encoding).toBe('windows-1252');
    expect(result.problems[0]?.message).toMatch(/ISO-8859-1/);
  });

  it('refuses a binary blob (PNG file signature 89 50 4E 47 0D 0A 1A 0A, from memory of the W3C PNG specification)', () => {
    const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0x00, 0x00, 0x00, 0x0d, 0x49, 0x48, 0x44, 0x52]);
    const result = decodeCaptionBytes(png);
    expect(result.text).toBe('');
    expect(result.encoding).toBeNull();
    expect(result.problems).toEqual([{ severity: 'error', message: expect.stringMatching(/binary/) }]);
  });

  it('refuses control characters, empty files, UTF-32 and a UTF-8 mark on bytes that are not UTF-8', () => {
    expect(decodeCaptionBytes(Buffer.from([0x57, 0x45, 0x01, 0x02, 0x03, 0xc8]) ).problems[0]?.message).toMatch(/control characters/);
    expect(decodeCaptionBytes(Buffer.alloc(0)).problems[0]?.message).toMatch(/empty/);
    expect(decodeCaptionBytes(Buffer.from([0xff, 0xfe, 0x00, 0x00, 0x57, 0x00, 0x00, 0x00])).problems[0]?.message).toMatch(/UTF-32/);
    expect(decodeCaptionBytes(Buffer.from([0xef, 0xbb, 0xbf, 0x57, 0xe9, 0x0a])).encoding).toBeNull();
  });

  it('never throws on arbitrary bytes, and either returns text or refuses with an error (property)', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 400 }), (bytes) => {
        const result = decodeCaptionBytes(Buffer.from(bytes));
        if (result.encoding === null) {
          expect(result.text).toBe('');
          expect(result.problems.some((p) => p.severity === 'error')).toBe(true);
        } else {
          expect(result.text.includes('\u0000')).toBe(false);
          expect(result.problems.every((p) => p.severity === 'warning')).toBe(true);
        }
      }),
      { numRuns: 500 },
    );
  });
});
