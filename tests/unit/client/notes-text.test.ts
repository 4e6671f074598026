import { describe, expect, it } from 'vitest';
import { notesHtmlToText, textToNotesHtml } from '@/lib/notes-text';

describe('notes as plain paragraphs (pair notes)', () => {
  it('turns stored HTML into paragraphs and back, escaping what was typed', () => {
    const html = '<p>A low, weeping lace-leaf &amp; a slow grower.</p><p><strong>Care note:</strong> prune in late winter.<br>Lift pots with help.</p>';
    const text = notesHtmlToText(html);
    expect(text).toBe('A low, weeping lace-leaf & a slow grower.\n\nCare note: prune in late winter.\nLift pots with help.');
    expect(textToNotesHtml(text)).toBe('<p>A low, weeping lace-leaf &amp; a slow grower.</p><p>Care note: prune in late winter.<br>Lift pots with help.</p>');
    expect(textToNotesHtml('<script>alert(1)</script>')).toBe('<p>&lt;script&gt;alert(1)&lt;/script&gt;</p>');
  });

  it('plain text becomes escaped paragraphs, and back', () => {
    const text = 'Spring leaves: red on one, lime on the other.\nLook in April.\n\n<Both> weep & mound.';
    const html = textToNotesHtml(text);
    expect(html).toBe('<p>Spring leaves: red on one, lime on the other.<br>Look in April.</p><p>&lt;Both&gt; weep &amp; mound.</p>');
    expect(notesHtmlToText(html)).toBe(text);
    expect(textToNotesHtml('  \n\n ')).toBe('');
  });

  it('rich notes written elsewhere come back as readable blocks, list items as bullets', () => {
    expect(notesHtmlToText('<p><strong>Bark</strong> is the tell.</p><ul><li>green</li><li>grey</li></ul>')).toBe('Bark is the tell.\n\n• green\n• grey');
    expect(notesHtmlToText('<p>&#8220;Crane&#x201D;&nbsp;red</p>')).toBe('“Crane” red');
    // Read by the HTML parser (WHATWG HTML), not by pattern: a ">" inside an attribute is no tag end.
    expect(notesHtmlToText('<p><a href="/x" title="5 > 3">five</a> lobes</p>')).toBe('five lobes');
  });
});
