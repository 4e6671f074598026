import { execFile } from 'node:child_process';
import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chooseRenditions } from '../../../server/media/ladder';
import { isFaststart, readTopLevelBoxes } from '../../../server/media/mp4-boxes';
import { isWebReady, probeMedia, webReadyIssues } from '../../../server/media/probe';
import { buildTranscodePlan, runTranscode, type TranscodeResult } from '../../../server/media/transcode';
import { ffprobeStreams, packetList } from '../../support/ffprobe-check';
import { generateClip, rotateFirstTrack } from '../../support/make-clip';

const execFileAsync = promisify(execFile);

let dir: string;
let webReadySrc: string;
let vp9Src: string;
let rgbSrc: string;

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'grovewalk-transcode-'));
  // Small synthetic sources: 2 s each, so the whole file runs in seconds on two cores.
  webReadySrc = await generateClip(path.join(dir, 'web-ready.mp4'), { seconds: 2, width: 1280, height: 720, audio: true });
  vp9Src = await generateClip(path.join(dir, 'vp9.webm'), { seconds: 2, width: 854, height: 480, audio: true, codec: 'libvpx-vp9' });
  // RGB source: lossless PNG frames in Matroska, pixel format rgb24.
  rgbSrc = await generateClip(path.join(dir, 'rgb.mkv'), { seconds: 2, width: 320, height: 180, audio: false, codec: 'png', pixFmt: 'rgb24' });
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

/**
 * The web-ready check of domain.md, made with ffprobe directly (source: ffmpeg documentation —
 * H.264 yuv420p, AAC-LC, MP4 with moov before mdat per the mov muxer's faststart flag).
 */
async function expectWebReadyFile(file: string, maxHeight: number, size: { width: number; height: number }, withAudio = true) {
  const { format, streams } = await ffprobeStreams(file);
  expect(format).toContain('mp4');
  const v = streams.find((s) => s.codec_type === 'video')!;
  expect(v.codec_name).toBe('h264');
  expect(v.pix_fmt).toBe('yuv420p');
  expect(['High', 'Main', 'Constrained Baseline', 'Baseline']).toContain(v.profile);
  expect(v.height).toBeLessThanOrEqual(maxHeight);
  expect({ width: v.width, height: v.height }).toEqual(size);
  const a = streams.find((s) => s.codec_type === 'audio');
  if (withAudio) {
    expect(a?.codec_name).toBe('aac');
    expect(a?.profile).toBe('LC');
  } else {
    expect(a).toBeUndefined();
  }
  const boxes = await readTopLevelBoxes(file);
  expect(boxes[0].type).toBe('ftyp');
  expect(isFaststart(boxes)).toBe(true);
  expect(boxes.findIndex((b) => b.type === 'moov')).toBeLessThan(boxes.findIndex((b) => b.type === 'mdat'));
}

describe('runTranscode with real ffmpeg', () => {
  let result: TranscodeResult;
  const progress: number[] = [];
  const etas: (number | undefined)[] = [];

  it('web-ready 720p source: one run, top rendition stream-copied, lower rungs encoded; all outputs web-ready', async () => {
    const probe = await probeMedia(webReadySrc);
    expect(isWebReady(probe)).toBe(true);
    const renditions = chooseRenditions(probe);
    const plan = buildTranscodePlan(probe, renditions, { outDir: path.join(dir, 'out-web'), baseName: 'tour' });
    expect(plan.outputs.map((o) => o.mode)).toEqual(['copy', 'encode', 'encode']);
    result = await runTranscode(plan, {
      onProgress: (p, eta) => {
        progress.push(p);
        etas.push(eta);
      },
    });

    expect(result.files.map((f) => f.rendition.name)).toEqual(['720p', '480p', '360p']);
    for (const f of result.files) {
      await expectWebReadyFile(f.path, 720, { width: f.rendition.width, height: f.rendition.height });
    }
    // Encoded rungs carry the level we computed (ffprobe reports 31 for 3.1).
    for (const f of result.files.filter((x) => x.mode === 'encode')) {
      const v = (await ffprobeStreams(f.path)).streams.find((s) => s.codec_type === 'video')!;
      expect(v.profile).toBe('High');
      expect(v.level).toBe(Math.round(Number(f.rendition.level) * 10));
    }
    expect(await readdir(path.join(dir, 'out-web'))).toEqual(['tour-360p.mp4', 'tour-480p.mp4', 'tour-720p.mp4']);
  });

  it('progress rises monotonically and ends at 100 with no time left', () => {
    expect(progress.length).toBeGreaterThan(0);
    for (let i = 1; i < progress.length; i++) expect(progress[i]).toBeGreaterThanOrEqual(progress[i - 1]);
    expect(progress.at(-1)).toBe(100);
    expect(etas.at(-1)).toBe(0);
    for (const eta of etas) if (eta !== undefined) expect(eta).toBeGreaterThanOrEqual(0);
  });

  it('the stream copy is packet-for-packet the source (video and audio)', async () => {
    const copy = result.files.find((f) => f.mode === 'copy')!;
    expect(await packetList(copy.path, 'v:0')).toEqual(await packetList(webReadySrc, 'v:0'));
    expect(await packetList(copy.path, 'a:0')).toEqual(await packetList(webReadySrc, 'a:0'));
    // The encoded rungs are not copies: their packets differ.
    const encoded = result.files.find((f) => f.mode === 'encode')!;
    expect(await packetList(encoded.path, 'v:0')).not.toEqual(await packetList(webReadySrc, 'v:0'));
  });

  it('non-web-ready VP9/Opus WebM source: every rung re-encoded to web-ready MP4, none above 480p', async () => {
    const probe = await probeMedia(vp9Src);
    expect(isWebReady(probe)).toBe(false);
    const out = path.join(dir, 'out-vp9');
    const plan = buildTranscodePlan(probe, chooseRenditions(probe), { outDir: out });
    expect(plan.outputs.map((o) => o.mode)).toEqual(['encode', 'encode']);
    const res = await runTranscode(plan);
    expect(res.files.map((f) => `${f.rendition.width}x${f.rendition.height}`)).toEqual(['854x480', '640x360']);
    for (const f of res.files) await expectWebReadyFile(f.path, 480, { width: f.rendition.width, height: f.rendition.height });
    const a = (await ffprobeStreams(res.files[0].path)).streams.find((s) => s.codec_type === 'audio')!;
    expect([a.sample_rate, a.channels]).toEqual(['48000', 2]);
  });

  it('negative case (domain.md, ffmpeg libx264 docs): RGB into libx264 without -pix_fmt comes out yuv444p "High 4:4:4 Predictive", and the check says not web-ready', async () => {
    const naive = path.join(dir, 'naive.mp4');
    await execFileAsync('ffmpeg', ['-v', 'error', '-y', '-i', rgbSrc, '-c:v', 'libx264', '-preset', 'ultrafast', naive]);
    const probe = await probeMedia(naive);
    expect(probe.video?.pixFmt).toBe('yuv444p');
    expect(probe.video?.profile).toBe('High 4:4:4 Predictive');
    expect(isWebReady(probe)).toBe(false);
    expect(webReadyIssues(probe)).toContain('pixel format yuv444p is not yuv420p');
  });

  it('the same RGB source through our pipeline comes out yuv420p High, without an audio track (source has none)', async () => {
    const probe = await probeMedia(rgbSrc);
    const out = path.join(dir, 'out-rgb');
    const res = await runTranscode(buildTranscodePlan(probe, chooseRenditions(probe), { outDir: out }));
    expect(res.files).toHaveLength(1);
    await expectWebReadyFile(res.files[0].path, 180, { width: 320, height: 180 }, false);
    expect(isWebReady(await probeMedia(res.files[0].path))).toBe(true);
  });
});

describe('portrait clips stored sideways (rotation in the track header)', () => {
  it('the ladder uses the displayed size; encodes are turned upright, the copy keeps the rotation flag', async () => {
    const sideways = await generateClip(path.join(dir, 'sideways.mp4'), { seconds: 2, width: 640, height: 360, audio: true });
    await rotateFirstTrack(sideways);
    const probe = await probeMedia(sideways);
    expect(probe.video).toMatchObject({ width: 640, height: 360, rotation: 90, displayWidth: 360, displayHeight: 640 });
    const renditions = chooseRenditions(probe);
    expect(renditions.map((r) => `${r.name} ${r.width}x${r.height}`)).toEqual(['360p 360x640']);

    const encoded = await runTranscode(buildTranscodePlan(probe, renditions, { outDir: path.join(dir, 'rot-enc'), keyframeTimesSec: [1] }));
    const upright = await probeMedia(encoded.files[0].path);
    expect(upright.video).toMatchObject({ width: 360, height: 640, rotation: 0 });

    const copied = await runTranscode(buildTranscodePlan(probe, renditions, { outDir: path.join(dir, 'rot-copy') }));
    expect(copied.files[0].mode).toBe('copy');
    const flagged = await probeMedia(copied.files[0].path);
    expect(flagged.video).toMatchObject({ width: 640, height: 360, rotation: 90, displayWidth: 360, displayHeight: 640 });
  });
});

describe('interlaced sources', () => {
  it('an interlaced H.264 clip (field_order tt) is deinterlaced: the rendition is progressive', async () => {
    const src = await generateClip(path.join(dir, 'interlaced.mp4'), {
      seconds: 2, width: 640, height: 360, fps: 25, audio: false,
      extraArgs: ['-flags', '+ildct+ilme', '-x264-params', 'tff=1'],
    });
    const probe = await probeMedia(src);
    expect(probe.video?.interlaced).toBe(true);
    const res = await runTranscode(buildTranscodePlan(probe, chooseRenditions(probe), { outDir: path.join(dir, 'out-il') }));
    expect(res.files[0].mode).toBe('encode');
    const { stdout } = await execFileAsync('ffprobe', ['-v', 'error', '-show_entries', 'stream=field_order', '-of', 'csv=p=0', res.files[0].path]);
    expect(stdout.trim()).toBe('progressive');
    await expectWebReadyFile(res.files[0].path, 360, { width: 640, height: 360 }, false);
  });
});

describe('cancelling a transcode', () => {
  it('aborting kills the ffmpeg process and leaves no files behind', async () => {
    const probe = await probeMedia(webReadySrc);
    const out = path.join(dir, 'out-cancel');
    // Keyframe times force every rung to be encoded, so the run is long enough to be cut.
    const plan = buildTranscodePlan(probe, chooseRenditions(probe), { outDir: out, keyframeTimesSec: [1] });
    const controller = new AbortController();
    let pid: number | undefined;
    const run = runTranscode(plan, {
      signal: controller.signal,
      onStart: (_cmd, p) => {
        pid = p;
        controller.abort();
      },
    });
    await expect(run).rejects.toMatchObject({ name: 'AbortError' });
    expect(pid).toBeTypeOf('number');
    expect(() => process.kill(pid!, 0)).toThrow(/ESRCH/);
    expect(await readdir(out)).toEqual([]);
  });

  it('an already-aborted signal never starts ffmpeg', async () => {
    const probe = await probeMedia(webReadySrc);
    const plan = buildTranscodePlan(probe, chooseRenditions(probe), { outDir: path.join(dir, 'never') });
    let started = false;
    await expect(
      runTranscode(plan, { signal: AbortSignal.abort(), onStart: () => (started = true) }),
    ).rejects.toMatchObject({ name: 'AbortError' });
    expect(started).toBe(false);
  });
});
