import { useCallback, useSyncExternalStore } from 'react';

/**
 * Whether a CSS media query matches now, following changes (a phone turned sideways, a window
 * resized). Without matchMedia (tests, old browsers) it answers `fallback`.
 */
export function useMediaQuery(query: string, fallback = false): boolean {
  const subscribe = useCallback(
    (onChange: () => void) => {
      if (typeof window === 'undefined' || !window.matchMedia) return () => {};
      const list = window.matchMedia(query);
      list.addEventListener('change', onChange);
      return () => list.removeEventListener('change', onChange);
    },
    [query],
  );
  const read = () => (typeof window !== 'undefined' && window.matchMedia ? window.matchMedia(query).matches : fallback);
  return useSyncExternalStore(subscribe, read, () => fallback);
}

/** The wide layout of the tour page (card and transcript beside the video, not folded). */
export const WIDE_LAYOUT = '(min-width: 64rem)';

/** The viewer asked the system for less motion: no smooth scrolling or animated highlights. */
export const REDUCED_MOTION = '(prefers-reduced-motion: reduce)';
