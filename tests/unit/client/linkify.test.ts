import { describe, expect, it } from 'vitest';
import { splitLinks, type TextPart } from '@/lib/linkify';

const links = (parts: TextPart[]) => parts.filter((p) => p.kind === 'link').map((p) => (p.kind === 'link' ? p.href : ''));

describe('splitLinks (outbox message bodies)', () => {
  it('keeps every character of the text, in order', () => {
    const text = 'Hello,\nopen https://grove.example/verify?token=abc123 to finish.\nThanks!';
    expect(
      splitLinks(text)
        .map((p) => p.text)
        .join(''),
    ).toBe(text);
  });

  // RFC 3986 §2.2–2.3: "?", "=", "&", "-", "_", "~", "%" and "#" are all legal inside a URI.
  it('keeps query, fragment and percent-escapes inside the link (RFC 3986 §2)', () => {
    const url = 'https://grove.example/reset-password?token=a-b_c~d%2Fe&x=1#top';
    expect(links(splitLinks(`Link: ${url}`))).toEqual([url]);
  });

  // Common practice in mail readers: sentence punctuation after an address is not part of it.
  it('leaves a full stop or comma after the address outside the link (common practice)', () => {
    expect(links(splitLinks('Go to https://grove.example/verify?token=abc.'))).toEqual(['https://grove.example/verify?token=abc']);
    expect(links(splitLinks('See https://a.example/x, then https://b.example/y!'))).toEqual(['https://a.example/x', 'https://b.example/y']);
  });

  it('drops a closing bracket that closes the sentence, keeps one that belongs to the address (common practice)', () => {
    expect(links(splitLinks('(see https://grove.example/help).'))).toEqual(['https://grove.example/help']);
    expect(links(splitLinks('https://grove.example/wiki/Acer_(genus)'))).toEqual(['https://grove.example/wiki/Acer_(genus)']);
  });

  it('links only http and https, never other schemes', () => {
    expect(links(splitLinks('javascript:alert(1) mailto:a@b.example ftp://x.example'))).toEqual([]);
    expect(splitLinks('plain text only')).toEqual([{ kind: 'text', text: 'plain text only' }]);
  });

  it('stops at angle brackets and quotes, so markup around an address is not swallowed', () => {
    expect(links(splitLinks('<https://grove.example/a>'))).toEqual(['https://grove.example/a']);
    expect(links(splitLinks('"https://grove.example/b"'))).toEqual(['https://grove.example/b']);
  });
});
