/**
 * Where the preview picture for a moment sits in a tour's thumbnail sheets. Picture i shows time
 * i × everySec; sheets hold columns × rows pictures, filled left to right, then top to bottom, as
 * ffmpeg's tile filter lays frames out (libavfilter/vf_tile.c: x = (n mod columns) × width,
 * y = floor(n / columns) × height, no margin or padding). Both the server (search results, the
 * watch page) and the client (hover previews on the trail) use it.
 */

/** The thumbnail sheets of a tour as stored and presented (sheet `url` or `file`). */
export interface ThumbSheetsLike<S> {
  everySec: number;
  tileWidth: number;
  tileHeight: number;
  columns: number;
  rows: number;
  count: number;
  sheets: readonly S[];
}

/** One picture: which sheet, and the rectangle to crop from it. */
export interface ThumbTile<S> {
  index: number;
  sheet: S;
  sheetIndex: number;
  x: number;
  y: number;
  w: number;
  h: number;
}

/** The last picture taken at or before `ms`, or null when the tour has no usable sheets. */
export function thumbTileAt<S>(strip: ThumbSheetsLike<S> | null | undefined, ms: number): ThumbTile<S> | null {
  if (!strip || strip.count < 1 || strip.columns < 1 || strip.rows < 1 || !(strip.everySec > 0)) return null;
  const perSheet = strip.columns * strip.rows;
  const index = Math.min(strip.count - 1, Math.max(0, Math.floor(ms / 1000 / strip.everySec + 1e-9)));
  const sheetIndex = Math.floor(index / perSheet);
  const sheet = strip.sheets[sheetIndex];
  if (sheet === undefined) return null;
  const pos = index % perSheet;
  return {
    index,
    sheet,
    sheetIndex,
    x: (pos % strip.columns) * strip.tileWidth,
    y: Math.floor(pos / strip.columns) * strip.tileHeight,
    w: strip.tileWidth,
    h: strip.tileHeight,
  };
}
