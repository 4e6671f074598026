// Property tests (fast-check): writing then reading gives back what was written, and the parsers
// never throw on arbitrary input. Valid WebVTT settings are generated per the W3C WebVTT cue
// settings syntax (vertical, line, position, size, align).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sortCues } from '@shared/captions/cue-order';
import { escapeCueText } from '@shared/captions/cue-text';
import { parseCaptions } from '@shared/captions/detect-format';
import { checkCues } from '@shared/captions/quality';
import { parseSrt, serializeSrt } from '@shared/captions/srt';
import type { Cue } from '@shared/captions/types';
import { parseVtt, serializeVtt } from '@shared/captions/webvtt';

const RUNS = { numRuns: 300 };
const TEN_HOURS = 10 * 3600 * 1000;

const time = fc.integer({ min: 0, max: TEN_HOURS });
const char = fc.constantFrom(...'abcXYZ019 -_:.,;!?\'"<>&/()\u00e9\u00fc\u6728\u2014\t'.split(''));
const line = fc.string({ unit: char, minLength: 1, maxLength: 30 }).filter((s) => !s.includes('-->'));

const id = line.filter((s) => !/^(NOTE|STYLE)($|[ \t])/.test(s));

const percent = fc.oneof(
  fc.integer({ min: 0, max: 100 }).map(String),
  fc.tuple(fc.integer({ min: 0, max: 99 }), fc.integer({ min: 1, max: 9 })).map(([a, b]) => `${a}.${b}`),
).map((n) => `${n}%`);
const setting = {
  vertical: fc.constantFrom('vertical:rl', 'vertical:lr'),
  line: fc
    .tuple(
      fc.oneof(fc.integer({ min: -5, max: 120 }).map(String), percent),
      fc.option(fc.constantFrom('start', 'center', 'end'), { nil: undefined }),
    )
    .map(([pos, align]) => `line:${pos}${align ? `,${align}` : ''}`),
  position: fc
    .tuple(percent, fc.option(fc.constantFrom('line-left', 'center', 'line-right'), { nil: undefined }))
    .map(([pos, align]) => `position:${pos}${align ? `,${align}` : ''}`),
  size: percent.map((p) => `size:${p}`),
  align: fc.constantFrom('start', 'center', 'end', 'left', 'right').map((a) => `align:${a}`),
};
const settings = fc
  .shuffledSubarray(Object.values(setting), { minLength: 1 })
  .chain((arbs) => fc.tuple(...arbs))
  .map((tokens) => tokens.join(' '));

function cueArbitrary(textLine: fc.Arbitrary<string>): fc.Arbitrary<Cue> {
  return fc.record(
    {
      id,
      startMs: time,
      endMs: time,
      text: fc.array(textLine, { maxLength: 3 }).map((lines) => lines.join('\n')),
      settings,
    },
    { requiredKeys: ['startMs', 'endMs', 'text'] },
  );
}

// Well-formed cue text: escaped plain text, optionally inside one <b>, <i> or <u> span.
const markupLine = fc
  .tuple(line, fc.constantFrom('', 'b', 'i', 'u'))
  .map(([plain, tag]) => (tag ? `<${tag}>${escapeCueText(plain)}</${tag}>` : escapeCueText(plain)));

const endsEarly = /ends before or when it starts/;

describe('serializeVtt then parseVtt (W3C WebVTT syntax, property)', () => {
  it('gives back the same cues, in WebVTT cue order, with no problems for well-formed cue text', () => {
    fc.assert(
      fc.property(fc.array(cueArbitrary(markupLine), { maxLength: 12 }), fc.option(line, { nil: undefined }), (cues, header) => {
        const result = parseVtt(serializeVtt(cues, { header }));
        expect(result.cues).toEqual(sortCues(cues));
        // End-before-start cues may be generated; those are the only expected remarks.
        expect(result.problems.filter((p) => !endsEarly.test(p.message))).toEqual([]);
      }),
      RUNS,
    );
  });

  it('keeps any raw cue text without blank lines or "-->" unchanged (markup mistakes are only warnings)', () => {
    fc.assert(
      fc.property(fc.array(cueArbitrary(line), { maxLength: 12 }), (cues) => {
        const result = parseVtt(serializeVtt(cues));
        expect(result.cues).toEqual(sortCues(cues));
        expect(result.problems.filter((p) => p.severity === 'error')).toEqual([]);
      }),
      RUNS,
    );
  });
});

describe('serializeSrt then parseSrt (property, modulo what SRT cannot carry)', () => {
  // SRT keeps times, text and b/i/u; ids become sequence numbers and settings are lost. Text is
  // generated as plain text (no "<" that could look like a tag, no brace codes), escaped as cue text.
  const srtLine = fc
    .tuple(
      fc.string({ unit: fc.constantFrom(...'abcXYZ019 -_:.,;!?\'"&>/()\u00e9\u6728'.split('')), minLength: 1, maxLength: 30 }),
      fc.constantFrom('', 'b', 'i', 'u'),
    )
    .filter(([plain]) => plain.trim() !== '' && !plain.includes('-->'))
    .map(([plain, tag]) => (tag ? `<${tag}>${escapeCueText(plain)}</${tag}>` : escapeCueText(plain)));
  const srtCue = fc.record(
    {
      id,
      startMs: time,
      endMs: time,
      text: fc.array(srtLine, { maxLength: 3 }).map((lines) => lines.join('\n')),
      settings,
    },
    { requiredKeys: ['startMs', 'endMs', 'text'] },
  );

  it('gives back times and text, numbered from 1 in time order', () => {
    fc.assert(
      fc.property(fc.array(srtCue, { maxLength: 12 }), fc.boolean(), (cues, crlf) => {
        const expected = sortCues(cues).map((cue, index) => ({
          id: String(index + 1),
          startMs: cue.startMs,
          endMs: cue.endMs,
          text: cue.text,
        }));
        const result = parseSrt(serializeSrt(cues, { crlf }));
        expect(result.cues).toEqual(expected);
        expect(result.problems.filter((p) => p.severity === 'error')).toEqual([]);
      }),
      RUNS,
    );
  });
});

describe('parsers never throw; they report problems instead (property)', () => {
  const fragments = fc.constantFrom(
    'WEBVTT', '-->', '00:00.000', '00:00:01.000', '00:00:01,000', ' --> ', '\n', '\r\n', '\n\n', 'NOTE', 'STYLE',
    'REGION', '<i>', '</b>', '<v Ann>', '<00:00.500>', '&amp', '&#x41;', '&', 'align:', 'line:-1%,end', '\u0000',
    '\uFEFF', '1', 'X1:10', '<font color=red>', '{\\an8}', 'text',
  );
  const structured = fc.array(fragments, { maxLength: 60 }).map((parts) => parts.join(''));

  it('for parseVtt, parseSrt and parseCaptions on random strings, byte soup and caption-like fragments', () => {
    const inputs = fc.oneof(
      fc.string({ maxLength: 300 }),
      fc.string({ unit: 'binary', maxLength: 300 }),
      fc.uint8Array({ maxLength: 300 }).map((bytes) => new TextDecoder('latin1').decode(bytes)),
      structured,
      structured.map((s) => `WEBVTT\n\n${s}`),
    );
    fc.assert(
      fc.property(inputs, (input) => {
        for (const parse of [parseVtt, parseSrt, parseCaptions]) {
          const result = parse(input);
          expect(Array.isArray(result.cues)).toBe(true);
          expect(Array.isArray(result.problems)).toBe(true);
          for (const p of result.problems) expect(p.line).toBeGreaterThanOrEqual(1);
          // Whatever was read can be written out again and checked.
          expect(() => serializeVtt(result.cues)).not.toThrow();
          expect(() => serializeSrt(result.cues)).not.toThrow();
          expect(() => checkCues(result.cues)).not.toThrow();
        }
      }),
      { numRuns: 500 },
    );
  });
});
