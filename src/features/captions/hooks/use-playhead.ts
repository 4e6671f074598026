import { useCallback, useEffect, useRef, useState } from 'react';

/** The editor's view of the video: where the playhead is and how to move it. */
export interface Playhead {
  /** Current position in milliseconds. */
  ms: number;
  playing: boolean;
  /** Attach to the <video>; without a playable video the playhead still moves (seek, J/L) so editing works. */
  videoRef: (el: HTMLVideoElement | null) => void;
  seek: (ms: number) => void;
  seekBy: (deltaMs: number) => void;
  togglePlay: () => void;
}

/**
 * Follows a <video> closely enough to highlight the cue being spoken: every animation frame while
 * it plays (timeupdate alone fires only about four times a second), on each event otherwise.
 */
export function usePlayhead(durationMs: number | null): Playhead {
  const [ms, setMs] = useState(0);
  const [playing, setPlaying] = useState(false);
  const video = useRef<HTMLVideoElement | null>(null);
  const msRef = useRef(0);
  const detach = useRef<(() => void) | null>(null);

  const publish = useCallback((next: number) => {
    const rounded = Math.max(0, Math.round(next));
    if (Math.abs(rounded - msRef.current) < 1) return;
    msRef.current = rounded;
    setMs(rounded);
  }, []);

  const videoRef = useCallback(
    (el: HTMLVideoElement | null) => {
      detach.current?.();
      detach.current = null;
      video.current = el;
      if (!el) return;
      const sync = () => publish(el.currentTime * 1000);
      const onPlay = () => setPlaying(true);
      const onPause = () => {
        setPlaying(false);
        sync();
      };
      const events: [string, () => void][] = [
        ['timeupdate', sync],
        ['seeked', sync],
        ['loadedmetadata', sync],
        ['play', onPlay],
        ['pause', onPause],
        ['ended', onPause],
      ];
      for (const [name, fn] of events) el.addEventListener(name, fn);
      detach.current = () => {
        for (const [name, fn] of events) el.removeEventListener(name, fn);
      };
    },
    [publish],
  );

  useEffect(() => () => detach.current?.(), []);

  useEffect(() => {
    if (!playing) return;
    let frame = 0;
    const tick = () => {
      const el = video.current;
      if (el) publish(el.currentTime * 1000);
      frame = requestAnimationFrame(tick);
    };
    frame = requestAnimationFrame(tick);
    return () => cancelAnimationFrame(frame);
  }, [playing, publish]);

  const clamp = useCallback(
    (target: number) => {
      const el = video.current;
      const known = durationMs ?? (el && Number.isFinite(el.duration) ? el.duration * 1000 : null);
      const floor = Math.max(0, Math.round(target));
      return known != null ? Math.min(floor, Math.round(known)) : floor;
    },
    [durationMs],
  );

  const seek = useCallback(
    (target: number) => {
      const to = clamp(target);
      const el = video.current;
      // Before the metadata has loaded this sets the default start position, which the browser honours.
      if (el) el.currentTime = to / 1000;
      msRef.current = to;
      setMs(to);
    },
    [clamp],
  );

  const seekBy = useCallback((delta: number) => seek(msRef.current + delta), [seek]);

  const togglePlay = useCallback(() => {
    const el = video.current;
    if (!el) return;
    if (el.paused) void el.play().catch(() => undefined);
    else el.pause();
  }, []);

  return { ms, playing, videoRef, seek, seekBy, togglePlay };
}
