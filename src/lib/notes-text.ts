/*
 * Notes on a pair side by side are stored as sanitised HTML and edited in
 * a plain text box as paragraphs: a blank line starts a new paragraph, a single line break stays a
 * line break. A no-break space comes back as a plain one, since the text box cannot show it.
 */

function escapeHtml(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

/** Elements whose end starts a new paragraph. */
const BLOCKS = new Set(['p', 'div', 'h1', 'h2', 'h3', 'h4', 'h5', 'h6', 'blockquote', 'pre']);

/**
 * The notes as editable paragraphs: block ends become blank lines, <br> a line break, list items
 * bullets, other tags are dropped. The browser's own parser reads the HTML and its entities.
 */
export function notesHtmlToText(html: string): string {
  const out: string[] = [];
  const walk = (node: Node): void => {
    for (const child of Array.from(node.childNodes)) {
      if (child.nodeType === Node.TEXT_NODE) {
        // Line breaks in the source are spaces, as a browser shows them; so is a no-break space.
        out.push((child.textContent ?? '').replace(/\s/g, ' '));
        continue;
      }
      if (child.nodeType !== Node.ELEMENT_NODE) continue;
      const tag = (child as Element).tagName.toLowerCase();
      if (tag === 'br') {
        out.push('\n');
        continue;
      }
      if (tag === 'li') out.push('• ');
      walk(child);
      if (tag === 'li') out.push('\n');
      else if (BLOCKS.has(tag)) out.push('\n\n');
    }
  };
  walk(new DOMParser().parseFromString(html, 'text/html').body);
  return out
    .join('')
    .split('\n')
    .map((l) => l.replace(/ +/g, ' ').trim())
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
