import { draftToSvg, type Draft } from '@shared/engine';

/** Saves the draft's pieces as a true-size SVG file (1 user unit = 1 mm), for any SVG tool or plotter. */
export function svgDownload(draft: Draft, title: string, fileName: string): void {
  const svg = draftToSvg(draft, { title });
  const url = URL.createObjectURL(new Blob([svg], { type: 'image/svg+xml' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** A file name from the client and style: "mina-okafor-scoop-tank-rev3.svg". */
export function svgFileName(parts: string[], revision: number): string {
  const slug = parts
    .join(' ')
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');
  return `${slug || 'draft'}-rev${revision}.svg`;
}
