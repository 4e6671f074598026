// Pure helpers behind the caption, stop and cultivar routes. Names and texts are invented for the
// fictional Fernhollow Garden Club.
import { describe, expect, it } from 'vitest';
import { canonicalLanguageTag } from '../../../server/modules/captions/lang-tag';
import { buildTranscript } from '../../../server/modules/captions/transcript';
import { fileStem } from '../../../server/modules/captions/caption.service';
import { firstFreeSlug, slugify } from '../../../server/modules/cultivars/slug';
import { clock } from '../../../server/modules/stops/stop.service';
import { heardNames, proposeStops } from '../../../server/modules/stops/stop-suggestions';
import { buildNameIndex } from '../../../shared/names/matcher';

describe('canonicalLanguageTag', () => {
  it('applies the BCP 47 case conventions (RFC 5646 §2.1.1: language lower, script title, region upper)', () => {
    expect(canonicalLanguageTag('EN-gb').tag).toBe('en-GB');
    expect(canonicalLanguageTag('sr-latn-rs').tag).toBe('sr-Latn-RS');
    expect(canonicalLanguageTag('ja').languageName).toBe('Japanese');
  });

  it('refuses primary subtags that are not languages (IANA registry: "xq" and "zz" are unassigned)', () => {
    expect(() => canonicalLanguageTag('xq')).toThrow(/not a known language tag/);
    expect(() => canonicalLanguageTag('zz-GB')).toThrow(/not a known language tag/);
  });
});

describe('buildTranscript (paragraph rules: common practice, no source)', () => {
  it('breaks at a pause of two seconds or more, not at a shorter one', () => {
    const p = buildTranscript([
      { startMs: 0, endMs: 1000, text: 'One.' },
      { startMs: 2999, endMs: 4000, text: 'Two.' },
      { startMs: 6000, endMs: 7000, text: 'Three.' },
    ]);
    expect(p).toEqual([
      { startMs: 0, endMs: 4000, text: 'One. Two.' },
      { startMs: 6000, endMs: 7000, text: 'Three.' },
    ]);
  });

  it('ends a long run after eight cues even without a full stop, and skips cues without text', () => {
    const cues = Array.from({ length: 10 }, (_, i) => ({ startMs: i * 1000, endMs: i * 1000 + 900, text: i === 4 ? '<i></i>' : `word${i}` }));
    const p = buildTranscript(cues);
    expect(p.map((x) => x.text.split(' ').length)).toEqual([8, 1]);
    expect(p[1]).toEqual({ startMs: 9000, endMs: 9900, text: 'word9' });
  });
});

describe('stop suggestions (product rules from the captions issue, no outside source)', () => {
  const index = buildNameIndex([
    { id: 1, acceptedEpithet: 'Brindlewick Flame' },
    { id: 2, acceptedEpithet: 'Quillmere Lace', variants: ['Quilmear Lace'] },
  ]);

  it('keeps the first name of a cue and one hit per run of the same record', () => {
    const names = heardNames(
      [
        { startMs: 0, text: 'Brindlewick Flame and Quillmere Lace side by side.' },
        { startMs: 5000, text: 'The Brindlewick Flame again.' },
        { startMs: 9000, text: 'Now Quilmear Lace.' },
      ],
      index,
    );
    expect(names.map((n) => [n.cueStartMs, n.cultivarId, n.kind])).toEqual([
      [0, 1, 'exact'],
      [9000, 2, 'variant'],
    ]);
  });

  it('ends at the next name, else after 30 s or at the video end, and drops ranges under a second', () => {
    const hit = (cueStartMs: number, cultivarId: number) => ({ cueStartMs, cultivarId, heard: '', score: 1, kind: 'exact' as const });
    const proposals = proposeStops([hit(0, 1), hit(500, 2), hit(10_000, 1), hit(50_000, 2)], { durationMs: 70_000, stops: [] });
    expect(proposals.map((p) => [p.startMs, p.endMs])).toEqual([
      [500, 10_000],
      [10_000, 50_000],
      [50_000, 70_000],
    ]);
    expect(proposeStops([hit(50_000, 2)], { durationMs: null, stops: [] }).map((p) => p.endMs)).toEqual([80_000]);
  });
});

describe('small formatters', () => {
  it('clock writes m:ss, h:mm:ss and milliseconds only when present', () => {
    expect(clock(0)).toBe('0:00');
    expect(clock(65_250)).toBe('1:05.250');
    expect(clock(3_723_000)).toBe('1:02:03');
  });

  it('slugs fold accents and drop quotes; clashes get -2, -3…', () => {
    expect(slugify("Acer palmatum (Dissectum Group) 'Fernhollow Émber'")).toBe('acer-palmatum-dissectum-group-fernhollow-ember');
    expect(firstFreeSlug('acer-x', new Set(['acer-x', 'acer-x-2']))).toBe('acer-x-3');
    expect(fileStem('Fernhollow: spring walk (fictional)')).toBe('fernhollow-spring-walk-fictional');
    expect(fileStem('???')).toBe('tour');
  });
});
