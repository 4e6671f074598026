import { describe, expect, it } from 'vitest';
import { checkCues, THRESHOLDS } from '@shared/captions/quality';
import { badgeFor, issuesByCue, limitText, summarise, thresholdOf } from '@/features/captions/lib/quality-view';

// The limits come from the shared table (BBC Subtitle Guidelines §3.1: 37 characters per line;
// §3.3: two lines; §4.5: a gap of at least one second). The cue texts are invented for the
// fictional demo club; 'Mossgate Ember' is an invented epithet.

const line38 = 'Bark and leaves of Mossgate Ember, May'; // 38 characters

describe('quality badges name the limit and its source', () => {
  it('a 38-character line gets a badge citing "over 37 characters per line — BBC Subtitle Guidelines … §3.1"', () => {
    expect(line38).toHaveLength(38);
    const [issue] = checkCues([{ startMs: 0, endMs: 6000, text: line38 }]).filter((i) => i.kind === 'line-length');
    const badge = badgeFor(issue!);
    expect(badge.label).toBe('38 chars in a line');
    expect(badge.limit).toMatch(/^over 37 characters per line — BBC Subtitle Guidelines.*§3\.1/);
  });

  it('maps each kind to the threshold it was measured against, the hard speed limit for errors', () => {
    expect(thresholdOf({ kind: 'reading-speed', severity: 'warning' })).toBe('maxWordsPerMinute');
    expect(thresholdOf({ kind: 'reading-speed', severity: 'error' })).toBe('hardMaxWordsPerMinute');
    expect(thresholdOf({ kind: 'gap', severity: 'warning' })).toBe('minGapMs');
    expect(thresholdOf({ kind: 'timing', severity: 'error' })).toBeNull();
    expect(limitText('minGapMs')).toBe(`under 1000 milliseconds — ${THRESHOLDS.minGapMs.source}`);
    expect(limitText('maxCharsPerSecond')).toMatch(/common practice/);
  });

  it('labels overlaps, tiny gaps and broken timings briefly, with the WebVTT rule for the latter', () => {
    const issues = checkCues([
      { startMs: 0, endMs: 2500, text: 'First' },
      { startMs: 2000, endMs: 4000, text: 'Second' },
      { startMs: 4400, endMs: 6000, text: 'Third' },
      { startMs: 9000, endMs: 8000, text: 'Broken' },
    ]);
    const labels = issues.map((i) => badgeFor(i).label);
    expect(labels).toContain('overlaps 0.5 s');
    expect(labels).toContain('gap 0.4 s');
    expect(labels).toContain('ends before it starts');
    const timing = issues.find((i) => i.kind === 'timing')!;
    expect(badgeFor(timing).limit).toMatch(/WebVTT/);
  });
});

describe('summary counts', () => {
  it('counts cues with findings, errors, warnings and kinds in a fixed order', () => {
    const cues = [
      { startMs: 0, endMs: 6000, text: `${line38}\nsecond\nthird` },
      { startMs: 9000, endMs: 8000, text: 'Broken' },
      { startMs: 10_000, endMs: 12_000, text: 'Fine' },
    ];
    const issues = checkCues(cues);
    const s = summarise(issues, cues.length);
    expect(s).toMatchObject({ cues: 3, cuesWithIssues: 2, errors: 1, warnings: 2 });
    expect(s.byKind.map((k) => k.kind)).toEqual(['timing', 'line-length', 'line-count']);
    expect([...issuesByCue(issues).keys()]).toEqual([0, 1]);
  });
});
