import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { chaptersVtt, metadataVtt, readChaptersVtt, readMetadataVtt } from '@shared/captions/tracks';
import { parseVtt } from '@shared/captions/webvtt';

// Stops of a fictional tour of the fictional Larkspur Lane garden; cultivar epithets are invented.
const stops = [
  { startMs: 42_000, endMs: 75_500, title: "Acer palmatum 'Tinder Lace' & friends", id: 'stop-2' },
  { startMs: 5_000, endMs: 42_000, title: "Acer palmatum 'Mossgate Ember'\n(buried pot)", id: 'stop-1' },
];

describe('chaptersVtt (W3C WebVTT, chapter title text and the rules for extracting the chapter title)', () => {
  it('writes one chapter per stop, in time order, with plain one-line escaped titles', () => {
    expect(chaptersVtt(stops)).toBe(
      [
        'WEBVTT Chapters',
        '',
        'stop-1',
        '00:00:05.000 --> 00:00:42.000',
        "Acer palmatum 'Mossgate Ember' (buried pot)",
        '',
        'stop-2',
        '00:00:42.000 --> 00:01:15.500',
        "Acer palmatum 'Tinder Lace' &amp; friends",
        '',
        '',
      ].join('\n'),
    );
  });

  it('is a valid chapters track and reads back to the same titles', () => {
    const track = chaptersVtt(stops);
    expect(parseVtt(track, { kind: 'chapters' }).problems).toEqual([]);
    const { chapters, problems } = readChaptersVtt(track);
    expect(problems).toEqual([]);
    expect(chapters).toEqual([
      { id: 'stop-1', startMs: 5_000, endMs: 42_000, title: "Acer palmatum 'Mossgate Ember' (buried pot)" },
      { id: 'stop-2', startMs: 42_000, endMs: 75_500, title: "Acer palmatum 'Tinder Lace' & friends" },
    ]);
  });

  it('extracts chapter titles as text only, leaving out ruby text (spec rules for extracting the chapter title)', () => {
    const file = 'WEBVTT\n\n00:00.000 --> 00:05.000\n<ruby>Momiji<rt>maple</rt></ruby> walk\n';
    expect(readChaptersVtt(file).chapters[0]?.title).toBe('Momiji walk');
  });

  it('refuses stops that cannot be a cue', () => {
    expect(() => chaptersVtt([{ startMs: 5000, endMs: 5000, title: 'empty' }])).toThrow(RangeError);
    expect(() => chaptersVtt([{ startMs: -1, endMs: 5000, title: 'negative' }])).toThrow(RangeError);
  });
});

describe('metadataVtt', () => {
  const payloads = [
    { startMs: 5_000, endMs: 42_000, payload: { stop: 1, cultivarId: 17, note: 'arrow --> in text, fictional' } },
    { startMs: 42_000, endMs: 75_500, payload: { stop: 2, cultivarId: null, note: 'unidentified\nsecond line \u6728' } },
  ];

  it('writes one line of JSON per stop, with ">" escaped so no cue text holds "-->"', () => {
    const track = metadataVtt(payloads);
    const lines = track.split('\n');
    expect(lines[0]).toBe('WEBVTT Metadata');
    expect(lines[3]).toBe('{"stop":1,"cultivarId":17,"note":"arrow --\\u003e in text, fictional"}');
    expect(lines[6]).toBe('{"stop":2,"cultivarId":null,"note":"unidentified\\nsecond line \u6728"}');
    expect(track.split('\n').filter((l) => l.includes('-->'))).toHaveLength(2); // only the two timing lines
  });

  it('reads back the same payloads, optionally checked with a zod schema', () => {
    const track = metadataVtt(payloads);
    const plain = readMetadataVtt(track);
    expect(plain.problems).toEqual([]);
    expect(plain.entries.map((e) => e.payload)).toEqual(payloads.map((p) => p.payload));
    const schema = z.object({ stop: z.number().int(), cultivarId: z.number().nullable(), note: z.string() });
    const typed = readMetadataVtt(track, schema);
    expect(typed.entries[1]?.payload.cultivarId).toBeNull();
    const strict = readMetadataVtt(track, z.object({ stop: z.string() }));
    expect(strict.entries).toEqual([]);
    expect(strict.problems.map((p) => [p.line, p.severity])).toEqual([
      [3, 'error'],
      [6, 'error'],
    ]);
  });

  it('reports a cue that does not hold JSON, with its timing line', () => {
    const file = 'WEBVTT\n\n00:00.000 --> 00:01.000\n{"ok":true}\n\n00:01.000 --> 00:02.000\nnot json\n';
    const { entries, problems } = readMetadataVtt(file);
    expect(entries).toEqual([{ startMs: 0, endMs: 1000, payload: { ok: true } }]);
    expect(problems).toEqual([expect.objectContaining({ line: 6, severity: 'error' })]);
  });

  it('refuses payloads that are not JSON-serialisable', () => {
    expect(() => metadataVtt([{ startMs: 0, endMs: 1, payload: { toJSON: () => undefined } }])).toThrow(TypeError);
  });
});
