/** A run of text, marked (a match) or not. */
export interface TextSegment {
  text: string;
  marked: boolean;
}

/** A highlighted run: UTF-16 offsets (ECMAScript string indices), end exclusive. */
export interface MarkSpan {
  start: number;
  end: number;
}

/**
 * Cuts `text` into plain and marked runs from spans the server (or the find box) computed. Spans
 * are clamped to the text, empty ones dropped, overlapping or touching ones joined (and, with
 * `bridgeSpaces`, ones only spaces apart, so "Sora no hani" reads as one match), so a bad span can
 * never hide or repeat text: the runs always join back into exactly `text`.
 */
export function markedSegments(text: string, spans: readonly MarkSpan[], opts: { bridgeSpaces?: boolean } = {}): TextSegment[] {
  const clean = spans
    .map((s) => ({ start: Math.max(0, Math.min(text.length, Math.floor(s.start))), end: Math.max(0, Math.min(text.length, Math.floor(s.end))) }))
    .filter((s) => s.end > s.start)
    .sort((a, b) => a.start - b.start || a.end - b.end);
  const merged: MarkSpan[] = [];
  for (const s of clean) {
    const last = merged[merged.length - 1];
    const bridged = last && opts.bridgeSpaces && /^[ \t]+$/.test(text.slice(last.end, s.start));
    if (last && (s.start <= last.end || bridged)) last.end = Math.max(last.end, s.end);
    else merged.push({ ...s });
  }
  const out: TextSegment[] = [];
  let at = 0;
  for (const s of merged) {
    if (s.start > at) out.push({ text: text.slice(at, s.start), marked: false });
    out.push({ text: text.slice(s.start, s.end), marked: true });
    at = s.end;
  }
  if (at < text.length || out.length === 0) out.push({ text: text.slice(at), marked: false });
  return out;
}
