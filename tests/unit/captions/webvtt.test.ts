import { describe, expect, it } from 'vitest';
import { cuePlainText } from '@shared/captions/cue-text';
import { readCueSettings } from '@shared/captions/cue-settings';
import { parseVtt, parseVttTimingLine, serializeVtt } from '@shared/captions/webvtt';
import type { Cue } from '@shared/captions/types';

// Cue texts marked "fictional" are invented for Grovewalk's demo garden club; the cultivar
// epithets in them ('Mossgate Ember', 'Tinder Lace') are made up.

describe('parseVtt', () => {
  it('reads the line-breaking example of the W3C WebVTT specification (§1.2) with its three cues', () => {
    const file = [
      'WEBVTT',
      '',
      '00:01.000 --> 00:04.000',
      'Never drink liquid nitrogen.',
      '',
      '00:05.000 --> 00:09.000',
      '&mdash; It will perforate your stomach.',
      '&mdash; You could die.',
      '',
      '00:10.000 --> 00:14.000',
      'The Organisation for Sample Public Service Announcements accepts no liability for the content of this advertisement, or for the consequences of any actions taken on the basis of the information provided.',
      '',
    ].join('\n');
    const { cues, problems, format } = parseVtt(file);
    expect(format).toBe('vtt');
    expect(problems).toEqual([]);
    expect(cues.map((c) => [c.startMs, c.endMs])).toEqual([
      [1000, 4000],
      [5000, 9000],
      [10_000, 14_000],
    ]);
    expect(cues[1]?.text).toBe('&mdash; It will perforate your stomach.\n&mdash; You could die.');
    // "&mdash;" is U+2014 in the HTML named character reference table.
    expect(cuePlainText(cues[1]?.text ?? '')).toBe('\u2014 It will perforate your stomach.\n\u2014 You could die.');
  });

  it('rejects a file that does not start with WEBVTT (W3C WebVTT §6.1 parser: signature check)', () => {
    const result = parseVtt('1\n00:00:01,000 --> 00:00:02,000\nHello\n');
    expect(result.cues).toEqual([]);
    expect(result.problems).toHaveLength(1);
    expect(result.problems[0]).toMatchObject({ line: 1, severity: 'error' });
    expect(parseVtt('WEBVTTX\n\n00:01.000 --> 00:02.000\nx\n').cues).toEqual([]);
    expect(parseVtt('\uFEFFWEBVTT - with header text\n\n00:01.000 --> 00:02.000\nx\n').cues).toHaveLength(1);
  });

  it('drops only the cue whose timing line is bad, reporting its line (W3C WebVTT §6.1, collect a WebVTT block)', () => {
    const file = 'WEBVTT\n\n00:01.000 --> 00:02.000\nfirst\n\n00:03.00 --> 00:04.000\nbroken\n\n00:05.000 --> 00:06.000\nthird\n';
    const { cues, problems } = parseVtt(file);
    expect(cues.map((c) => c.text)).toEqual(['first', 'third']);
    const errors = problems.filter((p) => p.severity === 'error');
    expect(errors).toHaveLength(1);
    expect(errors[0]?.line).toBe(6);
    expect(errors[0]?.message).toMatch(/skipped/);
  });

  it('keeps a cue whose end is before its start, with a warning (web-platform-tests timings-negative)', () => {
    const { cues, problems } = parseVtt('WEBVTT\n\n00:00:01.000 --> 00:00:00.999\ntext2\n');
    expect(cues).toEqual([{ startMs: 1000, endMs: 999, text: 'text2' }]);
    expect(problems).toEqual([expect.objectContaining({ line: 3, severity: 'warning' })]);
  });

  it('keeps valid settings as written and reports the ones it drops, with their line', () => {
    const file = 'WEBVTT\n\nstop-1\n00:00:01.000 --> 00:00:02.000 align:start bogus:1 line:90% size:120%\nfictional: \'Mossgate Ember\'\n';
    const { cues, problems } = parseVtt(file);
    expect(cues[0]).toEqual({ id: 'stop-1', startMs: 1000, endMs: 2000, settings: 'align:start line:90%', text: "fictional: 'Mossgate Ember'" });
    expect(problems.map((p) => [p.line, p.severity, p.message.includes('bogus') || p.message.includes('size')])).toEqual([
      [4, 'warning', true],
      [4, 'warning', true],
    ]);
  });

  it('decodes escapes with the full HTML entity table ("&eacute;" is U+00E9)', () => {
    const { cues } = parseVtt('WEBVTT\n\n00:01.000 --> 00:02.000\nBark &amp; leaves, r&eacute;sum&eacute; &lt;3\n');
    expect(cuePlainText(cues[0]?.text ?? '')).toBe('Bark & leaves, r\u00e9sum\u00e9 <3');
  });

  it('never throws and reports a problem for text that is not WebVTT at all', () => {
    for (const junk of ['', '\u0000\u0000', '-->', 'WEBVTT\n\n-->\n-->\n\n', 'WEBVTT\n\n00:00.000 --> 99999999999999999999:00:00.000\nx']) {
      expect(() => parseVtt(junk)).not.toThrow();
    }
    expect(parseVtt('').problems[0]?.severity).toBe('error');
  });
});

describe('parseVttTimingLine (W3C WebVTT §6.3, collect WebVTT cue timings and settings)', () => {
  it('splits start, end and the settings remainder', () => {
    expect(parseVttTimingLine('  00:01.000\t-->  00:00:02.500 align:end  line:0')).toEqual({
      startMs: 1000,
      endMs: 2500,
      settings: ' align:end  line:0',
    });
    expect(parseVttTimingLine('00:01.000 -> 00:02.000')).toBeNull();
    expect(parseVttTimingLine('00:01.000 --> ')).toBeNull();
  });
});

describe('serializeVtt', () => {
  const cues: Cue[] = [
    { id: 'stop-2', startMs: 61_500, endMs: 64_000, text: "Fictional: 'Tinder Lace' in a buried pot", settings: 'line:90% align:start' },
    { startMs: 1000, endMs: 3500, text: 'Welcome to the fictional Larkspur Lane garden' },
  ];

  it('writes the signature, optional header, sorted cues and hh:mm:ss.ttt times', () => {
    expect(serializeVtt(cues, { header: 'Larkspur Lane tour (fictional)' })).toBe(
      [
        'WEBVTT Larkspur Lane tour (fictional)',
        '',
        '00:00:01.000 --> 00:00:03.500',
        'Welcome to the fictional Larkspur Lane garden',
        '',
        'stop-2',
        '00:01:01.500 --> 00:01:04.000 line:90% align:start',
        "Fictional: 'Tinder Lace' in a buried pot",
        '',
        '',
      ].join('\n'),
    );
  });

  it('makes text safe: "-->" cannot appear in cue text and blank lines would end the cue (W3C WebVTT §4, cue payload syntax)', () => {
    const out = serializeVtt([{ startMs: 0, endMs: 1000, text: 'left --> right\n\nsecond line\r\nthird' }]);
    expect(out).toBe('WEBVTT\n\n00:00:00.000 --> 00:00:01.000\nleft --&gt; right\nsecond line\nthird\n\n');
    const back = parseVtt(out);
    expect(back.cues).toHaveLength(1);
    expect(cuePlainText(back.cues[0]?.text ?? '')).toBe('left --> right\nsecond line\nthird');
  });

  it('keeps ids safe: no line breaks or "-->", and leaves out ids that would read as NOTE or STYLE blocks', () => {
    const out = serializeVtt([
      { id: 'a-->b\nc', startMs: 0, endMs: 1000, text: 'one' },
      { id: 'NOTE to self', startMs: 2000, endMs: 3000, text: 'two' },
    ]);
    const back = parseVtt(out);
    expect(back.cues.map((c) => [c.id, c.text])).toEqual([
      ['a->b c', 'one'],
      [undefined, 'two'],
    ]);
    expect(back.problems).toEqual([]);
  });

  it('writes only valid settings', () => {
    const out = serializeVtt([{ startMs: 0, endMs: 1000, text: 'x', settings: 'align:middle size:50% size:40%' }]);
    expect(out).toContain('00:00:00.000 --> 00:00:01.000 size:40%\n');
    expect(readCueSettings(parseVtt(out).cues[0]?.settings).size).toBe(40);
  });
});
