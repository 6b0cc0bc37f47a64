/**
 * Builds a whole PDF from a draft and print options: tiled pages for a home printer, one
 * wide sheet for a copy shop, or the cutter's one-page ticket. The jsPDF constructor comes
 * from the caller (Node or browser), so the engine stays free of I/O. Pages are in points;
 * coordinates are written to 0.01 pt (0.0035 mm), finer than the 0.01 mm a pattern needs.
 */
import type { jsPDF, jsPDFOptions } from 'jspdf';
import { styleFind } from '../drafting/styles';
import { PAPER_SIZES } from '../layout/tiling-paper';
import { draftSheetPlan, draftTilesPlan, piecesChoose } from '../layout/tiling-draft';
import { PrintLayoutError } from '../layout/tiling-place';
import type { SheetPlan, TilePlan } from '../layout/tiling-types';
import type { Draft, FieldError } from '../types';
import { pt } from './pdf-draw';
import { pdfOptionsSchema, type PdfKind, type PdfOptions } from './pdf-options';
import { pdfSheetWrite } from './pdf-sheet';
import { pdfTicketWrite } from './pdf-ticket';
import { pdfTilesWrite } from './pdf-tiles';

/** A jsPDF constructor: `jsPDF` from 'jspdf', in Node or in the browser. */
export type JsPdfConstructor = new (options?: jsPDFOptions) => jsPDF;

/**
 * Document settings: points, compressed streams (Flate, ISO 32000-1, 7.4.4), numbers to
 * 2 decimals (0.01 pt = 0.0035 mm), only the fonts used.
 */
export const PDF_BASE_OPTIONS = { unit: 'pt', compress: true, floatPrecision: 2, putOnlyUsedFonts: true } as const;

/** Number of title lines on page 1 of a tiled print and of a sheet. */
const TILE_TITLE_LINES = 6;
const SHEET_TITLE_LINES = 4;
/** Most blank page labels listed by name on page 1. */
const BLANK_LIST_MAX = 8;

/** A built document, or the fields that prevent it. */
export type PdfBuildResult =
  | { ok: true; doc: jsPDF; kind: PdfKind; pageCount: number; tiles: TilePlan | null; sheet: SheetPlan | null }
  | { ok: false; errors: FieldError[] };

function headline(draft: Draft, options: PdfOptions): string {
  const style = options.meta.style ?? styleFind(draft.style).name;
  return options.meta.client ? `${style} for ${options.meta.client}` : style;
}

function tileTitleLines(draft: Draft, options: PdfOptions, plan: TilePlan): string[] {
  const when = options.meta.date ? `${options.meta.date} · ` : '';
  const paper = `${PAPER_SIZES[plan.paper].name} ${plan.orientation}`;
  const blank = plan.blank.length === 0
    ? 'Every page of the grid is printed.'
    : plan.blank.length <= BLANK_LIST_MAX
      ? `Left out, nothing on them: ${plan.blank.join(', ')} (grey on the map).`
      : `${plan.blank.length} pages left out, nothing on them (grey on the map).`;
  return [
    headline(draft, options),
    `${when}${paper} · ${plan.pageCount} pages, ${plan.rows} rows of ${plan.cols}`,
    'Print at 100 % (actual size), never "fit to page".',
    'Measure both squares before printing every page.',
    'Trim along the dashed lines, match the diamonds.',
    blank,
  ];
}

function sheetTitleLines(draft: Draft, options: PdfOptions, plan: SheetPlan): string[] {
  const when = options.meta.date ? `${options.meta.date} · ` : '';
  return [
    headline(draft, options),
    `${when}${PAPER_SIZES[plan.paper].name}, ${Math.round(plan.sheet.widthMm)} × ${Math.round(plan.sheet.heightMm)} mm`,
    'Print at 100 % (actual size), never "fit to page".',
    'Measure both squares after printing.',
  ];
}

function docMake(JsPdf: JsPdfConstructor, widthMm: number, heightMm: number): jsPDF {
  const orientation = widthMm > heightMm ? 'landscape' : 'portrait';
  return new JsPdf({ ...PDF_BASE_OPTIONS, format: [pt(widthMm), pt(heightMm)], orientation });
}

function build(JsPdf: JsPdfConstructor, draft: Draft, options: PdfOptions): PdfBuildResult {
  const choice = { pieceIds: options.pieceIds, extraLines: options.meta.client ? [options.meta.client] : [] };
  let doc: jsPDF;
  let tiles: TilePlan | null = null;
  let sheet: SheetPlan | null = null;
  if (options.kind === 'tiles') {
    const laid = draftTilesPlan(draft, {
      ...choice,
      paper: options.paper as TilePlan['paper'],
      orientation: options.orientation,
      marginMm: options.marginMm,
      overlapMm: options.overlapMm,
      titleLineCount: TILE_TITLE_LINES,
    });
    tiles = laid.plan;
    doc = docMake(JsPdf, tiles.sheet.widthMm, tiles.sheet.heightMm);
    pdfTilesWrite(doc, { ...laid, titleLines: tileTitleLines(draft, options, tiles) });
  } else if (options.kind === 'sheet') {
    const laid = draftSheetPlan(draft, {
      ...choice,
      paper: options.paper as SheetPlan['paper'],
      orientation: options.orientation,
      marginMm: options.marginMm,
      titleLineCount: SHEET_TITLE_LINES,
    });
    sheet = laid.layout.plan;
    doc = docMake(JsPdf, sheet.sheet.widthMm, sheet.sheet.heightMm);
    pdfSheetWrite(doc, { ...laid, titleLines: sheetTitleLines(draft, options, sheet) });
  } else {
    const paper = PAPER_SIZES[options.paper];
    doc = docMake(JsPdf, paper.widthMm, paper.heightMm ?? paper.widthMm);
    const pieces = piecesChoose(draft, options.pieceIds);
    pdfTicketWrite(doc, draft, { paper: options.paper as 'letter' | 'a4', unit: options.unit ?? draft.unit, meta: options.meta, pieces });
  }
  doc.viewerPreferences({ PrintScaling: 'None' });
  doc.setProperties({ title: `${headline(draft, options)} (${options.kind})`, creator: 'Knitwright', subject: 'Knitwright pattern' });
  return { ok: true, doc, kind: options.kind, pageCount: doc.getNumberOfPages(), tiles, sheet };
}

/**
 * Builds the document `rawOptions` asks for (checked with {@link pdfOptionsSchema}) from
 * `draft`, using the caller's jsPDF constructor. Bad options and layouts that cannot be
 * printed come back as field errors ("paper", "overlapMm", "pieceIds", …).
 */
export function pdfDocumentBuild(JsPdf: JsPdfConstructor, draft: Draft, rawOptions: unknown): PdfBuildResult {
  const parsed = pdfOptionsSchema.safeParse(rawOptions ?? {});
  if (!parsed.success) {
    return { ok: false, errors: parsed.error.issues.map((issue) => ({ path: issue.path.join('.') || 'options', message: issue.message })) };
  }
  try {
    return build(JsPdf, draft, parsed.data);
  } catch (error) {
    if (error instanceof PrintLayoutError) return { ok: false, errors: [{ path: error.field, message: error.message.replace(/^[^:]+: /, '') }] };
    throw error;
  }
}

/** The document's bytes. */
export function pdfBytes(doc: jsPDF): Uint8Array {
  return new Uint8Array(doc.output('arraybuffer'));
}
