import { describe, expect, it } from 'vitest';
import { chooseRenditions } from '../../../server/media/ladder';
import type { MediaProbe } from '../../../server/media/probe';
import { buildTranscodePlan, fluentCommandFor, parseStatsTime } from '../../../server/media/transcode';

// Invented probe values, shaped like ffprobe output for a phone clip of a (fictional) club garden.
function probe(over: Partial<MediaProbe> = {}, video: Partial<NonNullable<MediaProbe['video']>> = {}): MediaProbe {
  return {
    path: '/tmp/fernhollow tour.mp4',
    fileSize: 1_000_000,
    head: 'iso-bmff',
    container: 'mov,mp4,m4a,3gp,3g2,mj2',
    startSec: 0,
    durationSec: 12,
    streamCount: 2,
    video: {
      index: 0, codec: 'h264', profile: 'High', level: 40, pixFmt: 'yuv420p',
      width: 1280, height: 720, displayWidth: 1280, displayHeight: 720, rotation: 0, fps: 30, interlaced: false,
      ...video,
    },
    audio: { index: 1, codec: 'aac', profile: 'LC', channels: 2, sampleRate: 48000 },
    ...over,
  };
}

function valueAfter(opts: string[], flag: string): string | undefined {
  const i = opts.indexOf(flag);
  return i === -1 ? undefined : opts[i + 1];
}

describe('buildTranscodePlan', () => {
  it('web-ready source at the top size: the top rendition is a stream copy, the rest are encoded in the same run', () => {
    const p = probe();
    const plan = buildTranscodePlan(p, chooseRenditions(p), { outDir: '/out', baseName: 'tour' });
    expect(plan.outputs.map((o) => [o.rendition.name, o.mode])).toEqual([
      ['720p', 'copy'],
      ['480p', 'encode'],
      ['360p', 'encode'],
    ]);
    const copy = plan.outputs[0].options;
    expect(copy).toEqual(expect.arrayContaining(['-c', 'copy']));
    expect(valueAfter(copy, '-movflags')).toBe('+faststart');
    expect(copy).not.toContain('-c:v');
    // One input, one filter graph that splits the decoded picture for the two encoders.
    expect(plan.args.filter((a) => a === '-i')).toHaveLength(1);
    const graph = valueAfter(plan.args, '-filter_complex');
    expect(graph).toMatch(/^\[0:0\]split=2\[s0\]\[s1\];/);
    expect(graph).toContain('scale=854:480');
    expect(graph).toContain('scale=640:360');
    expect(plan.copyDecision).toMatch(/web-ready/);
    expect(plan.outputs.map((o) => o.path)).toEqual(['/out/tour-720p.mp4', '/out/tour-480p.mp4', '/out/tour-360p.mp4']);
  });

  it('every encoded output is libx264 High at its level, yuv420p, AAC-LC 128k, faststart MP4 (ffmpeg docs: web-ready H.264)', () => {
    const p = probe({ container: 'matroska,webm' }, { codec: 'vp9', profile: 'Profile 0' });
    const plan = buildTranscodePlan(p, chooseRenditions(p), { outDir: '/out' });
    expect(plan.outputs.every((o) => o.mode === 'encode')).toBe(true);
    for (const o of plan.outputs) {
      expect(valueAfter(o.options, '-c:v')).toBe('libx264');
      expect(valueAfter(o.options, '-pix_fmt')).toBe('yuv420p');
      expect(valueAfter(o.options, '-profile:v')).toBe('high');
      expect(valueAfter(o.options, '-level:v')).toBe(o.rendition.level);
      expect(valueAfter(o.options, '-c:a')).toBe('aac');
      expect(valueAfter(o.options, '-b:a')).toBe('128k');
      expect(valueAfter(o.options, '-movflags')).toBe('+faststart');
      expect(valueAfter(o.options, '-f')).toBe('mp4');
      expect(valueAfter(o.options, '-g')).toBe('60');
    }
    expect(valueAfter(plan.args, '-filter_complex')).toMatch(/split=3/);
  });

  it('keyframe times force a keyframe on every rendition and rule out the copy (documented rule)', () => {
    const p = probe();
    const plan = buildTranscodePlan(p, chooseRenditions(p), { outDir: '/out', keyframeTimesSec: [2.5, 1, 1.0004, -3, 0, 12, 40] });
    expect(plan.keyframeTimesSec).toEqual([1, 2.5]);
    expect(plan.outputs.every((o) => o.mode === 'encode')).toBe(true);
    for (const o of plan.outputs) expect(valueAfter(o.options, '-force_key_frames')).toBe('1.000,2.500');
    expect(plan.copyDecision).toMatch(/keyframes/);
  });

  it('allowCopy: false re-encodes a web-ready top rendition', () => {
    const p = probe();
    const plan = buildTranscodePlan(p, chooseRenditions(p).slice(0, 1), { outDir: '/out', allowCopy: false });
    expect(plan.outputs[0].mode).toBe('encode');
    expect(valueAfter(plan.args, '-filter_complex')).toBe('[0:0]scale=1280:720,setsar=1,format=yuv420p[v0]');
  });

  it('one encoded rendition needs no split', () => {
    const p = probe({ container: 'matroska,webm' }, { width: 640, height: 360, displayWidth: 640, displayHeight: 360 });
    const plan = buildTranscodePlan(p, chooseRenditions(p), { outDir: '/out' });
    expect(valueAfter(plan.args, '-filter_complex')).toBe('[0:0]scale=640:360,setsar=1,format=yuv420p[v0]');
  });

  it('a source without sound gives renditions without sound (documented choice)', () => {
    const p = probe({ audio: undefined, streamCount: 1 });
    const plan = buildTranscodePlan(p, chooseRenditions(p), { outDir: '/out' });
    expect(plan.audio).toBe('none');
    for (const o of plan.outputs) {
      expect(o.options).not.toContain('-c:a');
      expect(o.options.filter((x) => x === '-map')).toHaveLength(1);
    }
  });

  it('sound: more than two channels are downmixed to stereo, odd sample rates go to 48 kHz, 44.1/48 kHz are kept', () => {
    const base = probe({ container: 'matroska,webm' }, { codec: 'vp9' });
    const cases: [number, number, string, string][] = [
      [6, 22050, '2', '48000'],
      [1, 44100, '1', '44100'],
      [2, 48000, '2', '48000'],
    ];
    for (const [channels, sampleRate, ac, ar] of cases) {
      const p = { ...base, audio: { index: 1, codec: 'opus', channels, sampleRate } };
      const o = buildTranscodePlan(p, chooseRenditions(p), { outDir: '/out' }).outputs[0].options;
      expect([valueAfter(o, '-ac'), valueAfter(o, '-ar')]).toEqual([ac, ar]);
    }
  });

  it('not web-ready when the pixel format is yuv444p (the RGB negative case): no copy', () => {
    const p = probe({}, { profile: 'High 4:4:4 Predictive', pixFmt: 'yuv444p' });
    const plan = buildTranscodePlan(p, chooseRenditions(p), { outDir: '/out' });
    expect(plan.outputs[0].mode).toBe('encode');
    expect(plan.copyDecision).toMatch(/not web-ready/);
  });

  it('a source above 60 fps is capped with the fps filter and cannot be copied', () => {
    const p = probe({}, { fps: 120 });
    const plan = buildTranscodePlan(p, chooseRenditions(p), { outDir: '/out' });
    expect(plan.outputs[0].mode).toBe('encode');
    expect(valueAfter(plan.args, '-filter_complex')).toMatch(/^\[0:0\]fps=60,split=3/);
    expect(valueAfter(plan.outputs[0].options, '-g')).toBe('120');
  });

  it('interlaced sources are deinterlaced before the split and never copied', () => {
    const p = probe({}, { interlaced: true });
    const plan = buildTranscodePlan(p, chooseRenditions(p), { outDir: '/out' });
    expect(plan.outputs[0].mode).toBe('encode');
    expect(plan.copyDecision).toMatch(/interlaced/);
    expect(valueAfter(plan.args, '-filter_complex')).toMatch(/^\[0:0\]bwdif=mode=send_frame,split=3/);
  });

  it('two renditions with the same name are refused (they would write the same file)', () => {
    const p = probe();
    const [r] = chooseRenditions(p);
    expect(() => buildTranscodePlan(p, [r, { ...r }], { outDir: '/out' })).toThrow(/share a name/);
  });

  it('picks streams by their ffprobe index (cover art or data streams before the picture are skipped)', () => {
    const p = probe({ audio: { index: 0, codec: 'aac', profile: 'LC', channels: 2, sampleRate: 48000 } }, { index: 2 });
    const plan = buildTranscodePlan(p, chooseRenditions(p), { outDir: '/out' });
    expect(plan.outputs[0].options.slice(0, 4)).toEqual(['-map', '0:2', '-map', '0:0']);
    expect(valueAfter(plan.args, '-filter_complex')).toMatch(/^\[0:2\]/);
  });

  it('fluent-ffmpeg spawns exactly plan.args (so the benchmark compares like with like), spaces in paths intact', () => {
    const p = probe();
    const plan = buildTranscodePlan(p, chooseRenditions(p), { outDir: '/out dir', keyframeTimesSec: [3] });
    expect(fluentCommandFor(plan)._getArguments()).toEqual(plan.args);
    expect(plan.args).toContain('/tmp/fernhollow tour.mp4');
    expect(plan.args).toContain('/out dir/rendition-720p.mp4.part');
  });
});

describe('parseStatsTime', () => {
  // Stats line format as printed by ffmpeg 5.1 on stderr during a run.
  it('reads time= from a stats line', () => {
    const line = 'frame=   45 fps=0.0 q=28.0 q=28.0 size=     256kB time=00:01:02.50 bitrate= 335.2kbits/s speed=2.91x';
    expect(parseStatsTime(line)).toBeCloseTo(62.5, 6);
  });

  it('ignores lines without a time and clamps negative times to 0', () => {
    expect(parseStatsTime('Stream mapping:')).toBeUndefined();
    expect(parseStatsTime('size=N/A time=N/A bitrate=N/A')).toBeUndefined();
    expect(parseStatsTime('time=-00:00:00.04 bitrate=N/A')).toBe(0);
  });
});
