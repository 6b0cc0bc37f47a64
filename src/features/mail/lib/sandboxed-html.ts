/**
 * The HTML of a stored message, made ready for a sandboxed iframe's `srcdoc`: links open in a
 * new tab (the sandbox lets popups out but runs no script in the message itself).
 */
export function sandboxedHtml(html: string): string {
  const base = '<base target="_blank">';
  const head = /<head[^>]*>/i.exec(html);
  if (head) return html.slice(0, head.index + head[0].length) + base + html.slice(head.index + head[0].length);
  return base + html;
}
