import { describe, expect, it } from 'vitest';
import { serializeVtt } from '@shared/captions/webvtt';
import { WebVTTParser } from '@shared/captions/vtt-engine';
import {
  addCueAt,
  cueIndexAt,
  cuesForSave,
  deleteCue,
  editorCues,
  mergeWithNext,
  NEW_CUE_MS,
  NUDGE_MS,
  nudgeEdge,
  setEdge,
  setText,
  splitCue,
  splitText,
  type EditorCue,
} from '@/features/captions/lib/cue-ops';

// Cue texts are invented for the fictional Fernhollow Maple Circle; 'Lantern Moss' and
// 'Mizu-kagari' are invented cultivar epithets. Results are read back through webvtt-parser (the
// npm reference parser for W3C WebVTT) after the shared serialiser writes them, so a check holds
// for what a conforming player would see, not only for our own objects.

function keys() {
  let n = 0;
  return () => `k${++n}`;
}

function cue(key: string, startMs: number, endMs: number, text: string): EditorCue {
  return { key, id: null, startMs, endMs, text, settings: '' };
}

/** The cues as webvtt-parser reads them back: [start s, end s, text]. */
function readBack(cues: readonly EditorCue[]): [number, number, string][] {
  const parsed = new WebVTTParser().parse(serializeVtt(cuesForSave(cues).map((c) => ({ ...c, settings: c.settings ?? '' }))), 'subtitles');
  expect(parsed.errors).toEqual([]);
  return parsed.cues.map((c) => [c.startTime, c.endTime, c.text]);
}

describe('editorCues', () => {
  it('gives every cue its own key and puts them in playing order (start, then the longer first)', () => {
    const list = editorCues(
      [
        { id: null, startMs: 5000, endMs: 6000, text: 'second', settings: '' },
        { id: '7', startMs: 1000, endMs: 2000, text: 'first', settings: 'align:start' },
      ],
      keys(),
    );
    expect(list.map((c) => c.text)).toEqual(['first', 'second']);
    expect(new Set(list.map((c) => c.key)).size).toBe(2);
    expect(cuesForSave(list)[0]).toEqual({ id: '7', startMs: 1000, endMs: 2000, text: 'first', settings: 'align:start' });
  });
});

describe('cueIndexAt: the cue a viewer sees (HTML "text track cue" rules: start ≤ t < end)', () => {
  const list = [cue('a', 1000, 3000, 'one'), cue('b', 3000, 5000, 'two'), cue('c', 8000, 9000, 'three')];
  it('finds the cue at a moment, switching exactly at the boundary', () => {
    expect(cueIndexAt(list, 1000)).toBe(0);
    expect(cueIndexAt(list, 2999)).toBe(0);
    expect(cueIndexAt(list, 3000)).toBe(1);
    expect(cueIndexAt(list, 6000)).toBe(-1);
    expect(cueIndexAt(list, 999)).toBe(-1);
    expect(cueIndexAt(list, 9000)).toBe(-1);
  });
  it('prefers the cue that started last when two overlap', () => {
    const overlapping = [cue('a', 0, 10_000, 'long'), cue('b', 2000, 4000, 'short')];
    expect(cueIndexAt(overlapping, 3000)).toBe(1);
    expect(cueIndexAt(overlapping, 5000)).toBe(0);
  });
});

describe('addCueAt (two seconds by default: common practice)', () => {
  it('adds an empty cue at the playhead, two seconds long, selected', () => {
    const made = addCueAt([], 12_345, 60_000, keys());
    expect(made.cues).toEqual([cue('k1', 12_345, 12_345 + NEW_CUE_MS, '')]);
    expect(made.selected).toBe('k1');
  });
  it('stops before the next cue, starts after the cue under the playhead, and never runs past the video', () => {
    const list = [cue('a', 1000, 2000, 'Here is Lantern Moss.'), cue('b', 3000, 4000, 'And its twin.')];
    const beforeNext = addCueAt(list, 2200, 60_000, keys());
    expect(beforeNext.cues[1]).toMatchObject({ startMs: 2200, endMs: 3000 });
    const inside = addCueAt(list, 1500, 60_000, keys());
    expect(inside.cues[1]).toMatchObject({ startMs: 2000, endMs: 3000 });
    const atEnd = addCueAt([], 59_500, 60_000, keys());
    expect(atEnd.cues[0]).toMatchObject({ startMs: 59_500, endMs: 60_000 });
    expect(readBack(beforeNext.cues)).toEqual([
      [1, 2, 'Here is Lantern Moss.'],
      [2.2, 3, ''],
      [3, 4, 'And its twin.'],
    ]);
  });
});

describe('setEdge and nudgeEdge (±100 ms: common practice for caption timing)', () => {
  const list = [cue('a', 1000, 2000, 'one'), cue('b', 3000, 4000, 'two')];
  it('sets a start from the playhead and re-sorts, keeping the selection on the moved cue', () => {
    const moved = setEdge(list, 'b', 'start', 500);
    expect(moved.cues.map((c) => c.key)).toEqual(['b', 'a']);
    expect(moved.selected).toBe('b');
    expect(readBack(moved.cues)[0]).toEqual([0.5, 4, 'two']);
  });
  it('nudges by a tenth of a second, never below zero nor past the video end', () => {
    expect(NUDGE_MS).toBe(100);
    expect(nudgeEdge(list, 'a', 'start', -NUDGE_MS).cues[0]!.startMs).toBe(900);
    expect(nudgeEdge(list, 'a', 'end', NUDGE_MS).cues[0]!.endMs).toBe(2100);
    expect(nudgeEdge([cue('z', 50, 900, 'x')], 'z', 'start', -NUDGE_MS).cues[0]!.startMs).toBe(0);
    expect(nudgeEdge([cue('z', 50, 4000, 'x')], 'z', 'end', NUDGE_MS, 4050).cues[0]!.endMs).toBe(4050);
  });
  it('leaves the old list untouched (snapshots for undo stay valid)', () => {
    const before = JSON.stringify(list);
    nudgeEdge(list, 'a', 'start', 300);
    setText(list, 'b', 'changed');
    expect(JSON.stringify(list)).toBe(before);
  });
});

describe('splitText (common practice: cut at the cursor, else between words near the middle)', () => {
  it('cuts at the caret when it lies inside the text', () => {
    expect(splitText('Mizu-kagari turns gold in autumn', 12)).toEqual(['Mizu-kagari', 'turns gold in autumn']);
  });
  it('otherwise gives the first part half the words, rounded up, never cutting a word', () => {
    expect(splitText('one two three four')).toEqual(['one two', 'three four']);
    expect(splitText('one two three four five')).toEqual(['one two three', 'four five']);
    expect(splitText('first line\nsecond line')).toEqual(['first line', 'second line']);
    expect(splitText('Alone')).toEqual(['Alone', '']);
  });
});

describe('splitCue, mergeWithNext and deleteCue', () => {
  // Timing of the Matroska specification's SRT example, 00:02:17,440 --> 00:02:20,375 (137.440 s,
  // lasting 2.935 s); the text is our own invented narration.
  const matroska = cue('m', 137_440, 140_375, 'Lantern Moss, our oldest pot maple');
  it('splits at the playhead: the first part ends and the second starts there (webvtt-parser reads both)', () => {
    const split = splitCue([matroska], 'm', 138_000, null, keys());
    expect(split.cues.map((c) => [c.startMs, c.endMs, c.text])).toEqual([
      [137_440, 138_000, 'Lantern Moss, our'],
      [138_000, 140_375, 'oldest pot maple'],
    ]);
    expect(split.selected).toBe('k1');
    expect(readBack(split.cues)).toEqual([
      [137.44, 138, 'Lantern Moss, our'],
      [138, 140.375, 'oldest pot maple'],
    ]);
  });
  it('splits in the middle when the playhead is outside the cue, and not at all when the cue cannot play', () => {
    const split = splitCue([matroska], 'm', 5000, 13, keys());
    expect(split.cues[0]!.endMs).toBe(137_440 + Math.round(2935 / 2));
    expect(split.cues.map((c) => c.text)).toEqual(['Lantern Moss,', 'our oldest pot maple']);
    const broken = [cue('x', 5000, 4000, 'ends before it starts')];
    expect(splitCue(broken, 'x', 4500, null, keys()).cues).toEqual(broken);
  });
  it('merges with the next cue in playing order: earliest start, latest end, texts on two lines', () => {
    const list = [cue('a', 1000, 2000, 'Lantern Moss'), cue('b', 2500, 4000, 'in its buried pot.'), cue('c', 5000, 6000, 'next')];
    const merged = mergeWithNext(list, 'a');
    expect(merged.cues).toHaveLength(2);
    expect(merged.cues[0]).toMatchObject({ key: 'a', startMs: 1000, endMs: 4000, text: 'Lantern Moss\nin its buried pot.' });
    // A line break inside cue text is a WebVTT line terminator: the parser keeps the two lines.
    expect(readBack(merged.cues)[0]).toEqual([1, 4, 'Lantern Moss\nin its buried pot.']);
    expect(mergeWithNext(list, 'c').cues).toEqual(list);
  });
  it('deletes a cue and selects the one that took its place, or the one before at the end', () => {
    const list = [cue('a', 0, 1000, 'a'), cue('b', 2000, 3000, 'b'), cue('c', 4000, 5000, 'c')];
    expect(deleteCue(list, 'b')).toMatchObject({ selected: 'c' });
    expect(deleteCue(list, 'c')).toMatchObject({ selected: 'b' });
    expect(deleteCue(list, 'b').cues.map((c) => c.key)).toEqual(['a', 'c']);
    expect(deleteCue([cue('a', 0, 1000, 'a')], 'a')).toEqual({ cues: [], selected: null });
  });
});
