// Where a moment's preview sits on a tour's thumbnail sheets. Outside source: FFmpeg's tile filter,
// libavfilter/vf_tile.c get_current_tile_pos — frame n of a sheet goes to x = margin + (w + padding)
// × (n mod columns), y = margin + (h + padding) × floor(n / columns); the transcode job uses no
// margin or padding. Times: picture i shows i × everySec (product rule of the thumbnail job).
import { describe, expect, it } from 'vitest';
import { thumbTileAt } from '../../../shared/thumb-tile';

const strip = {
  everySec: 2,
  tileWidth: 160,
  tileHeight: 90,
  columns: 10,
  rows: 10,
  count: 250,
  sheets: ['s1', 's2', 's3'],
};

describe('thumbTileAt (vf_tile.c layout)', () => {
  it('places pictures left to right, then top to bottom, sheet after sheet', () => {
    expect(thumbTileAt(strip, 0)).toEqual({ index: 0, sheet: 's1', sheetIndex: 0, x: 0, y: 0, w: 160, h: 90 });
    // 23 s → picture 11: row 1, column 1.
    expect(thumbTileAt(strip, 23_000)).toMatchObject({ index: 11, sheet: 's1', x: 160, y: 90 });
    // 399.9 s → picture 199: the last of sheet 2.
    expect(thumbTileAt(strip, 399_900)).toMatchObject({ index: 199, sheet: 's2', sheetIndex: 1, x: 1440, y: 810 });
    // 400 s → picture 200: the first of sheet 3.
    expect(thumbTileAt(strip, 400_000)).toMatchObject({ index: 200, sheet: 's3', x: 0, y: 0 });
  });
  it('uses the last picture for times past the end and the first for negative times', () => {
    expect(thumbTileAt(strip, 10_000_000)).toMatchObject({ index: 249, sheet: 's3', x: 1440, y: 360 });
    expect(thumbTileAt(strip, -5)).toMatchObject({ index: 0 });
  });
  it('follows a narrower grid when the strip has fewer pictures than a row', () => {
    expect(thumbTileAt({ ...strip, columns: 4, rows: 1, count: 4, sheets: ['only'] }, 7_000)).toMatchObject({ index: 3, x: 480, y: 0 });
  });
  it('gives null without usable sheets', () => {
    expect(thumbTileAt(null, 0)).toBeNull();
    expect(thumbTileAt({ ...strip, count: 0 }, 0)).toBeNull();
    expect(thumbTileAt({ ...strip, sheets: ['s1'] }, 300_000)).toBeNull();
    expect(thumbTileAt({ ...strip, everySec: 0 }, 0)).toBeNull();
  });
});
