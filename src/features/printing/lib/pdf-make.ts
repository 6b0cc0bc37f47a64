/**
 * Makes a PDF in the browser. jsPDF (and the PDF writer that drives it) is loaded here by a
 * dynamic import, only when someone prints: it never weighs on the first load or the workspace.
 */
import type { Draft } from '@shared/engine';
import type { PdfOptions } from '@shared/engine/export/pdf-options';
import type { PrintFieldErrors } from './print-settings';

/** The steps the progress indicator shows, in order. */
export const PDF_STAGES = ['load', 'draw', 'save'] as const;
export type PdfStage = (typeof PDF_STAGES)[number];

export const STAGE_WORDS: Record<PdfStage, string> = {
  load: 'Loading the PDF writer…',
  draw: 'Drawing the pages…',
  save: 'Packing the file…',
};

export type PdfMakeResult = { ok: true; blob: Blob; pageCount: number } | { ok: false; fields: PrintFieldErrors };

/** Lets the browser paint the progress before the next synchronous step. */
const paint = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

/** Builds the document `options` describe; `onStage` hears each step as it starts. */
export async function pdfMake(draft: Draft, options: PdfOptions, onStage: (stage: PdfStage) => void): Promise<PdfMakeResult> {
  onStage('load');
  const [{ jsPDF }, writer] = await Promise.all([import('jspdf'), import('@shared/engine/export/pdf-document')]);
  onStage('draw');
  await paint();
  const built = writer.pdfDocumentBuild(jsPDF, draft, options);
  if (!built.ok) {
    const fields: PrintFieldErrors = {};
    for (const e of built.errors) {
      const key = e.path === 'overlapMm' ? 'overlap' : e.path;
      fields[(['kind', 'paper', 'orientation', 'overlap', 'pieceIds'].includes(key) ? key : 'options') as keyof PrintFieldErrors] ??= e.message;
    }
    return { ok: false, fields };
  }
  onStage('save');
  await paint();
  const bytes = writer.pdfBytes(built.doc);
  return { ok: true, blob: new Blob([bytes as BlobPart], { type: 'application/pdf' }), pageCount: built.pageCount };
}
