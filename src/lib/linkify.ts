/** A run of plain text or a web address, in the order they appear. */
export type TextPart = { kind: 'text'; text: string } | { kind: 'link'; text: string; href: string };

// http(s) addresses up to the next space or bracket that cannot be part of one here.
const URL_PATTERN = /https?:\/\/[^\s<>"'`]+/gi;
// Punctuation that ends a sentence more often than it ends an address (common practice in mail clients).
const TRAILING = /[.,;:!?]+$/;

function trimUnbalancedCloser(url: string): string {
  let out = url;
  for (const [open, close] of [['(', ')'], ['[', ']']] as const) {
    while (out.endsWith(close) && out.split(open).length < out.split(close).length) out = out.slice(0, -1);
  }
  return out;
}

/**
 * Splits a plain-text e-mail body so its web addresses can be shown as links without ever
 * rendering the message as HTML. Only http and https are linked.
 */
export function splitLinks(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let last = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const start = match.index;
    let url = match[0];
    // Strip sentence punctuation and unmatched closing brackets, repeating until stable: "(see https://x.example/a)."
    for (let prev = ''; prev !== url; ) {
      prev = url;
      url = trimUnbalancedCloser(url.replace(TRAILING, ''));
    }
    if (/^https?:\/\/$/i.test(url)) continue;
    if (start > last) parts.push({ kind: 'text', text: text.slice(last, start) });
    parts.push({ kind: 'link', text: url, href: url });
    last = start + url.length;
  }
  if (last < text.length) parts.push({ kind: 'text', text: text.slice(last) });
  return parts;
}
