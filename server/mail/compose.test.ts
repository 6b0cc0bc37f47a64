import { describe, expect, it } from 'vitest';
import { dateTimeWords, dateWords, htmlEscape, mailCompose } from './compose';

describe('mailCompose', () => {
  const content = {
    greeting: 'Hello <Ada>,',
    paragraphs: ['Your "fitting" & more.'],
    note: 'Line one\n<b>not bold</b>',
    table: { caption: 'Measurements', rows: [['Bust girth', '36 in'] as [string, string]] },
    action: { label: 'Open it', url: 'https://studio.example/invitations/abc?x=1&y="2"' },
    signature: 'Purl & Pin <Atelier>',
  };

  it('escapes every piece of text in the HTML part (HTML Living Standard, "Escaping a string")', () => {
    const { html } = mailCompose(content);
    expect(html).toContain('Hello &lt;Ada&gt;,');
    expect(html).toContain('Your &quot;fitting&quot; &amp; more.');
    expect(html).toContain('&lt;b&gt;not bold&lt;/b&gt;');
    expect(html).toContain('— Purl &amp; Pin &lt;Atelier&gt;');
    expect(html).toContain('href="https://studio.example/invitations/abc?x=1&amp;y=&quot;2&quot;"');
    expect(html).not.toMatch(/<img|<script|src=/i);
  });

  it('says the same in the text part, with the link written out and the note quoted', () => {
    const { text } = mailCompose(content);
    expect(text).toContain('Open it:\nhttps://studio.example/invitations/abc?x=1&y="2"');
    expect(text).toContain('> Line one\n> <b>not bold</b>');
    expect(text).toMatch(/Measurements\n {2}Bust girth {2}36 in/);
    expect(text.trimEnd().endsWith('--\nPurl & Pin <Atelier>')).toBe(true);
  });

  it('escapes the five characters that matter in content and attributes', () => {
    expect(htmlEscape(`<a href='x'>"&"</a>`)).toBe('&lt;a href=&#39;x&#39;&gt;&quot;&amp;&quot;&lt;/a&gt;');
  });
});

describe('dates in messages', () => {
  it('writes times in UTC so every reader sees the same', () => {
    expect(dateTimeWords(new Date(Date.UTC(2026, 2, 14, 10, 32)))).toBe('14 March 2026, 10:32 UTC');
    expect(dateWords('2026-03-14')).toBe('14 March 2026');
  });
});
