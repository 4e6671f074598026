import type { CSSProperties } from 'react';

/** A tile cut from a thumbnail sheet: the sheet's size and the tile's box on it, in pixels. */
export interface SheetTile {
  url: string;
  sheetWidth: number;
  sheetHeight: number;
  x: number;
  y: number;
  w: number;
  h: number;
}

function percent(value: number): string {
  return `${Math.round(value * 10_000) / 10_000}%`;
}

/**
 * CSS that shows one tile of a thumbnail sheet filling a box of any width with the tile's aspect
 * ratio. The sheet is scaled so the tile is as wide as the box (background-size in percent of the
 * box), then placed with percentage positions: per CSS Backgrounds and Borders Level 3 (§3.6), a
 * percentage p puts the image's p-point on the box's p-point, which shifts it by (box − image) × p;
 * p = x / (sheet − tile) therefore brings the tile's corner to the box's corner.
 */
export function sheetTileStyle(tile: SheetTile): CSSProperties {
  const px = tile.sheetWidth > tile.w ? (tile.x / (tile.sheetWidth - tile.w)) * 100 : 0;
  const py = tile.sheetHeight > tile.h ? (tile.y / (tile.sheetHeight - tile.h)) * 100 : 0;
  const url = tile.url.replace(/["\\\n\r]/g, (c) => (c === '\n' ? '\\a ' : c === '\r' ? '\\d ' : `\\${c}`));
  return {
    backgroundImage: `url("${url}")`,
    backgroundRepeat: 'no-repeat',
    backgroundSize: `${percent((tile.sheetWidth / tile.w) * 100)} ${percent((tile.sheetHeight / tile.h) * 100)}`,
    backgroundPosition: `${percent(px)} ${percent(py)}`,
    aspectRatio: `${tile.w} / ${tile.h}`,
  };
}
