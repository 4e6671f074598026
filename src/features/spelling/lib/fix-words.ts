import { isApiError } from '@/lib/api';

const DAY_MS = 86_400_000;

/** How long a fix has waited, in round words: "today", "1 day", "12 days", "3 weeks", "2 months". */
export function ageText(createdIso: string, now: Date = new Date()): string {
  const created = Date.parse(createdIso);
  if (Number.isNaN(created)) return '';
  const days = Math.floor((now.getTime() - created) / DAY_MS);
  if (days < 1) return 'today';
  if (days < 14) return `${days} day${days === 1 ? '' : 's'}`;
  if (days < 60) return `${Math.floor(days / 7)} weeks`;
  if (days < 730) return `${Math.floor(days / 30)} months`;
  return `${Math.floor(days / 365)} years`;
}

/**
 * The captions an undo refused to touch, one line each, from a 409 undo_conflict answer: the
 * server names each conflicting cue in a field ("cue-<id>") with where it is and what it reads
 * now. Empty for any other error.
 */
export function undoConflictLines(error: unknown): string[] {
  if (!isApiError(error, 'undo_conflict')) return [];
  return Object.entries(error.fields)
    .filter(([key]) => key.startsWith('cue-'))
    .map(([, message]) => message);
}

/** "N captions changed in M tours" after an accept (tours counted from the touched tracks). */
export function acceptSummary(changedCues: number, tracks: readonly { tourId: number }[]): string {
  const tours = new Set(tracks.map((t) => t.tourId)).size;
  return `${changedCues} caption${changedCues === 1 ? '' : 's'} changed in ${tours} tour${tours === 1 ? '' : 's'}.`;
}

/** A word of a caption with where it sits, for picking the misheard words by tapping them. */
export interface WordSpan {
  text: string;
  start: number;
  end: number;
}

/** The words of a caption (letters, digits, inner apostrophes and hyphens), with offsets. */
export function wordSpans(text: string): WordSpan[] {
  const out: WordSpan[] = [];
  for (const m of text.matchAll(/[\p{L}\p{M}\p{N}]+(?:['’\-‐][\p{L}\p{M}\p{N}]+)*/gu)) {
    out.push({ text: m[0], start: m.index, end: m.index + m[0].length });
  }
  return out;
}

/** The caption text from word a to word b (either order), as written between them. */
export function textOfWords(text: string, words: readonly WordSpan[], a: number, b: number): string {
  const first = words[Math.min(a, b)];
  const last = words[Math.max(a, b)];
  if (!first || !last) return '';
  return text.slice(first.start, last.end);
}

/**
 * What the flag form starts with: the reader's selection when it lies inside the caption (spaces
 * tidied), otherwise the caption's text; at most the 120 characters a flag may hold.
 */
export function prefillText(selection: string | null | undefined, cueText: string): string {
  const sel = (selection ?? '').replace(/\s+/g, ' ').trim();
  const cue = cueText.replace(/\s+/g, ' ').trim();
  const chosen = sel && cue.includes(sel) ? sel : cue;
  return chosen.slice(0, 120);
}

/**
 * The caption that holds the words a reader selected on a transcript (where captions are joined
 * into paragraphs): the first cue whose text contains the selection, spaces tidied on both
 * sides. Null when nothing is selected or the selection runs across captions.
 */
export function cueForSelection<C extends { text: string }>(cues: readonly C[], selection: string | null | undefined): C | null {
  const sel = (selection ?? '').replace(/\s+/g, ' ').trim();
  if (!sel) return null;
  return cues.find((c) => c.text.replace(/\s+/g, ' ').includes(sel)) ?? null;
}
