// Plain text of a sanitised description for search matching and snippets. Outside source: HTML
// Living Standard named character references (&amp; & , &lt; < , &gt; > , &quot; " ; &nbsp;, a no-break space, is read as a space)
// and numeric references (&#233; and &#xE9; are é).
import { describe, expect, it } from 'vitest';
import { htmlToText } from '../../../server/modules/search/html-text';

describe('htmlToText', () => {
  it('drops tags, keeps words on both sides of block tags apart, joins inline tags', () => {
    expect(htmlToText('<p>First</p><p>second <strong>bo</strong>ld <a href="https://example.org/x">link</a></p>')).toBe('First second bold link');
    expect(htmlToText('one<br>two<li>three</li>')).toBe('one two three');
  });
  it('decodes character references (HTML Living Standard)', () => {
    expect(htmlToText('Tom &amp; Jerry &lt;3 &quot;x&quot; caf&#233; caf&#xE9; a&nbsp;b &#39;q&#39;')).toBe('Tom & Jerry <3 "x" café café a b \'q\'');
    expect(htmlToText('&bogus; &#0;')).toBe('&bogus; &#0;');
  });
  it('never lets attribute text through', () => {
    expect(htmlToText('<img alt="gatehouse" src="gate.jpg"><span title="hidden">seen</span>')).toBe('seen');
  });
});
