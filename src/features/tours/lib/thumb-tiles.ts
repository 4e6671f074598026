import type { TourDto } from '@shared/schemas/tours';
import { thumbTileAt as tileAtMs } from '@shared/thumb-tile';
import type { SheetTile } from '@/lib/thumb-style';

/** The thumbnail strip of a tour as the API describes it. */
export type ThumbStrip = NonNullable<TourDto['thumbStrip']>;

/** One preview picture: its place in the strip and its box on its sheet, ready for `sheetTileStyle`. */
export type ThumbTile = SheetTile & { index: number };

/**
 * The preview for a moment while the viewer hovers over the progress bar. The placement rule
 * itself is the shared one (shared/thumb-tile.ts) that the server uses too.
 */
export function thumbTileAt(strip: ThumbStrip, seconds: number): ThumbTile | null {
  if (!Number.isFinite(seconds)) return null;
  const tile = tileAtMs(strip, seconds * 1000);
  if (!tile) return null;
  return { index: tile.index, url: tile.sheet.url, sheetWidth: tile.sheet.width, sheetHeight: tile.sheet.height, x: tile.x, y: tile.y, w: tile.w, h: tile.h };
}
