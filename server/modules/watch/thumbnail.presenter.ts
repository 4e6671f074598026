import type { MomentThumbnail } from '../../../shared/schemas/search';
import { thumbTileAt } from '../../../shared/thumb-tile';
import type { Tour } from '../../db/entities/tour.entity';
import { mediaUrl } from '../tours/tour.presenter';

/**
 * The preview picture of a moment: the thumbnail-sheet tile for that time (URL through the
 * visibility-checking media route, plus the crop rectangle), else the poster, else null.
 */
export function momentThumbnail(tour: Pick<Tour, 'id' | 'mediaDir' | 'posterFile' | 'thumbStrip'>, ms: number): MomentThumbnail {
  const tile = thumbTileAt(tour.thumbStrip, ms);
  if (tile) {
    return {
      kind: 'tile',
      url: mediaUrl(tour as Tour, tile.sheet.file),
      sheetWidth: tile.sheet.width,
      sheetHeight: tile.sheet.height,
      x: tile.x,
      y: tile.y,
      w: tile.w,
      h: tile.h,
    };
  }
  if (tour.posterFile) return { kind: 'poster', url: mediaUrl(tour as Tour, tour.posterFile) };
  return null;
}

/** The tour page at a moment: seconds with millisecond precision, as the deep link reads them. */
export function momentLink(tourId: number, ms: number): string {
  return `/tours/${tourId}?t=${Number((ms / 1000).toFixed(3))}`;
}
