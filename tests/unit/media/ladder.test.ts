import { describe, expect, it } from 'vitest';
import { chooseRenditions, even, h264LevelFor, H264_LEVELS } from '../../../server/media/ladder';
import type { VideoStreamInfo } from '../../../server/media/probe';

function video(displayWidth: number, displayHeight: number, fps = 30): { video: VideoStreamInfo } {
  return {
    video: {
      index: 0, codec: 'h264', width: displayWidth, height: displayHeight,
      displayWidth, displayHeight, rotation: 0, fps, pixFmt: 'yuv420p', interlaced: false,
    },
  };
}

// Which rungs a source gets is Grovewalk's own rule (never upscale, short side decides); the size
// arithmetic is checked against values worked by hand, the levels against ITU-T H.264 Table A-1.
const sizes = (r: { width: number; height: number }[]) => r.map((x) => `${x.width}x${x.height}`);

describe('chooseRenditions', () => {
  it('a 1920×1080 source gets all four rungs; 16:9 widths are 1920·h/1080 rounded to even (480 → 853.3 → 854)', () => {
    const r = chooseRenditions(video(1920, 1080));
    expect(r.map((x) => x.name)).toEqual(['1080p', '720p', '480p', '360p']);
    expect(sizes(r)).toEqual(['1920x1080', '1280x720', '854x480', '640x360']);
  });

  it('never goes above the source height: a 1280×720 source starts at 720p', () => {
    expect(sizes(chooseRenditions(video(1280, 720)))).toEqual(['1280x720', '854x480', '640x360']);
  });

  it('a 4K source is capped at the 1080p rung', () => {
    expect(chooseRenditions(video(3840, 2160))[0]).toMatchObject({ width: 1920, height: 1080 });
  });

  it('a source between rungs keeps only the rungs below it', () => {
    expect(sizes(chooseRenditions(video(1600, 900)))).toEqual(['1280x720', '854x480', '640x360']);
  });

  it('portrait video uses the short side: 1080×1920 → 1080×1920, 720×1280, 480×854, 360×640', () => {
    const r = chooseRenditions(video(1080, 1920));
    expect(sizes(r)).toEqual(['1080x1920', '720x1280', '480x854', '360x640']);
    expect(r.map((x) => x.name)).toEqual(['1080p', '720p', '480p', '360p']);
  });

  it('4:3 keeps its aspect: 1440×1080 → 960×720, 640×480, 480×360', () => {
    expect(sizes(chooseRenditions(video(1440, 1080))).slice(1)).toEqual(['960x720', '640x480', '480x360']);
  });

  it('a source below 360p gets one rendition at its own even size, never upscaled', () => {
    expect(sizes(chooseRenditions(video(320, 180)))).toEqual(['320x180']);
    expect(sizes(chooseRenditions(video(427, 241)))).toEqual(['426x240']);
  });

  it('every rendition has even sides (4:2:0 chroma halves both; common practice) and keeps the aspect within one pixel', () => {
    for (const [w, h] of [[1918, 1078], [1366, 768], [1080, 1350], [2560, 1080], [996, 560]]) {
      for (const r of chooseRenditions(video(w, h))) {
        expect(r.width % 2).toBe(0);
        expect(r.height % 2).toBe(0);
        expect(r.height).toBeLessThanOrEqual(Math.max(h, w));
        expect(Math.abs(r.width / r.height - w / h) * r.height).toBeLessThanOrEqual(1.01);
      }
    }
  });

  it('frame rates above 60 are capped and raise the peak rate by half', () => {
    const r = chooseRenditions(video(1280, 720, 120));
    expect(r[0].fps).toBe(60);
    expect(r[0].maxrateKbps).toBe(5250);
    expect(chooseRenditions(video(1280, 720, 30))[0].fps).toBeUndefined();
  });

  it('the VBV buffer is two seconds of the peak rate', () => {
    for (const r of chooseRenditions(video(1920, 1080))) expect(r.bufsizeKbps).toBe(2 * r.maxrateKbps);
  });

  it('needs a video stream', () => {
    expect(() => chooseRenditions({ video: undefined })).toThrow();
  });
});

describe('h264LevelFor — worked examples from ITU-T H.264 Table A-1 (limits as tabulated, from memory; cross-checked against x264 in tests/integration/media/levels.test.ts)', () => {
  it('1920×1080 at 30 fps: 120×68 = 8160 MBs ≤ 8192 and 244 800 MB/s ≤ 245 760 → level 4', () => {
    expect(h264LevelFor(1920, 1080, 30, 6000, 12000)).toBe('4');
  });

  it('1920×1080 at 60 fps: 489 600 MB/s needs level 4.2 (522 240)', () => {
    expect(h264LevelFor(1920, 1080, 60, 9000, 18000)).toBe('4.2');
  });

  it('1280×720 at 30 fps: 3600 MBs, 108 000 MB/s → exactly level 3.1; at 60 fps 216 000 → 3.2', () => {
    expect(h264LevelFor(1280, 720, 30, 3500, 7000)).toBe('3.1');
    expect(h264LevelFor(1280, 720, 60, 5250, 10500)).toBe('3.2');
  });

  it('854×480 at 30 fps: 54×30 = 1620 MBs but 48 600 MB/s exceeds level 3 (40 500) → 3.1', () => {
    expect(h264LevelFor(854, 480, 30, 1600, 3200)).toBe('3.1');
    expect(h264LevelFor(854, 480, 25, 1600, 3200)).toBe('3');
  });

  it('the bit-rate limit counts: 1080p30 at 30 Mbit/s exceeds level 4 (20 000 × 1.25 for High) → 4.1', () => {
    expect(h264LevelFor(1920, 1080, 30, 30000, 30000)).toBe('4.1');
  });

  it('small pictures get the floor level 3 unless asked lower: 320×180 = 20×12 MBs, 7200 MB/s → 1.3 (11 880)', () => {
    expect(h264LevelFor(320, 180, 30, 500, 1000)).toBe('3');
    expect(h264LevelFor(320, 180, 30, 500, 1000, '1')).toBe('1.3');
  });

  it('the table is ordered so the first fit is the lowest level', () => {
    for (let i = 1; i < H264_LEVELS.length; i++) {
      expect(H264_LEVELS[i].maxMbps).toBeGreaterThanOrEqual(H264_LEVELS[i - 1].maxMbps);
      expect(H264_LEVELS[i].maxFs).toBeGreaterThanOrEqual(H264_LEVELS[i - 1].maxFs);
    }
  });

  it('nothing fits beyond level 5.2', () => {
    expect(() => h264LevelFor(7680, 4320, 60, 1000, 1000)).toThrow(RangeError);
  });

  it('even() rounds to the nearest even number', () => {
    expect([even(853.3), even(855), even(1)]).toEqual([854, 856, 2]);
  });
});
