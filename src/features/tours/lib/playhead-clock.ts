/**
 * The playhead as a tiny store: the player writes the time on every time update, and each part of
 * the page reads only what it shows (the transcript its current line), so a time update does not
 * re-render the whole tour page.
 */
export interface PlayheadClock {
  /** Milliseconds from the start of the tour. */
  get(): number;
  set(ms: number): void;
  subscribe(listener: () => void): () => void;
}

/** A new clock at `startMs`. */
export function createPlayheadClock(startMs = 0): PlayheadClock {
  let now = startMs;
  const listeners = new Set<() => void>();
  return {
    get: () => now,
    set(ms) {
      if (ms === now) return;
      now = ms;
      for (const l of listeners) l();
    },
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
  };
}
