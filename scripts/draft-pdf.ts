/**
 * The PDF part of the draft command line: `--pdf out.pdf [--paper letter|a4|legal|a3|tabloid|
 * roll36|a0] [--kind tiles|sheet|ticket] [--orientation auto|portrait|landscape]
 * [--overlap "1/2 in"] [--client NAME] [--date TEXT] [--fabric TEXT]`.
 * scripts/draft.ts spreads DRAFT_PDF_ARG_OPTIONS into its parseArgs options and calls
 * draftPdfWrite with the parsed values once it has a draft.
 */
import { writeFile } from 'node:fs/promises';
import { pdfBytes, pdfDocumentBuild } from '../shared/engine/export/pdf-document';
import type { Draft, FieldError } from '../shared/engine/types';
import { lengthParse } from '../shared/units';

/** node:util parseArgs options for the PDF flags. */
export const DRAFT_PDF_ARG_OPTIONS = {
  pdf: { type: 'string' },
  paper: { type: 'string' },
  kind: { type: 'string' },
  orientation: { type: 'string' },
  overlap: { type: 'string' },
  client: { type: 'string' },
  date: { type: 'string' },
  fabric: { type: 'string' },
} as const;

/** The PDF flags as parseArgs returns them. */
export interface DraftPdfArgs {
  pdf?: string;
  paper?: string;
  kind?: string;
  orientation?: string;
  overlap?: string;
  client?: string;
  date?: string;
  fabric?: string;
}

/** Usage lines of the PDF flags. */
export const DRAFT_PDF_USAGE =
  '  [--pdf out.pdf [--kind tiles|sheet|ticket] [--paper letter|a4|legal|a3|tabloid|roll36|a0]\n' +
  '   [--orientation auto|portrait|landscape] [--overlap "1/2 in"] [--client NAME] [--date TEXT] [--fabric TEXT]]';

/** The PDF flags among every parsed flag (only the string ones count). */
export function draftPdfArgsPick(values: Record<string, unknown>): DraftPdfArgs {
  const args: DraftPdfArgs = {};
  for (const key of Object.keys(DRAFT_PDF_ARG_OPTIONS) as (keyof DraftPdfArgs)[]) {
    const value = values[key];
    if (typeof value === 'string') args[key] = value;
  }
  return args;
}

/** The flag that sets each PDF option, for messages. */
const FLAG_FOR_OPTION: Record<string, string> = { overlapMm: 'overlap', 'meta.client': 'client', 'meta.date': 'date', 'meta.fabric': 'fabric' };

/** What happened: the file written and its page count, or the field errors (nothing written). */
export type DraftPdfResult = { ok: true; path: string; pageCount: number; bytes: number } | { ok: false; errors: FieldError[] };

/** Turns the flags into PDF options (lengths typed in the draft's unit or with their own). */
export function draftPdfOptions(draft: Draft, args: DraftPdfArgs): { options: Record<string, unknown>; errors: FieldError[] } {
  const errors: FieldError[] = [];
  const options: Record<string, unknown> = {};
  if (args.kind !== undefined) options.kind = args.kind;
  if (args.paper !== undefined) options.paper = args.paper.toLowerCase();
  if (args.orientation !== undefined) options.orientation = args.orientation;
  if (args.overlap !== undefined) {
    const overlap = lengthParse(args.overlap, draft.unit);
    if (overlap.ok) options.overlapMm = overlap.mm;
    else errors.push({ path: 'overlap', message: `Overlap: ${overlap.reason}` });
  }
  const meta: Record<string, string> = {};
  if (args.client) meta.client = args.client;
  if (args.date) meta.date = args.date;
  if (args.fabric) meta.fabric = args.fabric;
  options.meta = meta;
  return { options, errors };
}

/** Writes the PDF the flags ask for to `args.pdf`. */
export async function draftPdfWrite(draft: Draft, args: DraftPdfArgs): Promise<DraftPdfResult> {
  if (!args.pdf) return { ok: false, errors: [{ path: 'pdf', message: 'Give the file to write with --pdf out.pdf' }] };
  const { options, errors } = draftPdfOptions(draft, args);
  if (errors.length > 0) return { ok: false, errors };
  // jspdf is loaded only when a PDF is asked for
  const { jsPDF } = await import('jspdf');
  const built = pdfDocumentBuild(jsPDF, draft, options);
  if (!built.ok) return { ok: false, errors: built.errors.map((e) => ({ ...e, path: FLAG_FOR_OPTION[e.path] ?? e.path })) };
  const bytes = pdfBytes(built.doc);
  await writeFile(args.pdf, bytes);
  return { ok: true, path: args.pdf, pageCount: built.pageCount, bytes: bytes.byteLength };
}
