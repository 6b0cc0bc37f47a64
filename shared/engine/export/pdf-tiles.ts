/**
 * Writes a tiled print into a jsPDF document exactly as the tile plan says. The pattern's
 * lines are drawn once into a form XObject (ISO 32000-1, 8.10) that every tile paints
 * through a clip of its printable area; texts are written per tile. Advanced API, pt.
 */
import type { jsPDF } from 'jspdf';
import { rectInflate, rectsIntersect } from '../layout/tiling-geometry';
import type { CanvasLayout, PlacedText, TilePage, TilePlan } from '../layout/tiling-types';
import type { Piece } from '../types';
import { clipToRect, INK, lineStroke, PENS, penSet, polylineAdd, pt, textDraw } from './pdf-draw';
import { furnitureDraw } from './pdf-furniture';
import { patternDraw } from './pdf-pattern';

/** Key of the pattern's form XObject. */
const PATTERN_FORM = 'knitwright-pattern';
/** Room around the canvas inside the form's bounding box, mm. */
const FORM_PADDING_MM = 10;
/** Grey of the page label, drawn under the pattern. */
const LABEL_INK = '#4d4d4d';
/** Fill of the match-mark diamonds. */
const MARK_FILL = '#808080';

/** What the tile writer draws. */
export interface TilesDrawing {
  plan: TilePlan;
  pieces: readonly Piece[];
  canvas: CanvasLayout;
  /** Texts on the pieces, canvas frame. */
  texts: readonly PlacedText[];
  /** Lines of page 1's title block, in order. */
  titleLines: readonly string[];
  /**
   * Draw the pattern into one reusable form object (default). `false` draws the same paths
   * again on every page: the baseline the benchmark compares against.
   */
  reuse?: boolean;
}

function pageSize(plan: TilePlan): [number, number] {
  return [pt(plan.sheet.widthMm), pt(plan.sheet.heightMm)];
}

function marksDraw(doc: jsPDF, page: TilePage): void {
  for (const guide of page.guides) {
    penSet(doc, guide.kind === 'trim' ? PENS.trim : PENS.join);
    lineStroke(doc, guide.from, guide.to);
  }
  penSet(doc, PENS.hairline);
  for (const mark of page.marks) {
    const { centre: c, halfSize: h } = mark;
    polylineAdd(doc, [{ x: c.x, y: c.y - h }, { x: c.x + h, y: c.y }, { x: c.x, y: c.y + h }, { x: c.x - h, y: c.y }], true);
    doc.setFillColor(MARK_FILL);
    doc.fillStroke();
  }
  for (const text of page.texts) {
    if (text.role === 'page-label') textDraw(doc, text, true, undefined, LABEL_INK);
    else if (text.role === 'page-number') textDraw(doc, text, false, undefined, LABEL_INK);
    else textDraw(doc, text, false);
  }
}

/** The pattern as it falls on one tile: the lines clipped to the printable area, then the texts. */
function patternOnPage(doc: jsPDF, drawing: TilesDrawing, page: TilePage): void {
  const shift = { x: page.printable.x - page.region.x, y: page.printable.y - page.region.y };
  doc.saveGraphicsState();
  clipToRect(doc, page.printable);
  if (drawing.reuse === false) {
    patternDraw(doc, drawing.pieces, drawing.canvas.items, shift);
  } else {
    doc.doFormObject(PATTERN_FORM, doc.Matrix(1, 0, 0, 1, pt(shift.x), pt(shift.y)));
  }
  for (const text of drawing.texts) {
    if (!rectsIntersect(text.box, page.region)) continue;
    textDraw(doc, text, text.role === 'piece-title', shift, INK);
  }
  doc.restoreGraphicsState();
}

/**
 * Writes the tiles into `doc`, whose first page must already have the plan's sheet size and
 * orientation: a cover page first when the plan has one, then one page per printed tile.
 */
export function pdfTilesWrite(doc: jsPDF, drawing: TilesDrawing): void {
  const { plan } = drawing;
  doc.advancedAPI((d) => {
    if (drawing.reuse === false) return;
    const box = rectInflate(drawing.canvas.bounds, FORM_PADDING_MM);
    d.beginFormObject(pt(box.x), pt(box.y), pt(box.width), pt(box.height), d.unitMatrix);
    patternDraw(d, drawing.pieces, drawing.canvas.items);
    d.endFormObject(PATTERN_FORM);
  });
  const tiles = { plan, canvas: drawing.canvas };
  let first = true;
  const nextPage = (): void => {
    if (!first) doc.addPage(pageSize(plan), plan.orientation);
    first = false;
  };
  if (plan.cover) {
    nextPage();
    doc.advancedAPI((d) => furnitureDraw(d, plan.furniture, drawing.titleLines, tiles));
  }
  for (const page of plan.pages) {
    nextPage();
    doc.advancedAPI((d) => {
      marksDraw(d, page);
      patternOnPage(d, drawing, page);
      if (plan.furniture.page === page.label) furnitureDraw(d, plan.furniture, drawing.titleLines, tiles);
    });
  }
}
