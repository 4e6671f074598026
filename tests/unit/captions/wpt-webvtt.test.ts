// Runs parseVtt against WebVTT parser cases from web-platform-tests
// (web-platform-tests/wpt, webvtt/parsing/file-parsing/support/*.test, BSD-3-Clause).
// Each fixture in tests/fixtures/wpt-webvtt/ holds one original .test file and its assertions
// restated as data; see the README there for what is in and out of scope.
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { readCueSettings, type CueLayout } from '@shared/captions/cue-settings';
import { parseVtt } from '@shared/captions/webvtt';

interface ExpectedCue extends Partial<CueLayout> {
  index: number;
  id?: string;
  text?: string;
  startTime?: number;
  endTime?: number;
}

interface Fixture {
  source: { repository: string; path: string; commit: string; characters: number; licence: string };
  title: string;
  original: string;
  expected: { cueCount: number; cues: ExpectedCue[] };
}

const folder = new URL('../../fixtures/wpt-webvtt/', import.meta.url);
const fixtures: [string, Fixture][] = readdirSync(folder)
  .filter((name) => name.endsWith('.json'))
  .sort()
  .map((name) => [name.replace(/\.json$/, ''), JSON.parse(readFileSync(new URL(name, folder), 'utf8')) as Fixture]);

/**
 * Python's "unicode_escape" decoding, which the suite's tools/build.py applies to the WebVTT part
 * (`bytes(vtt, "utf-8").decode("unicode_escape")`). Only valid for ASCII input (Python would
 * read other bytes as Latin-1), which the runner checks.
 */
function decodeUnicodeEscape(input: string): string {
  const simple: Record<string, string> = {
    '\n': '', '\\': '\\', "'": "'", '"': '"', a: '\x07', b: '\b', f: '\f', n: '\n', r: '\r', t: '\t', v: '\v',
  };
  let out = '';
  for (let i = 0; i < input.length; i++) {
    const ch = input[i] as string;
    if (ch !== '\\') {
      out += ch;
      continue;
    }
    const next = input[i + 1];
    if (next === undefined) throw new Error('trailing backslash');
    if (next in simple) {
      out += simple[next];
      i += 1;
    } else if (next >= '0' && next <= '7') {
      const octal = /^[0-7]{1,3}/.exec(input.slice(i + 1))![0];
      out += String.fromCharCode(parseInt(octal, 8));
      i += octal.length;
    } else if (next === 'x' || next === 'u' || next === 'U') {
      const size = next === 'x' ? 2 : next === 'u' ? 4 : 8;
      const hex = input.slice(i + 2, i + 2 + size);
      if (!new RegExp(`^[0-9A-Fa-f]{${size}}$`).test(hex)) throw new Error(`bad \\${next} escape`);
      out += String.fromCodePoint(parseInt(hex, 16));
      i += 1 + size;
    } else {
      out += `\\${next}`; // Python keeps unknown escapes as written
      i += 1;
    }
  }
  return out;
}

/** tools/build.py: header and body split at the first blank line; assertions and WebVTT at "===\n". */
function splitSource(source: string): { title: string; assertions: string; vtt: string } {
  const blank = source.indexOf('\n\n');
  const header = source.slice(0, blank);
  const body = source.slice(blank + 2);
  const separator = body.indexOf('===\n');
  return { title: header.split('\n')[0] as string, assertions: body.slice(0, separator), vtt: body.slice(separator + 4) };
}

describe('Python unicode_escape emulation used for the WPT sources (Python docs, "unicode_escape" codec)', () => {
  it('decodes \\xHH, \\uHHHH, \\t/\\f/\\v/\\r/\\n, octal and backslash-newline line continuation', () => {
    expect(decodeUnicodeEscape('a\\x00b\\uFFFDc')).toBe('a\u0000b\uFFFDc');
    expect(decodeUnicodeEscape('\\t\\f\\v\\r\\n')).toBe('\t\f\v\r\n');
    expect(decodeUnicodeEscape('\\0003')).toBe('\u00003');
    expect(decodeUnicodeEscape('WEBVTT\\r\\\nx')).toBe('WEBVTT\rx');
    expect(decodeUnicodeEscape('keep \\q')).toBe('keep \\q');
  });
});

describe('web-platform-tests WebVTT file-parsing cases (web-platform-tests/wpt, BSD-3-Clause)', () => {
  it('has at least 15 cases reproduced', () => {
    expect(fixtures.length).toBeGreaterThanOrEqual(15);
  });

  describe.each(fixtures)('%s', (name, fixture) => {
    const { title, assertions, vtt } = splitSource(fixture.original);

    it(`is the unchanged source of ${fixture.source.path}`, () => {
      expect(fixture.source.repository).toBe('web-platform-tests/wpt');
      expect(fixture.source.path).toBe(`webvtt/parsing/file-parsing/support/${name}.test`);
      expect(fixture.original.length).toBe(fixture.source.characters);
      expect(title).toBe(fixture.title);
      expect(assertions).toContain(`assert_equals(cues.length, ${fixture.expected.cueCount}`);
      expect(/^[\x00-\x7f]*$/.test(vtt)).toBe(true);
    });

    it(`parses as the suite asserts ("${title}")`, () => {
      const result = parseVtt(decodeUnicodeEscape(vtt));
      // The suite loads every one of these files successfully: no rejected signature.
      expect(result.problems.filter((p) => p.message.includes('WEBVTT'))).toEqual([]);
      expect(result.cues).toHaveLength(fixture.expected.cueCount);
      for (const want of fixture.expected.cues) {
        const cue = result.cues[want.index];
        expect(cue, `cue ${want.index}`).toBeDefined();
        if (!cue) continue;
        const layout = readCueSettings(cue.settings);
        const where = `cue ${want.index}`;
        if (want.id !== undefined) expect(cue.id ?? '', where).toBe(want.id);
        if (want.text !== undefined) expect(cue.text, where).toBe(want.text);
        if (want.startTime !== undefined) expect(cue.startMs / 1000, where).toBe(want.startTime);
        if (want.endTime !== undefined) expect(cue.endMs / 1000, where).toBe(want.endTime);
        for (const key of ['align', 'line', 'snapToLines', 'lineAlign', 'position', 'positionAlign', 'size', 'vertical'] as const) {
          // toBe uses Object.is, so 0 and -0 differ, as in the suite's assert_equals.
          if (want[key] !== undefined) expect(layout[key], `${where} ${key}`).toBe(want[key]);
        }
      }
    });
  });
});
