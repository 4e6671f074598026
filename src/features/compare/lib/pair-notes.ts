/** A pair of records as notes are stored: lower id first. */
export type Pair = readonly [number, number];

/** Every pair among the records on screen, lower id first, in the order the records are shown. */
export function pairsOf(ids: readonly number[]): Pair[] {
  const out: Pair[] = [];
  for (let i = 0; i < ids.length; i++) {
    for (let j = i + 1; j < ids.length; j++) {
      const a = ids[i] as number;
      const b = ids[j] as number;
      out.push(a < b ? [a, b] : [b, a]);
    }
  }
  return out;
}

/** The stored note of a pair, whichever way round the ids are given. */
export function noteFor<T extends { aId: number; bId: number }>(notes: readonly T[], a: number, b: number): T | undefined {
  const [lo, hi] = a < b ? [a, b] : [b, a];
  return notes.find((n) => n.aId === lo && n.bId === hi);
}

function escapeHtml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

/**
 * A note typed in a plain text box as rich text: blank lines start a new paragraph, single line
 * breaks stay as line breaks, and every character is escaped (the server sanitises again).
 * An empty note comes out as "".
 */
export function plainTextToNoteHtml(text: string): string {
  return text
    .replace(/\r\n?/g, '\n')
    .split(/\n\s*\n/)
    .map((p) => p.trim())
    .filter((p) => p !== '')
    .map((p) => `<p>${p.split('\n').map((line) => escapeHtml(line.trim())).join('<br>')}</p>`)
    .join('');
}

const ENTITIES: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'", nbsp: ' ', '#39': "'" };

/**
 * A stored note back as plain text for the text box: paragraphs, list items and headings become
 * blocks separated by a blank line, line breaks stay, other tags are dropped and entities decoded.
 */
export function noteHtmlToPlainText(html: string): string {
  return html
    .replace(/<br\s*\/?>/gi, '\n')
    .replace(/<\/(p|li|h[1-6]|blockquote|pre)>\s*/gi, '\n\n')
    .replace(/<[^>]*>/g, '')
    .replace(/&(#\d+|#x[0-9a-f]+|[a-z]+);/gi, (m, name: string) => {
      const key = name.toLowerCase();
      if (key in ENTITIES) return ENTITIES[key] as string;
      if (key.startsWith('#x')) return String.fromCodePoint(parseInt(key.slice(2), 16));
      if (key.startsWith('#')) return String.fromCodePoint(Number(key.slice(1)));
      return m;
    })
    .replace(/\n{3,}/g, '\n\n')
    .trim();
}
