/**
 * The cutter's ticket: one Letter or A4 page with everything needed to cut and finish
 * without asking. Two columns (figures on the left; the fold layout drawn to scale and the
 * cutting steps on the right), then the finishing steps and the safety cautions across the
 * page. The type shrinks until everything fits on the one page. Advanced API, pt.
 */
import type { jsPDF } from 'jspdf';
import type { LengthUnit } from '../../units';
import { PAPER_SIZES, PT_PER_MM } from '../layout/tiling-paper';
import type { Draft, Piece } from '../types';
import { INK, PENS, penSet, pt, polylineAdd } from './pdf-draw';
import type { PdfMeta } from './pdf-options';
import { ticketContent, type TicketContent, type TicketSection } from './pdf-ticket-content';
import { foldLayoutDraw, foldLayoutHeight } from './pdf-ticket-fold';

/** Margin of the ticket, mm: 1/2 in, well inside what printers reach (common practice). */
export const TICKET_MARGIN_MM = 12.7;
/** Type sizes tried, largest first, pt. */
const TYPE_SIZES_PT = [9, 8.5, 8, 7.5, 7, 6.5, 6];
/** Height of the fold-layout drawing, mm. */
const FOLD_DRAWING_MM = 100;
const GUTTER_MM = 7;
const QUIET_INK = '#555555';

/** Options of the ticket. */
export interface TicketOptions {
  paper: 'letter' | 'a4';
  unit: LengthUnit;
  meta: PdfMeta;
  pieces?: readonly Piece[];
}

interface Flow {
  doc: jsPDF;
  size: number;
  draw: boolean;
}

function lineHeight(sizePt: number): number {
  return (sizePt * 1.28) / PT_PER_MM;
}

function wrap(flow: Flow, text: string, widthMm: number, bold = false, size = flow.size): string[] {
  flow.doc.setFont('helvetica', bold ? 'bold' : 'normal');
  flow.doc.setFontSize(size);
  return flow.doc.splitTextToSize(text, pt(widthMm)) as string[];
}

function say(flow: Flow, lines: readonly string[], x: number, y: number, opts: { bold?: boolean; size?: number; color?: string } = {}): number {
  const size = opts.size ?? flow.size;
  const step = lineHeight(size);
  if (flow.draw) {
    flow.doc.setFont('helvetica', opts.bold ? 'bold' : 'normal');
    flow.doc.setFontSize(size);
    flow.doc.setTextColor(opts.color ?? INK);
    lines.forEach((line, i) => flow.doc.text(line, pt(x), pt(y + (i + 0.78) * step)));
  }
  return lines.length * step;
}

function sectionFlow(flow: Flow, section: TicketSection, x: number, width: number, y: number): number {
  let cursor = y;
  cursor += say(flow, [section.heading], x, cursor, { bold: true, size: flow.size + 1 });
  if (flow.draw) {
    penSet(flow.doc, PENS.hairline);
    polylineAdd(flow.doc, [{ x, y: cursor + 0.3 }, { x: x + width, y: cursor + 0.3 }], false);
    flow.doc.stroke();
  }
  cursor += 1.2;
  const labelWidth = width * 0.38;
  for (const [label, value] of section.rows ?? []) {
    const labelLines = wrap(flow, label, labelWidth - 2, false);
    const valueLines = wrap(flow, value, width - labelWidth, true);
    say(flow, labelLines, x, cursor, { color: QUIET_INK });
    const used = Math.max(labelLines.length, valueLines.length) * lineHeight(flow.size);
    say(flow, valueLines, x + labelWidth, cursor, { bold: true });
    cursor += used + 0.6;
  }
  (section.lines ?? []).forEach((line, i) => {
    const indent = section.numbered ? 4.5 : 3;
    const lines = wrap(flow, line, width - indent);
    say(flow, [section.numbered ? `${i + 1}.` : '-'], x, cursor, { bold: Boolean(section.numbered) });
    cursor += say(flow, lines, x + indent, cursor) + 0.6;
  });
  return cursor + 2.5 - y;
}

function ticketFlow(flow: Flow, content: TicketContent, draft: Draft, paper: 'letter' | 'a4', unit: LengthUnit): number {
  const page = PAPER_SIZES[paper];
  const left = TICKET_MARGIN_MM;
  const width = page.widthMm - 2 * TICKET_MARGIN_MM;
  let y = TICKET_MARGIN_MM;
  y += say(flow, wrap(flow, content.title, width, true, 15), left, y, { bold: true, size: 15 });
  y += say(flow, [content.subtitle], left, y, { color: QUIET_INK, size: flow.size });
  y += 3;
  const leftWidth = (width - GUTTER_MM) * 0.54;
  const rightX = left + leftWidth + GUTTER_MM;
  const rightWidth = width - leftWidth - GUTTER_MM;
  let leftY = y;
  for (const section of content.left) leftY += sectionFlow(flow, section, left, leftWidth, leftY);
  let rightY = y;
  rightY += say(flow, [content.layoutCaption], rightX, rightY, { bold: true, size: flow.size + 1 });
  rightY += 1.5;
  const drawingBox = { x: rightX, y: rightY, width: rightWidth, height: FOLD_DRAWING_MM };
  rightY += (flow.draw ? foldLayoutDraw(flow.doc, draft, drawingBox, unit) : foldLayoutHeight(draft, drawingBox)) + 3;
  for (const section of content.right) rightY += sectionFlow(flow, section, rightX, rightWidth, rightY);
  y = Math.max(leftY, rightY);
  for (const section of content.bottom) y += sectionFlow(flow, section, left, width, y);
  return y;
}

/** Writes the ticket for `draft` on the current page of `doc` (the paper's size, portrait). */
export function pdfTicketWrite(doc: jsPDF, draft: Draft, options: TicketOptions): void {
  const content = ticketContent(draft, options.unit, options.meta, options.pieces);
  const bottom = PAPER_SIZES[options.paper].heightMm! - TICKET_MARGIN_MM;
  doc.advancedAPI((d) => {
    let size = TYPE_SIZES_PT[TYPE_SIZES_PT.length - 1]!;
    for (const candidate of TYPE_SIZES_PT) {
      if (ticketFlow({ doc: d, size: candidate, draw: false }, content, draft, options.paper, options.unit) <= bottom) {
        size = candidate;
        break;
      }
    }
    ticketFlow({ doc: d, size, draw: true }, content, draft, options.paper, options.unit);
  });
}
