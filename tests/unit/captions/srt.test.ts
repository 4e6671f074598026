import { describe, expect, it } from 'vitest';
import { detectFormat, parseCaptions } from '@shared/captions/detect-format';
import { parseSrt, serializeSrt } from '@shared/captions/srt';
import { parseVtt, serializeVtt } from '@shared/captions/webvtt';

// Caption texts here are invented for Grovewalk's fictional demo garden club; cultivar epithets
// such as 'Mossgate Ember' are made up. Timings come from the sources named in each test.

describe('parseSrt', () => {
  // Timing lines of the example in the Matroska specification, "SRT Subtitles"; text is ours.
  const example = [
    '1',
    '00:02:17,440 --> 00:02:20,375',
    "This is 'Mossgate Ember' (fictional),",
    'a dwarf maple in a buried pot.',
    '',
    '2',
    '00:02:20,476 --> 00:02:22,501',
    'Next stop: the fern walk.',
    '',
  ];

  it('reads the Matroska example timing: starts at 137.440 s and lasts 2.935 s (Matroska specification, "SRT Subtitles")', () => {
    const { cues, problems, format } = parseSrt(example.join('\n'));
    expect(format).toBe('srt');
    expect(problems).toEqual([]);
    expect(cues).toHaveLength(2);
    expect(cues[0]?.startMs).toBe(137_440);
    expect((cues[0]?.endMs ?? 0) - (cues[0]?.startMs ?? 0)).toBe(2_935);
    expect(cues[0]?.id).toBe('1'); // the sequence number becomes the cue id
    expect(cues[0]?.text).toBe("This is 'Mossgate Ember' (fictional),\na dwarf maple in a buried pot.");
    expect(cues[1]).toEqual({ id: '2', startMs: 140_476, endMs: 142_501, text: 'Next stop: the fern walk.' });
  });

  it('reads CRLF files the same as LF files (CRLF is common in SRT; Matroska specification, "SRT Subtitles")', () => {
    expect(parseSrt(example.join('\r\n'))).toEqual(parseSrt(example.join('\n')));
    expect(parseSrt('\uFEFF' + example.join('\r\n')).cues).toHaveLength(2);
  });

  it('keeps <b>, <i>, <u> as WebVTT tags, strips <font>, and escapes &, < and > (common practice for SRT files, no formal source)', () => {
    const file = '1\n00:00:01,000 --> 00:00:03,000\n<font color="#00ff00"><I>Acer</I></font> & <b>moss</b> < 3 > 2\n';
    const { cues, problems } = parseSrt(file);
    expect(cues[0]?.text).toBe('<i>Acer</i> &amp; <b>moss</b> &lt; 3 &gt; 2');
    expect(problems).toEqual([]);
  });

  it('removes other tags and brace codes with a warning on their line', () => {
    const { cues, problems } = parseSrt('1\n00:00:01,000 --> 00:00:03,000\nfirst\n{\\an8}<span class="x">top</span>\n');
    expect(cues[0]?.text).toBe('first\ntop');
    expect(problems.map((p) => [p.line, p.severity])).toEqual([
      [4, 'warning'],
      [4, 'warning'],
    ]);
  });

  it('drops display coordinates after the timing (common practice for SRT files, no formal source: "X1:... Y2:..." coordinates)', () => {
    const { cues, problems } = parseSrt('1\n00:02:26,407 --> 00:02:31,356 X1:100 X2:100 Y1:100 Y2:100\nFern walk\n');
    expect(cues[0]).toEqual({ id: '1', startMs: 146_407, endMs: 151_356, text: 'Fern walk' });
    expect(problems).toEqual([]);
  });

  it('reports bad blocks with their line numbers and keeps reading', () => {
    const file = [
      '1',
      '00:00:01,000 --> 00:00:02,000',
      'good one',
      '',
      '2',
      '00:00:03,000 -> 00:00:04,000', // line 6: bad arrow
      'lost',
      '',
      'stray words', // line 9: no number, no timing
      '',
      '4',
      '00:00:05,000 --> 00:00:61,000', // line 12: seconds out of range
      'lost too',
      '',
      '5',
      '00:00:07,000 --> 00:00:08,000',
      'good two',
    ].join('\r\n');
    const { cues, problems } = parseSrt(file);
    expect(cues.map((c) => c.text)).toEqual(['good one', 'good two']);
    expect(problems.filter((p) => p.severity === 'error').map((p) => p.line)).toEqual([6, 9, 12]);
    // The gap in numbering (2 → 4 → 5 after skipped blocks) is only a warning.
    expect(problems.filter((p) => p.severity === 'warning').every((p) => /Sequence number/.test(p.message))).toBe(true);
  });

  it('starts a new cue where a blank line is missing before a number and timing line, with a warning', () => {
    const { cues, problems } = parseSrt('1\n00:00:01,000 --> 00:00:02,000\nfern walk\n2\n00:00:03,000 --> 00:00:04,000\nmoss bank\n');
    expect(cues).toEqual([
      { id: '1', startMs: 1000, endMs: 2000, text: 'fern walk' },
      { id: '2', startMs: 3000, endMs: 4000, text: 'moss bank' },
    ]);
    expect(problems).toEqual([expect.objectContaining({ line: 4, severity: 'warning' })]);
    // A number alone inside the text (not followed by a timing line) stays text.
    expect(parseSrt('1\n00:00:01,000 --> 00:00:02,000\n42\nmaples\n').cues[0]?.text).toBe('42\nmaples');
  });

  it('accepts a full stop before the milliseconds and a missing number, with warnings', () => {
    const { cues, problems } = parseSrt('00:00:01.000 --> 00:00:02.000\nloose file\n');
    expect(cues).toEqual([{ startMs: 1000, endMs: 2000, text: 'loose file' }]);
    expect(problems.map((p) => p.severity)).toEqual(['warning', 'warning']);
  });

  it('sorts cues that are out of time order, with a warning', () => {
    const { cues, problems } = parseSrt('1\n00:00:05,000 --> 00:00:06,000\nlater\n\n2\n00:00:01,000 --> 00:00:02,000\nearlier\n');
    expect(cues.map((c) => c.text)).toEqual(['earlier', 'later']);
    expect(problems.some((p) => /sorted/.test(p.message))).toBe(true);
  });
});

describe('serializeSrt', () => {
  it('renumbers from 1, writes HH:MM:SS,mmm, and uses CRLF when asked', () => {
    const cues = [
      { id: 'stop-9', startMs: 140_476, endMs: 142_501, text: 'second', settings: 'align:start' },
      { id: 'intro', startMs: 137_440, endMs: 140_375, text: 'first' },
    ];
    expect(serializeSrt(cues)).toBe('1\n00:02:17,440 --> 00:02:20,375\nfirst\n\n2\n00:02:20,476 --> 00:02:22,501\nsecond\n');
    expect(serializeSrt(cues, { crlf: true })).toBe(
      '1\r\n00:02:17,440 --> 00:02:20,375\r\nfirst\r\n\r\n2\r\n00:02:20,476 --> 00:02:22,501\r\nsecond\r\n',
    );
  });

  it('keeps b/i/u, drops other WebVTT tags and decodes escapes', () => {
    const out = serializeSrt([
      { startMs: 0, endMs: 2000, text: '<v Mara>Look at the <i.latin>Acer</i> &amp; the <c.red>bark</c>\n\nnext &lt;line&gt;' },
    ]);
    expect(out).toBe('1\n00:00:00,000 --> 00:00:02,000\nLook at the <i>Acer</i> & the bark\nnext <line>\n');
  });

  it('reads back to the same times and text (SRT → cues → SRT)', () => {
    const file = '1\r\n00:02:17,440 --> 00:02:20,375\r\n<i>Fictional</i> maple &amp; moss\r\n';
    const once = parseSrt(file);
    expect(parseSrt(serializeSrt(once.cues, { crlf: true })).cues).toEqual(once.cues);
  });
});

describe('detectFormat and parseCaptions', () => {
  it('tells WebVTT (signature on line 1) from SRT (number then HH:MM:SS,mmm timing)', () => {
    expect(detectFormat('WEBVTT\n\n00:01.000 --> 00:02.000\nx')).toBe('vtt');
    expect(detectFormat('\uFEFFWEBVTT')).toBe('vtt');
    expect(detectFormat('\r\n\r\n1\r\n00:00:01,000 --> 00:00:02,000\r\nx')).toBe('srt');
    expect(detectFormat('00:00:01,000 --> 00:00:02,000\nx')).toBe('srt');
    expect(detectFormat('Hello there\nnot captions')).toBe('unknown');
    expect(detectFormat('')).toBe('unknown');
  });

  it('dispatches on the detected format or the hint, and explains text that is neither', () => {
    expect(parseCaptions('1\n00:00:01,000 --> 00:00:02,000\nx\n').format).toBe('srt');
    expect(parseCaptions('WEBVTT\n\n00:01.000 --> 00:02.000\nx\n').cues).toHaveLength(1);
    const unknown = parseCaptions('just some notes');
    expect(unknown.cues).toEqual([]);
    expect(unknown.problems[0]?.severity).toBe('error');
    expect(parseCaptions('WEBVTT\n\n00:01.000 --> 00:02.000\nx\n', 'srt').format).toBe('srt');
  });

  it('converts SRT to WebVTT as the domain notes describe: header added, "," → ".", number → id, <font> dropped', () => {
    const srt = '7\n00:02:17,440 --> 00:02:20,375 X1:1 X2:2 Y1:3 Y2:4\n<font color="red">Red</font> --> <b>leaf</b>\n';
    const cues = parseSrt(srt).cues;
    const vtt = serializeVtt(cues);
    expect(vtt).toBe('WEBVTT\n\n7\n00:02:17.440 --> 00:02:20.375\nRed --&gt; <b>leaf</b>\n\n');
    expect(parseVtt(vtt).cues).toEqual(cues);
  });
});
