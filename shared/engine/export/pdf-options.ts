/**
 * What a caller may ask of the PDF writer, checked with zod so that every bad option comes
 * back as a message naming its field. Lengths in mm.
 */
import { z } from 'zod';
import { MAX_OVERLAP_MM, MIN_MARGIN_MM, MIN_OVERLAP_MM, SHEET_PAPER_IDS, TILE_PAPER_IDS, type PaperId } from '../layout/tiling-paper';

/** The three documents Knitwright prints. */
export const PDF_KINDS = ['tiles', 'sheet', 'ticket'] as const;
export type PdfKind = (typeof PDF_KINDS)[number];

/** Papers each kind of document may use; the first is the default. */
export const PAPERS_FOR_KIND: Readonly<Record<PdfKind, readonly PaperId[]>> = {
  tiles: TILE_PAPER_IDS,
  sheet: SHEET_PAPER_IDS,
  ticket: ['letter', 'a4'],
};

const ALL_PAPERS = [...TILE_PAPER_IDS, ...SHEET_PAPER_IDS] as [PaperId, ...PaperId[]];

const text = (label: string, max: number) =>
  z.string({ error: `${label} must be text` }).trim().max(max, { error: `${label} must be at most ${max} characters` });

/** Who and what the document is for; the date is a string the caller formats (no clock in the engine). */
export const pdfMetaSchema = z.strictObject(
  {
    client: text('Client', 120).optional(),
    style: text('Style', 120).optional(),
    date: text('Date', 40).optional(),
    fabric: text('Fabric', 120).optional(),
    studio: text('Studio', 120).optional(),
  },
  { error: (issue) => (issue.code === 'unrecognized_keys' ? `Unknown meta field: ${issue.keys.join(', ')}` : 'meta must be an object') },
);

/** Options of a PDF document. */
export const pdfOptionsSchema = z
  .strictObject(
    {
      kind: z.enum(PDF_KINDS, { error: 'Kind must be "tiles", "sheet" or "ticket"' }).default('tiles'),
      paper: z.enum(ALL_PAPERS, { error: `Paper must be one of ${ALL_PAPERS.join(', ')}` }).optional(),
      orientation: z.enum(['auto', 'portrait', 'landscape'], { error: 'Orientation must be "auto", "portrait" or "landscape"' }).default('auto'),
      overlapMm: z
        .number({ error: 'Overlap must be a number of mm' })
        .min(MIN_OVERLAP_MM, { error: 'Overlap must be at least 1/4 in (6.35 mm)' })
        .max(MAX_OVERLAP_MM, { error: `Overlap must be at most ${MAX_OVERLAP_MM} mm` })
        .optional(),
      marginMm: z
        .number({ error: 'Margin must be a number of mm' })
        .min(MIN_MARGIN_MM, { error: 'Margin must be at least 1/4 in (6.35 mm): printers cannot print closer to the edge' })
        .max(30, { error: 'Margin must be at most 30 mm' })
        .optional(),
      pieceIds: z.array(z.string(), { error: 'Pieces must be a list of piece ids' }).min(1, { error: 'Choose at least one piece to print' }).optional(),
      unit: z.enum(['in', 'cm', 'mm'], { error: 'Unit must be "in", "cm" or "mm"' }).optional(),
      meta: pdfMetaSchema.default({}),
    },
    { error: (issue) => (issue.code === 'unrecognized_keys' ? `Unknown option: ${issue.keys.join(', ')}` : 'PDF options must be an object') },
  )
  .superRefine((options, ctx) => {
    const allowed = PAPERS_FOR_KIND[options.kind];
    if (options.paper && !allowed.includes(options.paper)) {
      ctx.addIssue({ code: 'custom', path: ['paper'], message: `Paper for ${options.kind} must be one of ${allowed.join(', ')}` });
    }
  })
  .transform((options) => ({ ...options, paper: options.paper ?? (PAPERS_FOR_KIND[options.kind][0] as PaperId) }));

/** Options as the caller gives them. */
export type PdfOptionsInput = z.input<typeof pdfOptionsSchema>;
/** Options after checking, defaults filled in. */
export type PdfOptions = z.output<typeof pdfOptionsSchema>;
export type PdfMeta = z.output<typeof pdfMetaSchema>;
