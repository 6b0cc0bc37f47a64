/**
 * Drawing primitives for the PDF writers, on a jsPDF document in its advanced API with
 * points as the unit: every length given in mm (paper or canvas frame, y down) is turned
 * into points (1 mm = 72/25.4 pt, ISO 32000-1, 8.3.2.3) here and nowhere else.
 */
import type { jsPDF } from 'jspdf';
import { PT_PER_MM } from '../layout/tiling-paper';
import type { PlacedText, Rect } from '../layout/tiling-types';
import type { Point, Segment } from '../types';

/** A pen: line width in mm, colour as #rrggbb, an optional dash (on, off) in mm. */
export interface Pen {
  widthMm: number;
  color: string;
  dashMm?: readonly [number, number];
}

/** Black: every line the cutter follows is printed in it. */
export const INK = '#000000';
/** Pens of the pattern and page marks (widths after common practice for printed patterns). */
export const PENS = {
  cutting: { widthMm: 0.5, color: INK },
  stitching: { widthMm: 0.25, color: INK, dashMm: [3, 2] },
  mark: { widthMm: 0.35, color: INK },
  notch: { widthMm: 0.5, color: INK },
  trim: { widthMm: 0.25, color: INK, dashMm: [4, 2] },
  join: { widthMm: 0.2, color: '#555555', dashMm: [1, 1.5] },
  grid: { widthMm: 0.2, color: '#555555' },
  hairline: { widthMm: 0.15, color: INK },
} satisfies Record<string, Pen>;

/** mm → pt. */
export function pt(mm: number): number {
  return mm * PT_PER_MM;
}

/** Sets the line width, colour and dash for the next strokes. */
export function penSet(doc: jsPDF, pen: Pen): void {
  doc.setLineWidth(pt(pen.widthMm));
  doc.setDrawColor(pen.color);
  doc.setLineDashPattern(pen.dashMm ? [pt(pen.dashMm[0]), pt(pen.dashMm[1])] : [], 0);
}

/** Adds a polyline (mm, moved by `offset`) to the current path; `close` closes it. */
export function polylineAdd(doc: jsPDF, points: readonly Point[], close: boolean, offset: Point = { x: 0, y: 0 }, scale = 1): void {
  const first = points[0];
  if (!first) return;
  doc.moveTo(pt(offset.x + first.x * scale), pt(offset.y + first.y * scale));
  for (let i = 1; i < points.length; i++) {
    const p = points[i] as Point;
    doc.lineTo(pt(offset.x + p.x * scale), pt(offset.y + p.y * scale));
  }
  if (close) doc.close();
}

/** Adds a chain of line and cubic segments (mm, moved by `offset`) to the current path. */
export function segmentsAdd(doc: jsPDF, segments: readonly Segment[], close: boolean, offset: Point): void {
  const first = segments[0];
  if (!first) return;
  const x = (p: Point): number => pt(p.x + offset.x);
  const y = (p: Point): number => pt(p.y + offset.y);
  doc.moveTo(x(first.from), y(first.from));
  for (const s of segments) {
    if (s.kind === 'line') doc.lineTo(x(s.to), y(s.to));
    else doc.curveTo(x(s.c1), y(s.c1), x(s.c2), y(s.c2), x(s.to), y(s.to));
  }
  if (close) doc.close();
}

/** Strokes a straight line from a to b (mm). */
export function lineStroke(doc: jsPDF, a: Point, b: Point): void {
  doc.moveTo(pt(a.x), pt(a.y));
  doc.lineTo(pt(b.x), pt(b.y));
  doc.stroke();
}

/** Adds a rectangle (mm) to the current path. */
export function rectAdd(doc: jsPDF, rect: Rect): void {
  polylineAdd(doc, [
    { x: rect.x, y: rect.y },
    { x: rect.x + rect.width, y: rect.y },
    { x: rect.x + rect.width, y: rect.y + rect.height },
    { x: rect.x, y: rect.y + rect.height },
  ], true);
}

/** Fills a triangle arrow head with its tip at `tip`, pointing away from `from`, `size` mm long. */
export function arrowHeadFill(doc: jsPDF, tip: Point, from: Point, size: number): void {
  const length = Math.hypot(tip.x - from.x, tip.y - from.y) || 1;
  const ux = (tip.x - from.x) / length;
  const uy = (tip.y - from.y) / length;
  const half = size * 0.45;
  polylineAdd(doc, [
    { x: tip.x - ux * size - uy * half, y: tip.y - uy * size + ux * half },
    tip,
    { x: tip.x - ux * size + uy * half, y: tip.y - uy * size - ux * half },
  ], true);
  doc.setFillColor(INK);
  doc.fill();
}

/** Writes a placed text in Helvetica (`bold` for titles), moved by `offset` (mm). */
export function textDraw(doc: jsPDF, text: PlacedText, bold = false, offset: Point = { x: 0, y: 0 }, color = INK): void {
  doc.setFont('helvetica', bold ? 'bold' : 'normal');
  doc.setFontSize(text.sizePt);
  doc.setTextColor(color);
  const x = pt(text.at.x + offset.x);
  const y = pt(text.at.y + offset.y);
  if (text.rotation === 90) doc.text(text.text, x, y, { angle: 90 });
  else doc.text(text.text, x, y);
}

/** Clips what follows (until the graphics state is restored) to a rectangle (mm). */
export function clipToRect(doc: jsPDF, rect: Rect): void {
  rectAdd(doc, rect);
  doc.clip();
  doc.discardPath();
}
