/** A tour's cover picture, or a drawn stand-in while there is none; always decorative (the title is beside it). */
export function TourPoster({ url, className = '' }: { url: string | null; className?: string }) {
  if (url) return <img src={url} alt="" loading="lazy" className={`aspect-video w-full bg-bark-wash object-cover ${className}`} />;
  return (
    <svg viewBox="0 0 160 90" className={`aspect-video w-full bg-moss-wash ${className}`} aria-hidden="true" focusable="false">
      <path d="M0 78 C 40 70, 50 50, 80 48 S 130 40, 160 30" fill="none" stroke="var(--color-bark-wash)" strokeWidth="10" strokeLinecap="round" />
      <circle cx="40" cy="40" r="14" fill="var(--color-moss)" opacity="0.7" />
      <circle cx="112" cy="28" r="11" fill="var(--color-maple)" opacity="0.6" />
      <circle cx="128" cy="62" r="9" fill="var(--color-moss-deep)" opacity="0.6" />
    </svg>
  );
}
