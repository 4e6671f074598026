/*
 * Notes (of a cultivar record, of a pair side by side) are stored as sanitised HTML and edited in
 * a plain text box as paragraphs: a blank line starts a new paragraph, a single line break stays a
 * line break. A no-break space comes back as a plain one, since the text box cannot show it.
 */

const ENTITIES: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'", nbsp: ' ', '#39': "'" };

function decodeEntities(s: string): string {
  return s.replace(/&(#x[0-9a-f]+|#\d+|[a-z]+|#39);/gi, (whole, name: string) => {
    const lower = name.toLowerCase();
    if (lower in ENTITIES) return ENTITIES[lower]!;
    if (lower.startsWith('#x')) return String.fromCodePoint(parseInt(lower.slice(2), 16));
    if (lower.startsWith('#')) return String.fromCodePoint(parseInt(lower.slice(1), 10));
    return whole;
  });
}

function escapeHtml(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

/** The notes as editable paragraphs: block ends become blank lines, <br> a line break, tags dropped. */
export function notesHtmlToText(html: string): string {
  const text = html
    .replace(/\r\n?/g, '\n')
    .replace(/\n/g, ' ')
    .replace(/<br\s*\/?>/gi, '\n')
    .replace(/<\/(p|div|h[1-6]|blockquote|pre)>/gi, '\n\n')
    .replace(/<li[^>]*>/gi, '• ')
    .replace(/<\/li>/gi, '\n')
    .replace(/<[^>]*>/g, '');
  return decodeEntities(text)
    .split('\n')
    .map((l) => l.replace(/[ \t]+/g, ' ').trim())
    .join('\n')
    .replace(/\n{3,}/g, '\n\n')
    .trim();
}

/**
 * Paragraphs back to HTML: each block separated by a blank line becomes a <p>, every character
 * escaped (the server sanitises again); an empty text comes out as "".
 */
export function textToNotesHtml(text: string): string {
  return text
    .replace(/\r\n?/g, '\n')
    .split(/\n\s*\n/)
    .map((block) => block.trim())
    .filter((block) => block.length > 0)
    .map((block) => `<p>${block.split('\n').map((line) => escapeHtml(line.trim())).join('<br>')}</p>`)
    .join('');
}

/** True when the notes hold formatting that plain paragraphs cannot keep (bold, lists, links…). */
export function notesHaveFormatting(html: string): boolean {
  return /<(?!\/?(p|br)\b)[a-z]/i.test(html);
}
