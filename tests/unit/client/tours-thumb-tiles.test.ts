import { describe, expect, it } from 'vitest';
import { thumbTileAt, type ThumbStrip } from '@/features/tours/lib/thumb-tiles';

// Layout source: ffmpeg's tile filter (libavfilter/vf_tile.c) places picture n of a sheet at
// column n % columns and row floor(n / columns), i.e. across each row, then down; the API
// contract adds that picture i is on sheet floor(i / (columns × rows)). Check values below are
// worked by hand from that rule for a 10 × 10 sheet of 160 × 90 previews taken every 2 s.

const strip: ThumbStrip = {
  everySec: 2,
  tileWidth: 160,
  tileHeight: 90,
  columns: 10,
  rows: 10,
  count: 230,
  sheets: [
    { url: '/media/tours/1/thumbs-001.jpg', width: 1600, height: 900 },
    { url: '/media/tours/1/thumbs-002.jpg', width: 1600, height: 900 },
    { url: '/media/tours/1/thumbs-003.jpg', width: 1600, height: 900 },
  ],
};

describe('thumbTileAt (row-major tiles as ffmpeg vf_tile lays them out)', () => {
  it('puts the first picture at the top left of the first sheet', () => {
    expect(thumbTileAt(strip, 0)).toMatchObject({ index: 0, url: '/media/tours/1/thumbs-001.jpg', x: 0, y: 0, w: 160, h: 90 });
  });

  it('fills a row before moving down: picture 10 starts row 2', () => {
    expect(thumbTileAt(strip, 19.9)).toMatchObject({ index: 9, x: 1440, y: 0 });
    expect(thumbTileAt(strip, 20)).toMatchObject({ index: 10, x: 0, y: 90 });
  });

  it('finds picture 123 (t = 246 s) on sheet 2 at column 3, row 2', () => {
    // 123 = 1 × 100 + 23; 23 % 10 = 3 → x = 480; floor(23 / 10) = 2 → y = 180.
    expect(thumbTileAt(strip, 246.5)).toMatchObject({ index: 123, url: '/media/tours/1/thumbs-002.jpg', x: 480, y: 180 });
  });

  it('shows the last picture past the end and the first before the start', () => {
    expect(thumbTileAt(strip, 10_000)).toMatchObject({ index: 229, url: '/media/tours/1/thumbs-003.jpg', x: 1440, y: 180 });
    expect(thumbTileAt(strip, -4)).toMatchObject({ index: 0 });
  });

  it('gives nothing for an empty or inconsistent strip', () => {
    expect(thumbTileAt({ ...strip, count: 0 }, 3)).toBeNull();
    expect(thumbTileAt({ ...strip, sheets: [] }, 3)).toBeNull();
    expect(thumbTileAt({ ...strip, sheets: strip.sheets.slice(0, 1) }, 246)).toBeNull();
    expect(thumbTileAt(strip, Number.NaN)).toBeNull();
  });
});
