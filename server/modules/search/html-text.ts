const NAMED: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'", nbsp: ' ', '#39': "'" };
// Elements that end a line of text: their tags become a space so words on both sides stay apart.
const BLOCK = /^(p|div|br|li|ul|ol|h[1-6]|blockquote|pre|tr|td|th|hr)$/i;

/**
 * The text a reader sees in a sanitised rich-text description: tags removed (block tags as word
 * breaks), the few entities the sanitiser writes decoded, runs of white space made single.
 * Search matches and snippets use this, so words inside tag names or attributes never match.
 */
export function htmlToText(html: string): string {
  return html
    .replace(/<!--[\s\S]*?-->/g, ' ')
    .replace(/<\/?([a-zA-Z0-9]+)\b[^>]*>/g, (_m, tag: string) => (BLOCK.test(tag) ? ' ' : ''))
    .replace(/&(#x[0-9a-f]+|#\d+|[a-z]+|#39);/gi, (m, ent: string) => {
      const e = ent.toLowerCase();
      if (e.startsWith('#x')) return safeCodePoint(parseInt(e.slice(2), 16)) ?? m;
      if (e.startsWith('#') && e !== '#39') return safeCodePoint(Number(e.slice(1))) ?? m;
      return NAMED[e] ?? m;
    })
    .replace(/\s+/g, ' ')
    .trim();
}

function safeCodePoint(n: number): string | null {
  return Number.isInteger(n) && n > 0 && n <= 0x10ffff ? String.fromCodePoint(n) : null;
}
