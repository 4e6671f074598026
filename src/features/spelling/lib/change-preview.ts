import { replaceVariant } from '@shared/names/replace';

/** A run of caption text; `changed` marks the words a fix rewrites. */
export interface Segment {
  text: string;
  changed: boolean;
}

/** One caption before and after a fix, with the rewritten spans marked on both sides. */
export interface PreviewCore {
  before: Segment[];
  after: Segment[];
  /** Occurrences the fix rewrites in this caption (as the server's accept counts them). */
  count: number;
  afterText: string;
}

/** A previewed caption with where it is. */
export interface CuePreview extends PreviewCore {
  tourId: number;
  tourTitle: string;
  trackId: number;
  trackLabel: string;
  startMs: number;
}

// A character captions never hold, used to see where the replacement put its text.
const MARK = '\u0000';

function push(list: Segment[], seg: Segment): void {
  if (!seg.text) return;
  const last = list[list.length - 1];
  if (last && last.changed === seg.changed) last.text += seg.text;
  else list.push({ ...seg });
}

function plain(text: string, after: string, count: number): PreviewCore {
  return { before: [{ text, changed: false }], after: [{ text: after, changed: false }], count, afterText: after };
}

/**
 * What accepting a fix does to one caption, computed with the very replacement the server runs
 * (replaceVariant from shared/names/replace.ts), so the preview cannot promise something else.
 * The replacement is run once with a marker in place of the accepted name to find where each
 * occurrence sits; each span found is checked to be one whole occurrence. Null when the caption
 * would not change. Should the spans ever be unclear, the caption is shown unmarked.
 */
export function buildPreview(text: string, variant: string, accepted: string): PreviewCore | null {
  const real = replaceVariant(text, variant, accepted);
  if (real.count === 0) return null;
  if (text.includes(MARK) || accepted.includes(MARK)) return plain(text, real.text, real.count);

  const pieces = replaceVariant(text, variant, MARK).text.split(MARK);
  const isOneOccurrence = (s: string) => s.length > 0 && replaceVariant(s, variant, MARK).text === MARK;
  const before: Segment[] = [];
  const after: Segment[] = [];
  let pos = pieces[0]!.length;
  push(before, { text: pieces[0]!, changed: false });
  push(after, { text: pieces[0]!, changed: false });
  for (let i = 1; i < pieces.length; i++) {
    const next = pieces[i]!;
    let end = -1;
    if (i === pieces.length - 1) {
      const candidate = text.length - next.length;
      if (candidate > pos && text.endsWith(next) && isOneOccurrence(text.slice(pos, candidate))) end = candidate;
    } else {
      for (let c = pos + 1; c <= text.length - next.length; c++) {
        if (text.startsWith(next, c) && isOneOccurrence(text.slice(pos, c))) {
          end = c;
          break;
        }
      }
    }
    if (end < 0) return plain(text, real.text, real.count);
    const found = text.slice(pos, end);
    // Occurrences already spelt exactly as accepted are left alone (and not counted) by the replacement.
    const changed = found !== accepted;
    push(before, { text: found, changed });
    push(after, { text: changed ? accepted : found, changed });
    push(before, { text: next, changed: false });
    push(after, { text: next, changed: false });
    pos = end + next.length;
  }
  const afterText = after.map((s) => s.text).join('');
  if (afterText !== real.text || before.map((s) => s.text).join('') !== text) return plain(text, real.text, real.count);
  return { before, after, count: real.count, afterText };
}
