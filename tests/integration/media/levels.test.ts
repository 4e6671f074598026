import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { h264LevelFor } from '../../../server/media/ladder';
import { ffprobeStreams } from '../../support/ffprobe-check';

const run = promisify(execFile);
let dir: string;

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'grovewalk-levels-'));
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

// Reference implementation: libx264 picks the lowest level that fits when none is given (its own
// copy of H.264 Table A-1 plus the VBV settings). Three frames per case keep this cheap.
describe('h264LevelFor matches the level libx264 chooses by itself', () => {
  const cases: [number, number, number, number, number][] = [
    [320, 180, 30, 500, 1000],
    [640, 360, 30, 900, 1800],
    [854, 480, 25, 1600, 3200],
    [854, 480, 30, 1600, 3200],
    [1280, 720, 30, 3500, 7000],
    [1280, 720, 60, 5250, 10500],
    [1920, 1080, 30, 6000, 12000],
    [1920, 1080, 60, 9000, 18000],
    [1920, 1080, 30, 30000, 30000],
  ];
  it.each(cases)('%i×%i at %i fps, peak %i kbit/s, buffer %i kbit', async (w, h, fps, maxrate, bufsize) => {
    const out = path.join(dir, `l-${w}x${h}-${fps}-${maxrate}.mp4`);
    await run('ffmpeg', [
      '-v', 'error', '-y', '-f', 'lavfi', '-i', `testsrc2=size=${w}x${h}:rate=${fps}`, '-frames:v', '3',
      '-c:v', 'libx264', '-preset', 'veryfast', '-crf', '21', '-maxrate', `${maxrate}k`, '-bufsize', `${bufsize}k`,
      '-profile:v', 'high', '-pix_fmt', 'yuv420p', out,
    ]);
    const level = (await ffprobeStreams(out)).streams[0].level!;
    expect(h264LevelFor(w, h, fps, maxrate, bufsize, '1')).toBe(String(level / 10));
  });
});
