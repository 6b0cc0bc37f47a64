/**
 * The print dialog's choices and how they become the engine's PDF options. Lengths typed in the
 * display unit ("1/2 in", "1.5 cm") are read with the shared length parser and checked with the
 * engine's pdfOptionsSchema, so the dialog refuses exactly what the PDF writer would refuse.
 */
import { PAPERS_FOR_KIND, pdfOptionsSchema, type PdfKind, type PdfOptions } from '@shared/engine/export/pdf-options';
import { DEFAULT_OVERLAP_MM, PAPER_SIZES, type PaperId } from '@shared/engine/layout/tiling-paper';
import { lengthFormat, lengthParse } from '@shared/units';
import type { DisplayUnit } from '@/lib/unit';

export type PrintOrientation = 'auto' | 'portrait' | 'landscape';

/** What the person has chosen in the dialog; `overlap` is the text as typed. */
export interface PrintSettings {
  kind: PdfKind;
  paper: PaperId;
  orientation: PrintOrientation;
  overlap: string;
  pieceIds: string[];
}

/** Who and what the document is for, written on page 1 and the ticket. */
export interface PrintMeta {
  client?: string;
  style?: string;
  date?: string;
  fabric?: string;
  studio?: string;
}

export const KIND_CHOICES: readonly { kind: PdfKind; label: string; hint: string }[] = [
  { kind: 'tiles', label: 'Tiled pages', hint: 'For a home printer: pages to trim and tape together.' },
  { kind: 'sheet', label: 'Wide sheet', hint: 'For a copy shop: every piece on one large sheet.' },
  { kind: 'ticket', label: 'Cutting ticket', hint: 'One page for the cutter: pieces, layout, strips, steps.' },
];

export const ORIENTATION_CHOICES: readonly { value: PrintOrientation; label: string }[] = [
  { value: 'auto', label: 'Fewest pages' },
  { value: 'portrait', label: 'Portrait' },
  { value: 'landscape', label: 'Landscape' },
];

const inches = (mm: number) => lengthFormat(mm, 'in', { withUnit: false });

/** "Letter, 8 1/2 × 11 in", "A4, 210 × 297 mm", "36 in roll, as long as needed". */
export function paperLabel(id: PaperId): string {
  const p = PAPER_SIZES[id];
  if (p.heightMm === null) return `${p.name}, as long as needed`;
  if (p.standard === 'ANSI') return `${p.name}, ${inches(p.widthMm)} × ${inches(p.heightMm)} in`;
  return `${p.name}, ${Math.round(p.widthMm)} × ${Math.round(p.heightMm)} mm`;
}

/** The paper a kind starts with: the studio's paper for tiles when it is one of them, else the kind's first. */
export function paperDefault(kind: PdfKind, studioPaper: string | undefined): PaperId {
  const papers = PAPERS_FOR_KIND[kind];
  if (kind === 'ticket' && studioPaper === 'a4') return 'a4';
  const found = papers.find((p) => p === studioPaper);
  return found ?? (papers[0] as PaperId);
}

/** The overlap the dialog starts with, written in the display unit ("1/2 in", "1.3 cm"). */
export function overlapDefault(unit: DisplayUnit): string {
  return lengthFormat(DEFAULT_OVERLAP_MM, unit);
}

export function settingsDefault(kind: PdfKind, studioPaper: string | undefined, unit: DisplayUnit, pieceIds: string[]): PrintSettings {
  return { kind, paper: paperDefault(kind, studioPaper), orientation: 'auto', overlap: overlapDefault(unit), pieceIds };
}

/** The settings of another kind: the paper moves to one that kind takes, the rest is kept. */
export function settingsForKind(settings: PrintSettings, kind: PdfKind, studioPaper: string | undefined): PrintSettings {
  const paper = PAPERS_FOR_KIND[kind].includes(settings.paper) ? settings.paper : paperDefault(kind, studioPaper);
  return { ...settings, kind, paper };
}

/** Field messages keyed by the dialog's fields: kind, paper, orientation, overlap, pieceIds. */
export type PrintFieldErrors = Partial<Record<'kind' | 'paper' | 'orientation' | 'overlap' | 'pieceIds' | 'options', string>>;

export type PrintOptionsResult = { ok: true; options: PdfOptions } | { ok: false; fields: PrintFieldErrors };

/** The engine's options for these settings, or the messages naming what to fix. */
export function printOptions(settings: PrintSettings, unit: DisplayUnit, meta: PrintMeta): PrintOptionsResult {
  const fields: PrintFieldErrors = {};
  let overlapMm: number | undefined;
  if (settings.kind === 'tiles') {
    const read = lengthParse(settings.overlap, unit);
    if (read.ok) overlapMm = read.mm;
    else fields.overlap = `Overlap: ${read.reason}`;
  }
  const parsed = pdfOptionsSchema.safeParse({
    kind: settings.kind,
    paper: settings.paper,
    orientation: settings.orientation,
    overlapMm,
    // An empty choice goes to the schema, whose message says to choose a piece.
    pieceIds: settings.pieceIds,
    unit,
    meta,
  });
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const head = String(issue.path[0] ?? 'options');
      const key = head === 'overlapMm' ? 'overlap' : head;
      const field = (['kind', 'paper', 'orientation', 'overlap', 'pieceIds'].includes(key) ? key : 'options') as keyof PrintFieldErrors;
      fields[field] ??= issue.message;
    }
  }
  if (!parsed.success || Object.keys(fields).length > 0) return { ok: false, fields };
  return { ok: true, options: parsed.data };
}
