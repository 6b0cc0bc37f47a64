/**
 * The shape of every message Knitwright sends: a plain-text part and an HTML part saying the
 * same. No images, no remote content, no tracked links: a link is written as itself. The HTML
 * is styled with presentational attributes, which every mail client shows and which the app's
 * sandboxed preview (under a strict Content-Security-Policy) shows too.
 */

/** Escapes text for HTML element content and double-quoted attributes. */
export function htmlEscape(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);
}

export interface MailContent {
  /** The first line, e.g. "Hello Suki,". */
  greeting: string;
  /** Paragraphs of plain text (no markup). */
  paragraphs: string[];
  /** A button-like link, written out in full in the text part. */
  action?: { label: string; url: string };
  /** A two-column table (label, value), e.g. measurements. */
  table?: { caption: string; rows: [string, string][] };
  /** A note from the sender, quoted as they wrote it. */
  note?: string;
  /** Paragraphs after the table and the action. */
  after?: string[];
  /** Who signs: the studio's name. */
  signature: string;
}

const FONT = 'face="Helvetica, Arial, sans-serif"';

function paragraphHtml(text: string): string {
  return `<p><font ${FONT}>${htmlEscape(text).replace(/\n/g, '<br>')}</font></p>`;
}

function tableHtml(table: NonNullable<MailContent['table']>): string {
  const rows = table.rows
    .map(([label, value]) => `<tr><th align="left" scope="row"><font ${FONT}>${htmlEscape(label)}</font></th><td align="right"><font ${FONT}>${htmlEscape(value)}</font></td></tr>`)
    .join('');
  return `<table border="1" cellpadding="6" cellspacing="0"><caption align="top"><font ${FONT}><b>${htmlEscape(table.caption)}</b></font></caption>${rows}</table>`;
}

function tableText(table: NonNullable<MailContent['table']>): string {
  const width = Math.max(...table.rows.map(([label]) => label.length), 0);
  return [table.caption, ...table.rows.map(([label, value]) => `  ${label.padEnd(width)}  ${value}`)].join('\n');
}

/** The text and HTML parts of one message. */
export function mailCompose(content: MailContent): { text: string; html: string } {
  const text: string[] = [content.greeting, '', ...content.paragraphs.flatMap((p) => [p, ''])];
  const html: string[] = [paragraphHtml(content.greeting), ...content.paragraphs.map(paragraphHtml)];
  if (content.note) {
    text.push(...content.note.split('\n').map((l) => `> ${l}`), '');
    html.push(`<blockquote><font ${FONT}>${htmlEscape(content.note).replace(/\n/g, '<br>')}</font></blockquote>`);
  }
  if (content.table) {
    text.push(tableText(content.table), '');
    html.push(tableHtml(content.table));
  }
  if (content.action) {
    text.push(`${content.action.label}:`, content.action.url, '');
    const url = htmlEscape(content.action.url);
    html.push(
      `<p><table cellpadding="12" cellspacing="0"><tr><td bgcolor="#1f6f66"><a href="${url}"><font ${FONT} color="#ffffff"><b>${htmlEscape(content.action.label)}</b></font></a></td></tr></table></p>`,
      paragraphHtml('If the button does not work, copy this address into your browser:'),
      `<p><font ${FONT}><a href="${url}">${url}</a></font></p>`,
    );
  }
  for (const p of content.after ?? []) {
    text.push(p, '');
    html.push(paragraphHtml(p));
  }
  text.push('--', content.signature);
  html.push(`<p><font ${FONT} color="#5d605c">— ${htmlEscape(content.signature)}</font></p>`);
  return {
    text: `${text.join('\n')}\n`,
    html: `<!doctype html><html><head><meta charset="utf-8"></head><body>${html.join('\n')}</body></html>`,
  };
}

/** "14 March 2026, 10:32 UTC": a time in a message, the same for every reader. */
export function dateTimeWords(date: Date): string {
  const day = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' }).format(date);
  const time = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', hour12: false, timeZone: 'UTC' }).format(date);
  return `${day}, ${time} UTC`;
}

/** "14 March 2026" for a calendar date written YYYY-MM-DD. */
export function dateWords(isoDate: string): string {
  const date = new Date(`${isoDate.slice(0, 10)}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) return isoDate;
  return new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' }).format(date);
}
