/**
 * Undo and redo over whole snapshots (the editor keeps entire cue lists, which are cheap to hold
 * because unchanged cues are shared between snapshots). `group` lets a run of edits of the same
 * kind — typing into one cue — become one step, as people expect from a text field.
 */
export interface History<T> {
  past: readonly T[];
  present: T;
  future: readonly T[];
  /** The group of the last recorded change; the next change with the same group joins it. */
  group: string | null;
}

/** How many steps back the editor keeps; older ones are dropped. */
export const HISTORY_LIMIT = 200;

/** A history with nothing to undo. */
export function startHistory<T>(present: T): History<T> {
  return { past: [], present, future: [], group: null };
}

/**
 * Records a new present. With the same non-null `group` as the previous change it replaces the
 * present instead of adding a step. Anything that could be redone is dropped, since the new change
 * starts another branch. Recording the present itself changes nothing.
 */
export function record<T>(h: History<T>, next: T, group: string | null = null, limit = HISTORY_LIMIT): History<T> {
  if (Object.is(next, h.present)) return h;
  if (group !== null && group === h.group && h.past.length > 0) {
    return { past: h.past, present: next, future: [], group };
  }
  const past = [...h.past, h.present];
  return { past: past.length > limit ? past.slice(past.length - limit) : past, present: next, future: [], group };
}

/** One step back; unchanged when there is nothing to undo. */
export function undo<T>(h: History<T>): History<T> {
  if (h.past.length === 0) return h;
  const previous = h.past[h.past.length - 1] as T;
  return { past: h.past.slice(0, -1), present: previous, future: [h.present, ...h.future], group: null };
}

/** One step forward again; unchanged when there is nothing to redo. */
export function redo<T>(h: History<T>): History<T> {
  if (h.future.length === 0) return h;
  const [next, ...rest] = h.future as [T, ...T[]];
  return { past: [...h.past, h.present], present: next, future: rest, group: null };
}

/** Ends the current group, so the next change is a step of its own (e.g. after leaving a text field). */
export function closeGroup<T>(h: History<T>): History<T> {
  return h.group === null ? h : { ...h, group: null };
}
