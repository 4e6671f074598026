import type { TourDto } from '@shared/schemas/tours';
import { thumbTileAt as tileAtMs } from '@shared/thumb-tile';

/** The thumbnail strip of a tour as the API describes it. */
export type ThumbStrip = NonNullable<TourDto['thumbStrip']>;

/** Where one preview picture sits: which sheet, and its box on that sheet in pixels. */
export interface ThumbTile {
  index: number;
  sheetUrl: string;
  sheetWidth: number;
  sheetHeight: number;
  x: number;
  y: number;
  width: number;
  height: number;
}

/**
 * The preview for a moment while the viewer hovers over the progress bar, in the shape the
 * player's CSS sprite needs (sheet address and size). The placement rule itself is the shared one
 * (shared/thumb-tile.ts) that the server uses too.
 */
export function thumbTileAt(strip: ThumbStrip, seconds: number): ThumbTile | null {
  if (!Number.isFinite(seconds)) return null;
  const tile = tileAtMs(strip, seconds * 1000);
  if (!tile) return null;
  return {
    index: tile.index,
    sheetUrl: tile.sheet.url,
    sheetWidth: tile.sheet.width,
    sheetHeight: tile.sheet.height,
    x: tile.x,
    y: tile.y,
    width: tile.w,
    height: tile.h,
  };
}
