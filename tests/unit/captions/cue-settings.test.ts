import { describe, expect, it } from 'vitest';
import { cleanCueSettings, readCueSettings } from '@shared/captions/cue-settings';

// Rules: W3C WebVTT, "parse the WebVTT cue settings" (settings are read left to right, a later
// setting of the same name wins, an invalid one is skipped on its own) and "parse a percentage
// string" (digits, optional fraction, "%", 0 to 100).

describe('readCueSettings', () => {
  it('starts from the spec defaults (line auto, position auto, size 100, align center)', () => {
    expect(readCueSettings(undefined)).toEqual({
      vertical: '',
      line: 'auto',
      snapToLines: true,
      lineAlign: 'start',
      position: 'auto',
      positionAlign: 'auto',
      size: 100,
      align: 'center',
    });
  });

  it('reads line numbers and percentages, and keeps an earlier line alignment when a later line only changes the number', () => {
    expect(readCueSettings('line:-2')).toMatchObject({ line: -2, snapToLines: true });
    expect(readCueSettings('line:90%')).toMatchObject({ line: 90, snapToLines: false });
    expect(readCueSettings('line:10%,end line:20%')).toMatchObject({ line: 20, lineAlign: 'end' });
  });

  it('splits settings on any ASCII whitespace (HTML "split a string on spaces")', () => {
    expect(readCueSettings('align:end\tsize:50%\fline:3')).toMatchObject({ align: 'end', size: 50, line: 3 });
  });
});

describe('cleanCueSettings', () => {
  it('leaves a valid list exactly as written', () => {
    expect(cleanCueSettings('align:start line:90%').settings).toBe('align:start line:90%');
    expect(cleanCueSettings('vertical:rl line:-1,center position:12.5%,line-left size:0% align:right')).toEqual({
      settings: 'vertical:rl line:-1,center position:12.5%,line-left size:0% align:right',
      ignored: [],
    });
  });

  it('drops invalid and replaced settings, saying why, and keeps the rest in their order', () => {
    const { settings, ignored } = cleanCueSettings('size:50% align:middle region:r1 size:40% line:1%,middle x');
    expect(settings).toBe('size:40% line:1%');
    expect(ignored.map((i) => i.token)).toEqual(['align:middle', 'region:r1', 'size:50%', 'line:1%,middle', 'x']);
    expect(ignored.find((i) => i.token === 'region:r1')?.reason).toMatch(/regions are not supported/);
    expect(ignored.find((i) => i.token === 'size:50%')?.reason).toMatch(/later "size"/);
  });

  it('writes back a line alignment that a later number-only line setting keeps', () => {
    expect(cleanCueSettings('line:10%,end line:20%').settings).toBe('line:20%,end');
    expect(readCueSettings(cleanCueSettings('line:10%,end line:20%').settings)).toEqual(readCueSettings('line:10%,end line:20%'));
  });
});
