import vttjs from 'videojs-vtt.js';
import { describe, expect, it } from 'vitest';
import { metadataVtt } from '@shared/captions/tracks';
import { readStopCue, stepStop, stopIdFromActiveCues, stopIndexAt, type MetadataCueLike, type TimedStop } from '@/features/tours/lib/stop-timeline';

// Which stop is playing follows the HTML Living Standard's "time marches on": a cue is active
// when its start time is at or before the current playback position and its end time is after it.
// The metadata cues are read with videojs-vtt.js, the WebVTT parser video.js itself uses in the
// browser, from a track built by the server's own generator (shared/captions/tracks.ts).
// Stops below belong to an invented walk of the fictional Fernhollow Maple Circle.

const stops: TimedStop[] = [
  { id: 11, startMs: 2000, endMs: 10_000 },
  { id: 12, startMs: 10_000, endMs: 18_000 },
  { id: 13, startMs: 18_000, endMs: 24_000 },
  { id: 14, startMs: 30_000, endMs: 36_000 },
];

/** The brute-force reading of the standard's rule: every stop active at `ms`, then the latest start. */
function referenceStop(list: readonly TimedStop[], ms: number): number {
  const active = list.map((s, i) => ({ s, i })).filter(({ s }) => s.startMs <= ms && s.endMs > ms);
  if (active.length === 0) return -1;
  return active.reduce((a, b) => (b.s.startMs >= a.s.startMs ? b : a)).i;
}

function parseWithVideoJsParser(text: string): MetadataCueLike[] {
  const cues: MetadataCueLike[] = [];
  const parser = new vttjs.WebVTT.Parser(window, vttjs, vttjs.WebVTT.StringDecoder());
  parser.oncue = (cue) => cues.push({ startTime: cue.startTime, text: cue.text });
  parser.parse(text).flush();
  return cues;
}

describe('stopIndexAt (HTML "time marches on": start ≤ t < end)', () => {
  it('agrees with the rule read literally, every 250 ms across the tour', () => {
    for (let ms = 0; ms <= 40_000; ms += 250) expect(stopIndexAt(stops, ms), `at ${ms} ms`).toBe(referenceStop(stops, ms));
  });

  it('counts a stop from its first millisecond and not at its end', () => {
    expect(stopIndexAt(stops, 10_000)).toBe(1);
    expect(stopIndexAt(stops, 9_999)).toBe(0);
    expect(stopIndexAt(stops, 24_000)).toBe(-1);
    expect(stopIndexAt(stops, 1_999)).toBe(-1);
  });

  it('lets the stop that started last win where stops overlap', () => {
    const overlapping: TimedStop[] = [
      { id: 1, startMs: 0, endMs: 20_000 },
      { id: 2, startMs: 5_000, endMs: 8_000 },
    ];
    expect(stopIndexAt(overlapping, 6_000)).toBe(1);
    expect(stopIndexAt(overlapping, 9_000)).toBe(0);
    for (let ms = 0; ms < 21_000; ms += 500) expect(stopIndexAt(overlapping, ms)).toBe(referenceStop(overlapping, ms));
  });
});

describe('stepStop (next and previous stop)', () => {
  it('goes to the neighbour from a stop, and nowhere past either end', () => {
    expect(stepStop(stops, 1, 12_000, 1)).toBe(2);
    expect(stepStop(stops, 1, 12_000, -1)).toBe(0);
    expect(stepStop(stops, 3, 31_000, 1)).toBeNull();
    expect(stepStop(stops, 0, 3_000, -1)).toBeNull();
  });

  it('between stops goes to the next one ahead or the last one passed', () => {
    expect(stepStop(stops, null, 26_000, 1)).toBe(3);
    expect(stepStop(stops, null, 26_000, -1)).toBe(2);
    expect(stepStop(stops, null, 500, 1)).toBe(0);
    expect(stepStop(stops, null, 500, -1)).toBeNull();
    expect(stepStop([], null, 500, 1)).toBeNull();
  });
});

describe('the metadata track, as the player reads it', () => {
  const track = metadataVtt(
    stops.map((s, i) => ({
      startMs: s.startMs,
      endMs: s.endMs,
      payload: i === 2 ? { stopId: s.id, cultivarId: null, acceptedName: null, slug: null } : { stopId: s.id, cultivarId: 100 + i, acceptedName: `Acer palmatum 'Fern <Hollow> ${i}'`, slug: `fern-hollow-${i}` },
    })),
  );
  const cues = parseWithVideoJsParser(track);

  it('reads every cue’s JSON payload, including a ">" the generator escaped', () => {
    expect(cues).toHaveLength(stops.length);
    expect(readStopCue(cues[0]!.text)).toEqual({ stopId: 11, cultivarId: 100, acceptedName: "Acer palmatum 'Fern <Hollow> 0'", slug: 'fern-hollow-0' });
    expect(readStopCue(cues[2]!.text)).toEqual({ stopId: 13, cultivarId: null, acceptedName: null, slug: null });
  });

  it('names the stop of the active cues, and none between stops', () => {
    const activeAt = (sec: number) => cues.filter((c, i) => c.startTime <= sec && stops[i]!.endMs / 1000 > sec);
    expect(stopIdFromActiveCues(activeAt(3))).toBe(11);
    expect(stopIdFromActiveCues(activeAt(26))).toBeNull();
    expect(stopIdFromActiveCues([])).toBeNull();
    expect(stopIdFromActiveCues(null)).toBeNull();
  });

  it('picks the stop that just began when a player reports both neighbours at the boundary', () => {
    // video.js's own track code counts a cue as active up to and including its end time.
    const atBoundary = cues.filter((c, i) => c.startTime <= 10 && stops[i]!.endMs / 1000 >= 10);
    expect(atBoundary).toHaveLength(2);
    expect(stopIdFromActiveCues(atBoundary)).toBe(12);
    expect(stopIdFromActiveCues([...atBoundary].reverse())).toBe(12);
  });

  it('ignores cues that are not stop payloads', () => {
    expect(readStopCue('not json')).toBeNull();
    expect(readStopCue('{"stopId":"seven"}')).toBeNull();
    expect(stopIdFromActiveCues([{ startTime: 4, text: 'hello' }, { startTime: 2, text: cues[0]!.text }])).toBe(11);
  });
});
