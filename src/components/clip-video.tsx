import { useRef } from 'react';
import { clipSrc } from '@/lib/tour-moment';

/** Props of ClipVideo: one stop of a tour, played on its own. */
export interface ClipVideoProps {
  videoUrl: string | null;
  posterUrl: string | null;
  startMs: number;
  endMs: number;
  /** Accessible name of the video, e.g. "Clip of the tree" (never the tree's name in learn mode). */
  label: string;
  autoPlay?: boolean;
  className?: string;
}

/**
 * A stop played as a short clip with the browser's own controls: the media fragment starts it at
 * the stop and the time check pauses it at the stop's end on every replay, not only the first.
 * Muted, since most clips are watched side by side or several times in a row.
 */
export function ClipVideo({ videoUrl, posterUrl, startMs, endMs, label, autoPlay = false, className = '' }: ClipVideoProps) {
  const video = useRef<HTMLVideoElement>(null);
  const lastTime = useRef(0);

  if (!videoUrl) {
    return (
      <div className={`grid aspect-video place-items-center rounded-md border border-dashed border-edge bg-bark-wash p-4 text-center text-sm text-ink-soft ${className}`}>
        {posterUrl ? <img src={posterUrl} alt="" className="max-h-full rounded" /> : 'No video for this moment yet.'}
      </div>
    );
  }

  const replay = () => {
    const v = video.current;
    if (!v) return;
    v.currentTime = startMs / 1000;
    lastTime.current = startMs / 1000;
    void v.play().catch(() => undefined);
  };

  return (
    <div className={className}>
      <video
        ref={video}
        // The key restarts the element when the clip changes, so the fragment applies again.
        key={`${videoUrl}#${startMs}-${endMs}`}
        src={clipSrc(videoUrl, startMs, endMs)}
        poster={posterUrl ?? undefined}
        aria-label={label}
        muted
        playsInline
        controls
        preload="metadata"
        autoPlay={autoPlay}
        className="aspect-video w-full rounded-md bg-ink"
        onTimeUpdate={(e) => {
          const t = e.currentTarget.currentTime;
          const end = endMs / 1000;
          // Only a play that runs across the end pauses; seeking past it on purpose does not.
          if (endMs > startMs && lastTime.current < end && t >= end) e.currentTarget.pause();
          lastTime.current = t;
        }}
        onSeeked={(e) => {
          lastTime.current = e.currentTarget.currentTime;
        }}
      />
      <button type="button" onClick={replay} className="mt-2 rounded-md px-2 py-1 font-ui text-sm font-bold text-moss hover:bg-moss-wash">
        <span aria-hidden="true">↺ </span>Play the clip again
      </button>
    </div>
  );
}
