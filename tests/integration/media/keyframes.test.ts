import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chooseRenditions } from '../../../server/media/ladder';
import { probeMedia } from '../../../server/media/probe';
import { buildTranscodePlan, runTranscode, type TranscodeResult } from '../../../server/media/transcode';
import { ffprobeRaw, keyframeTimes } from '../../support/ffprobe-check';
import { generateClip } from '../../support/make-clip';

const FPS = 30;
const FRAME = 1 / FPS;
const STOP_STARTS = [1.0, 2.5]; // invented stop start times

let dir: string;
let src: string;
let forced: TranscodeResult;
let unforced: TranscodeResult;

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'grovewalk-keyframes-'));
  // 854×480 so the ladder has two rungs (480p, 360p): both must get the keyframes.
  src = await generateClip(path.join(dir, 'src.mp4'), { seconds: 3, width: 854, height: 480, fps: FPS, audio: true });
  const probe = await probeMedia(src);
  const renditions = chooseRenditions(probe);
  forced = await runTranscode(buildTranscodePlan(probe, renditions, { outDir: path.join(dir, 'forced'), keyframeTimesSec: STOP_STARTS }));
  unforced = await runTranscode(buildTranscodePlan(probe, renditions, { outDir: path.join(dir, 'plain') }));
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

const near = (times: number[], t: number) => times.some((k) => Math.abs(k - t) <= FRAME + 1e-6);

describe('-force_key_frames at stop starts (ffmpeg documentation, -force_key_frames time[,time...])', () => {
  it('with keyframe times the top rendition is encoded, not copied (documented rule)', () => {
    expect(forced.files.map((f) => f.mode)).toEqual(['encode', 'encode']);
    expect(unforced.files[0].mode).toBe('copy');
  });

  it('ffprobe -skip_frame nokey finds a keyframe at 1.0 s and 2.5 s (±1 frame) in every rendition', async () => {
    for (const f of forced.files) {
      const keys = await keyframeTimes(f.path);
      for (const t of STOP_STARTS) expect(near(keys, t), `${f.rendition.name}: keyframes ${keys.join(', ')}`).toBe(true);
    }
  });

  it('control: without keyframe times there is no keyframe at those moments, so the check above can fail', async () => {
    for (const f of unforced.files) {
      const keys = await keyframeTimes(f.path);
      for (const t of STOP_STARTS) expect(near(keys, t)).toBe(false);
    }
  });

  it('a seek to a stop start lands on a keyframe at exactly that frame', async () => {
    for (const f of forced.files) {
      for (const t of STOP_STARTS) {
        // -read_intervals seeks like a player does (to the keyframe at or before t) and reads one packet.
        const { stdout } = await ffprobeRaw([
          '-v', 'error', '-select_streams', 'v:0', '-read_intervals', `${t}%+#1`,
          '-show_entries', 'packet=pts_time,flags', '-of', 'csv=p=0', f.path,
        ]);
        const [pts, flags] = stdout.trim().split('\n')[0].split(',');
        expect(Math.abs(Number(pts) - t)).toBeLessThanOrEqual(FRAME / 2);
        expect(flags.startsWith('K')).toBe(true);
      }
    }
  });
});
