import { jsPDF } from 'jspdf';
import { draft as engineDraft } from '../../shared/engine/index.js';
import { pdfBytes, pdfDocumentBuild } from '../../shared/engine/export/pdf-document.js';
import { PAPERS_FOR_KIND, type PdfKind } from '../../shared/engine/export/pdf-options.js';
import type { Orientation, PaperId } from '../../shared/engine/layout/tiling-paper.js';
import { Invalid, NotFound } from '../lib/errors.js';
import { dateWords } from '../mail/compose.js';
import { Client, DraftRevision, Fabric, Studio, Style, type Draft } from '../models/index.js';
import type { ServiceContext } from './context.js';
import { draftFind } from './draft-view.js';

/** What to print of a draft; the paper and the rest are checked by the engine's pdfOptionsSchema. */
export interface DraftPdfRequest {
  kind: PdfKind;
  /** Default: the first paper the kind takes (Letter for tiles and the ticket, the 36 in roll for a sheet). */
  paper?: PaperId | string;
  orientation?: Orientation | 'auto';
  /** Overlap between neighbouring tiles, mm. */
  overlapMm?: number;
  /** Piece ids to print; default every piece. */
  pieceIds?: string[];
  /** "YYYY-MM-DD" written on page 1; default today by the server's clock. */
  today?: string;
  /** False leaves the client's name off (for a copy shop). Default true. */
  withClientName?: boolean;
}

export interface DraftPdf {
  bytes: Buffer;
  /** A file name any system accepts: "scoop-tank-marisol-venn-tiles-letter.pdf". */
  fileName: string;
  pageCount: number;
  clientId: number;
  clientName: string;
  styleName: string;
}

/** Longest name written in the document's title lines (the engine's meta limit). */
const META_TEXT_MAX = 120;

/** "Racer-back tank, Maren Holt" → "racer-back-tank-maren-holt": a file name any system accepts. */
export function slug(text: string): string {
  const s = text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return s.slice(0, 60).replace(/-+$/, '') || 'draft';
}

/**
 * The revision whose stored engine input is printed: the approved one once a draft is approved
 * (so the paper matches what the owner approved), the newest while it is being drafted.
 */
function printedRevisionNumber(draft: Draft): number {
  return draft.state !== 'drafting' && draft.approvedRevision !== null ? draft.approvedRevision : draft.revision;
}

function todayIso(): string {
  return new Date().toISOString().slice(0, 10);
}

/**
 * The PDF of a draft, built in Node by the same engine and PDF writer the print dialog uses in
 * the browser: tiled pages, the wide sheet or the cutter's ticket. Same access as reading the
 * draft (another studio's draft is not found). Lengths on the ticket are in the studio's unit.
 * Options the engine refuses, or a layout that cannot be printed, are a 400 naming the option.
 */
export function draftPdfBuild(c: ServiceContext, draftId: number, options: DraftPdfRequest): Promise<DraftPdf> {
  return build(c, draftId, options);
}

async function build(c: ServiceContext, draftId: number, request: DraftPdfRequest): Promise<DraftPdf> {
  const draft = await draftFind(c, draftId);
  const number = printedRevisionNumber(draft);
  const revision = await DraftRevision.findOne({ where: { studioId: c.studioId, draftId: draft.id, number } });
  if (!revision) throw new NotFound('revision');
  const [client, style, fabric, studio] = await Promise.all([
    Client.findOne({ where: { id: draft.clientId, studioId: c.studioId }, attributes: ['name'] }),
    Style.findOne({ where: { id: draft.styleId, studioId: c.studioId }, attributes: ['name'] }),
    Fabric.findOne({ where: { id: draft.fabricId, studioId: c.studioId }, attributes: ['name'] }),
    Studio.findByPk(c.studioId, { attributes: ['name'] }),
  ]);
  const drafted = engineDraft(revision.input);
  if (!drafted.ok) {
    throw new Invalid(
      'The engine cannot draw this revision any more: open the draft, reopen it if approved, and save it again.',
      Object.fromEntries(drafted.errors.map((e) => [e.path || '_', e.message])),
    );
  }
  const withClientName = request.withClientName ?? true;
  const clientName = client?.name ?? 'client';
  const styleName = style?.name ?? 'Draft';
  const clip = (s: string | undefined) => s?.slice(0, META_TEXT_MAX);
  const built = pdfDocumentBuild(jsPDF, drafted.draft, {
    kind: request.kind,
    paper: request.paper,
    orientation: request.orientation,
    overlapMm: request.overlapMm,
    pieceIds: request.pieceIds,
    unit: c.unit,
    meta: {
      client: withClientName ? clip(clientName) : undefined,
      style: clip(styleName),
      date: dateWords(request.today ?? todayIso()),
      fabric: clip(fabric?.name),
      studio: clip(studio?.name),
    },
  });
  if (!built.ok) {
    throw new Invalid('This document cannot be printed with these settings.', Object.fromEntries(built.errors.map((e) => [e.path || 'options', e.message])));
  }
  const who = withClientName ? slug(clientName) : `draft-${draft.id}`;
  const paperId = built.tiles?.paper ?? built.sheet?.paper ?? request.paper ?? PAPERS_FOR_KIND[request.kind][0] ?? '';
  const fileName = `${slug(styleName)}-${who}-${request.kind}-${slug(String(paperId))}.pdf`;
  return {
    bytes: Buffer.from(pdfBytes(built.doc)),
    fileName,
    pageCount: built.pageCount,
    clientId: draft.clientId,
    clientName,
    styleName,
  };
}

