/** Saving what the dialog made as a file the browser downloads. */

/** Hands a blob to the browser as a download named `fileName`. */
export function blobDownload(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  // Some browsers read the URL after the click returns: free it a little later.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** Lower-case words joined by hyphens, letters and digits only: safe on every file system. */
export function fileSlug(text: string): string {
  const s = text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return s.slice(0, 60).replace(/-+$/, '');
}

/** "scoop-tank-marisol-venn-tiles-a4.pdf": the same pattern as the server's PDF route. */
export function printFileName(style: string, client: string, kind: string, paper: string, extension: 'pdf' | 'svg' = 'pdf'): string {
  const parts = [fileSlug(style) || 'draft', fileSlug(client), kind, fileSlug(paper)].filter(Boolean);
  return `${parts.join('-')}.${extension}`;
}

/** "2 December 2026": the date written on page 1, in the words the server's documents use. */
export function printDate(now: Date): string {
  return new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric' }).format(now);
}
