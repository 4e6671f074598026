import { mkdtemp, readdir, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  defaultPosterTime,
  makePoster,
  makeThumbnailAt,
  makeThumbnailStrip,
  thumbnailForTime,
  type ThumbnailStrip,
} from '../../../server/media/images';
import { ffprobeStreams } from '../../support/ffprobe-check';
import { generateClip } from '../../support/make-clip';

let dir: string;
let src: string;

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'grovewalk-images-'));
  // testsrc2 changes visibly every frame, so a frame from the wrong moment looks different.
  src = await generateClip(path.join(dir, 'src.mp4'), { seconds: 4, width: 640, height: 360, fps: 30, audio: false });
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

/** Mean absolute difference per channel value (0–255) between two same-sized RGB regions. */
type Image = ReturnType<typeof sharp>;

async function difference(a: Image, b: Image): Promise<number> {
  const [x, y] = await Promise.all([a.removeAlpha().raw().toBuffer(), b.removeAlpha().raw().toBuffer()]);
  expect(x.length).toBe(y.length);
  let sum = 0;
  for (let i = 0; i < x.length; i++) sum += Math.abs(x[i] - y[i]);
  return sum / x.length;
}

describe('posters and stop thumbnails', () => {
  it('default poster moment: 10 % of the duration, not before 1 s', () => {
    expect([defaultPosterTime(4), defaultPosterTime(60), defaultPosterTime(0.8)]).toEqual([1, 6, 0.4]);
  });

  it('makePoster writes a JPEG (SOI marker FF D8, ITU-T T.81) at the source size up to 1280 px', async () => {
    const poster = await makePoster(src, path.join(dir, 'poster.jpg'));
    expect(poster).toMatchObject({ atSec: 1, width: 640, height: 360 });
    const bytes = await readFile(poster.path);
    expect([bytes[0], bytes[1]]).toEqual([0xff, 0xd8]);
    const { streams } = await ffprobeStreams(poster.path);
    expect(streams[0]).toMatchObject({ codec_name: 'mjpeg', width: 640, height: 360 });
  });

  it('a moment past the end is pulled back to the last frames instead of writing nothing', async () => {
    const poster = await makePoster(src, path.join(dir, 'late.jpg'), 99);
    expect(poster.atSec).toBeGreaterThan(3.9);
    expect(poster.atSec).toBeLessThan(4);
  });

  it('makeThumbnailAt shows the frame at the requested moment (closer to it than to a frame 0.5 s away)', async () => {
    const at2 = await makeThumbnailAt(src, path.join(dir, 't2.jpg'), 2, { width: 160 });
    const again = await makeThumbnailAt(src, path.join(dir, 't2b.jpg'), 2, { width: 160 });
    const other = await makeThumbnailAt(src, path.join(dir, 't25.jpg'), 2.5, { width: 160 });
    expect(at2).toMatchObject({ width: 160, height: 90 });
    const same = await difference(sharp(at2.path), sharp(again.path));
    const apart = await difference(sharp(at2.path), sharp(other.path));
    expect(same).toBeLessThan(1);
    expect(apart).toBeGreaterThan(5 * Math.max(same, 1));
  });
});

describe('thumbnail sprite sheets', () => {
  let strip: ThumbnailStrip;

  beforeAll(async () => {
    strip = await makeThumbnailStrip(src, path.join(dir, 'strip'), { everySec: 1, width: 160 });
  });

  it('one picture per second of a 4 s clip: 4 pictures in a 4 × 1 sheet of 640 × 90', async () => {
    expect(strip.entries.map((e) => [e.timeSec, e.x, e.y, e.w, e.h])).toEqual([
      [0, 0, 0, 160, 90],
      [1, 160, 0, 160, 90],
      [2, 320, 0, 160, 90],
      [3, 480, 0, 160, 90],
    ]);
    expect(strip.sheets).toHaveLength(1);
    const meta = await sharp(strip.sheets[0].path).metadata();
    expect([meta.width, meta.height, meta.format]).toEqual([640, 90, 'jpeg']);
  });

  it('each tile shows its own moment: it matches the thumbnail taken at that time better than any other', async () => {
    const singles = [];
    for (const e of strip.entries) {
      singles.push(await makeThumbnailAt(src, path.join(dir, `single-${e.index}.jpg`), e.timeSec, { width: 160 }));
    }
    for (const e of strip.entries) {
      const tile = () => sharp(strip.sheets[e.sheet].path).extract({ left: e.x, top: e.y, width: e.w, height: e.h });
      const diffs = [];
      for (const s of singles) diffs.push(await difference(tile(), sharp(s.path)));
      const own = diffs[e.index];
      expect(own, `tile ${e.index}: ${diffs.map((d) => d.toFixed(1)).join(' ')}`).toBeLessThan(4);
      diffs.forEach((d, i) => {
        if (i !== e.index) expect(d, `tile ${e.index} vs ${i}`).toBeGreaterThan(own + 2);
      });
    }
  });

  it('long clips spill onto several sheets; the index says which sheet and where', async () => {
    const multi = await makeThumbnailStrip(src, path.join(dir, 'multi'), { everySec: 0.5, width: 160, columns: 2, rowsPerSheet: 2, baseName: 'prev' });
    expect(multi.entries).toHaveLength(8);
    expect(multi.sheets.map((s) => [s.file, s.width, s.height])).toEqual([
      ['prev-001.jpg', 320, 180],
      ['prev-002.jpg', 320, 180],
    ]);
    expect((await readdir(path.join(dir, 'multi'))).sort()).toEqual(['prev-001.jpg', 'prev-002.jpg']);
    expect(thumbnailForTime(multi, 1.7)).toMatchObject({ index: 3, sheet: 0, x: 160, y: 90 });
    expect(thumbnailForTime(multi, 2.0)).toMatchObject({ index: 4, sheet: 1, x: 0, y: 0 });
    expect(thumbnailForTime(multi, 100)).toMatchObject({ index: 7, sheet: 1, x: 160, y: 90 });
  });
});
