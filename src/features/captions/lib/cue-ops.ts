// The timed editor's operations on a cue list. Every operation is pure: it takes the list and
// returns a new one (never changing the old), so whole lists can be kept as undo snapshots and
// compared by reference to tell saved from unsaved.
import { sortCues } from '@shared/captions/cue-order';
import type { CueInput, StoredCue } from '@shared/schemas/captions';

/** A cue in the editor: the stored fields plus a key that stays with it through edits and re-sorting. */
export interface EditorCue {
  key: string;
  id: string | null;
  startMs: number;
  endMs: number;
  text: string;
  settings: string;
}

/** What an operation leaves behind: the new list and the cue to select afterwards (null: none). */
export interface CueEdit {
  cues: EditorCue[];
  selected: string | null;
}

/** Makes the keys of new cues; injected so tests get predictable keys. */
export type KeyMaker = () => string;

/** Step of the nudge commands (common practice in caption timing: a tenth of a second). */
export const NUDGE_MS = 100;
/** Length of a cue added at the playhead when nothing follows it closely (common practice, about two seconds). */
export const NEW_CUE_MS = 2000;
/** Shortest cue the editor makes by itself, so a new or split cue can still be seen and clicked. */
export const MIN_NEW_CUE_MS = 200;

let counter = 0;
/** Keys for cues made in this browser tab; unique enough for React lists and selection. */
export const nextCueKey: KeyMaker = () => `c${++counter}`;

/** Cues from the server, each given an editor key, in playing order. */
export function editorCues(cues: readonly StoredCue[], makeKey: KeyMaker = nextCueKey): EditorCue[] {
  return sortCues(cues.map((c) => ({ key: makeKey(), id: c.id, startMs: c.startMs, endMs: c.endMs, text: c.text, settings: c.settings })));
}

/** The list as the autosave sends it (editor keys stay in the browser). */
export function cuesForSave(cues: readonly EditorCue[]): CueInput[] {
  return cues.map((c) => ({ id: c.id, startMs: c.startMs, endMs: c.endMs, text: c.text, settings: c.settings }));
}

/** Position of the cue with `key`, or -1. */
export function indexOfKey(cues: readonly EditorCue[], key: string | null): number {
  return key === null ? -1 : cues.findIndex((c) => c.key === key);
}

/**
 * The cue a viewer sees at `ms`: of the cues whose [start, end) holds it, the one that started
 * last (it is drawn on top); -1 when none shows. Binary search over the sorted list, then a short
 * walk back over overlapping cues.
 */
export function cueIndexAt(cues: readonly EditorCue[], ms: number): number {
  let lo = 0;
  let hi = cues.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (cues[mid]!.startMs <= ms) lo = mid + 1;
    else hi = mid;
  }
  for (let i = lo - 1; i >= 0; i--) {
    const c = cues[i]!;
    if (ms < c.endMs && c.endMs > c.startMs) return i;
    // A cue this far back could still cover `ms` only if an earlier cue is very long; stop after a few.
    if (lo - 1 - i > 20) break;
  }
  return -1;
}

function replaceAt(cues: readonly EditorCue[], index: number, cue: EditorCue): EditorCue[] {
  const next = cues.slice();
  next[index] = cue;
  return sortCues(next);
}

function clampMs(ms: number, durationMs: number | null | undefined): number {
  const floor = Math.max(0, Math.round(ms));
  return durationMs != null ? Math.min(floor, durationMs) : floor;
}

/**
 * A new empty cue starting at the playhead, two seconds long or up to the next cue's start, but
 * never past the video's end. Inside an existing cue it starts where that cue ends instead, so the
 * new cue follows the one being read rather than covering it.
 */
export function addCueAt(cues: readonly EditorCue[], playheadMs: number, durationMs: number | null, makeKey: KeyMaker = nextCueKey): CueEdit {
  let start = clampMs(playheadMs, durationMs);
  const covering = cueIndexAt(cues, start);
  if (covering >= 0) start = cues[covering]!.endMs;
  const next = cues.find((c) => c.startMs > start);
  let end = start + NEW_CUE_MS;
  if (next && next.startMs - start >= MIN_NEW_CUE_MS) end = Math.min(end, next.startMs);
  if (durationMs != null) {
    end = Math.min(end, durationMs);
    if (end - start < MIN_NEW_CUE_MS) start = Math.max(0, end - MIN_NEW_CUE_MS);
  }
  const cue: EditorCue = { key: makeKey(), id: null, startMs: start, endMs: Math.max(end, start + MIN_NEW_CUE_MS), text: '', settings: '' };
  return { cues: sortCues([...cues, cue]), selected: cue.key };
}

/**
 * Sets one edge of a cue to a moment (the playhead, or a typed time). The other edge is left alone
 * even when the cue then ends before it starts: the quality checks flag that at once, and the
 * author's next key press usually fixes it (set start, play, set end).
 */
export function setEdge(cues: readonly EditorCue[], key: string, edge: 'start' | 'end', ms: number, durationMs: number | null = null): CueEdit {
  const index = indexOfKey(cues, key);
  if (index < 0) return { cues: cues.slice(), selected: key };
  const cue = cues[index]!;
  const at = clampMs(ms, durationMs);
  const changed = edge === 'start' ? { ...cue, startMs: at } : { ...cue, endMs: at };
  return { cues: replaceAt(cues, index, changed), selected: key };
}

/** Moves one edge by `deltaMs` (± NUDGE_MS from the keyboard); never before 0 or past the end. */
export function nudgeEdge(cues: readonly EditorCue[], key: string, edge: 'start' | 'end', deltaMs: number, durationMs: number | null = null): CueEdit {
  const cue = cues[indexOfKey(cues, key)];
  if (!cue) return { cues: cues.slice(), selected: key };
  const from = edge === 'start' ? cue.startMs : cue.endMs;
  return setEdge(cues, key, edge, from + deltaMs, durationMs);
}

/** New text for one cue (line endings kept as the browser gives them: "\n"). */
export function setText(cues: readonly EditorCue[], key: string, text: string): CueEdit {
  const index = indexOfKey(cues, key);
  if (index < 0) return { cues: cues.slice(), selected: key };
  const next = cues.slice();
  next[index] = { ...cues[index]!, text };
  return { cues: next, selected: key };
}

/**
 * Where to cut a cue's text: at the caret when it lies strictly inside the text, otherwise after
 * the first half of the words (rounded up), at the whitespace between two words, so no word is
 * ever cut in two. The halves are trimmed; a one-word text stays whole in the first part.
 */
export function splitText(text: string, caret: number | null = null): [string, string] {
  if (caret !== null && caret > 0 && caret < text.length) {
    return [text.slice(0, caret).trim(), text.slice(caret).trim()];
  }
  const gaps = [...text.trim().matchAll(/\s+/g)];
  const trimmed = text.trim();
  if (gaps.length === 0) return [trimmed, ''];
  const words = gaps.length + 1;
  const gap = gaps[Math.ceil(words / 2) - 1]!;
  return [trimmed.slice(0, gap.index).trim(), trimmed.slice(gap.index + gap[0].length).trim()];
}

/**
 * Splits a cue in two at the playhead (or in the middle when the playhead is not inside it); the
 * text is cut by {@link splitText}. The second part is a new cue without a WebVTT id and is
 * selected, ready to be read on.
 */
export function splitCue(cues: readonly EditorCue[], key: string, playheadMs: number, caret: number | null = null, makeKey: KeyMaker = nextCueKey): CueEdit {
  const index = indexOfKey(cues, key);
  const cue = cues[index];
  // A cue that ends before it starts has no inside to cut; the timing error shows on it instead.
  if (!cue || cue.endMs <= cue.startMs) return { cues: cues.slice(), selected: key };
  const inside = playheadMs > cue.startMs && playheadMs < cue.endMs;
  const at = inside ? Math.round(playheadMs) : cue.startMs + Math.round((cue.endMs - cue.startMs) / 2);
  const [first, second] = splitText(cue.text, caret);
  const head: EditorCue = { ...cue, endMs: at, text: first };
  const tail: EditorCue = { key: makeKey(), id: null, startMs: at, endMs: Math.max(cue.endMs, at), text: second, settings: cue.settings };
  const next = cues.slice();
  next.splice(index, 1, head, tail);
  return { cues: sortCues(next), selected: tail.key };
}

/**
 * Joins a cue with the one after it in playing order: the earlier start, the later end, the texts
 * on two lines. The first cue's id and settings stay; the merged cue is selected.
 */
export function mergeWithNext(cues: readonly EditorCue[], key: string): CueEdit {
  const index = indexOfKey(cues, key);
  const cue = cues[index];
  const after = cues[index + 1];
  if (!cue || !after) return { cues: cues.slice(), selected: key };
  const text = [cue.text.trim(), after.text.trim()].filter((t) => t !== '').join('\n');
  const merged: EditorCue = { ...cue, startMs: Math.min(cue.startMs, after.startMs), endMs: Math.max(cue.endMs, after.endMs), text };
  const next = cues.slice();
  next.splice(index, 2, merged);
  return { cues: sortCues(next), selected: merged.key };
}

/** Removes a cue; the one that took its place (or the one before, at the end) becomes selected. */
export function deleteCue(cues: readonly EditorCue[], key: string): CueEdit {
  const index = indexOfKey(cues, key);
  if (index < 0) return { cues: cues.slice(), selected: key };
  const next = cues.filter((c) => c.key !== key);
  const neighbour = next[index] ?? next[index - 1] ?? null;
  return { cues: next, selected: neighbour?.key ?? null };
}
