import type { MomentThumbnail } from '@shared/schemas/search';
import { sheetTileStyle } from '@/lib/thumb-style';

/**
 * The picture of a tour moment: its tile from the thumbnail sheet, else the tour's poster, else a
 * drawn stand-in. Always decorative, because the tour title and time stand beside it.
 */
export function MomentThumb({ thumbnail, className = '' }: { thumbnail: MomentThumbnail; className?: string }) {
  if (thumbnail?.kind === 'tile') {
    return <div aria-hidden="true" className={`w-full bg-ink ${className}`} style={sheetTileStyle(thumbnail)} />;
  }
  if (thumbnail?.kind === 'poster') {
    return <img src={thumbnail.url} alt="" loading="lazy" className={`aspect-video w-full bg-ink object-cover ${className}`} />;
  }
  return (
    <svg viewBox="0 0 160 90" className={`aspect-video w-full bg-moss-wash ${className}`} aria-hidden="true" focusable="false">
      <path d="M0 70 Q 40 50, 80 60 T 160 44" fill="none" stroke="var(--color-bark-wash)" strokeWidth="9" strokeLinecap="round" />
      <circle cx="54" cy="34" r="13" fill="var(--color-moss)" opacity="0.65" />
      <circle cx="116" cy="30" r="10" fill="var(--color-maple)" opacity="0.55" />
    </svg>
  );
}
