import sanitizeHtml from 'sanitize-html';

/**
 * The allow-list for rich text written with the editor: structure and emphasis only, links to
 * http(s) and mail, nothing that runs or loads.
 */
export function sanitizeRichText(html: string): string {
  const clean = sanitizeHtml(html, {
    allowedTags: ['p', 'br', 'strong', 'b', 'em', 'i', 's', 'u', 'code', 'pre', 'blockquote', 'ul', 'ol', 'li', 'h2', 'h3', 'h4', 'hr', 'a'],
    allowedAttributes: { a: ['href', 'title', 'rel', 'target'] },
    allowedSchemes: ['http', 'https', 'mailto'],
    allowProtocolRelative: false,
    transformTags: {
      a: sanitizeHtml.simpleTransform('a', { rel: 'noopener noreferrer nofollow', target: '_blank' }),
      h1: 'h2',
    },
  });
  // An editor's empty document is one empty paragraph; store it as nothing.
  return /^(<p>\s*<\/p>)*$/.test(clean.trim()) ? '' : clean.trim();
}
