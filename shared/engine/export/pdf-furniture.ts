/**
 * Page 1's furniture drawn where the layout put it: title lines, the 2 in and 5 cm test
 * squares with their sizes beside them, and the assembly map (the tile grid over a small
 * drawing of the pieces, pages left out greyed). Paper frame, mm, advanced API.
 */
import type { jsPDF } from 'jspdf';
import { textPlace } from '../layout/tiling-marks';
import type { CanvasLayout, Furniture, TilePlan } from '../layout/tiling-types';
import type { Point } from '../types';
import { INK, PENS, penSet, polylineAdd, rectAdd, textDraw } from './pdf-draw';

/** Fill of the test squares: a light grey whose edges a ruler finds easily. */
const SQUARE_FILL = '#c8c8c8';
/** Fill of the cells of pages left out on the map. */
const BLANK_FILL = '#e4e4e4';
/** Grey of texts that matter less. */
const QUIET_INK = '#777777';
/** Type size of the captions of the test squares, pt. */
const CAPTION_SIZE_PT = 9;

function mapDraw(doc: jsPDF, furniture: Furniture, plan: TilePlan, canvas: CanvasLayout): void {
  const map = furniture.map;
  if (!map) return;
  const toMap = (p: Point): Point => ({
    x: map.origin.x + (p.x - plan.gridOrigin.x) * map.scale,
    y: map.origin.y + (p.y - plan.gridOrigin.y) * map.scale,
  });
  const cellW = plan.step.x * map.scale;
  const cellH = plan.step.y * map.scale;
  const overlap = plan.overlapMm * map.scale;
  for (const cell of plan.cells) {
    // each cell shows its own step; the last row and column also carry the final overlap
    const x = map.origin.x + cell.col * cellW;
    const y = map.origin.y + cell.row * cellH;
    const w = cellW + (cell.col === plan.cols - 1 ? overlap : 0);
    const h = cellH + (cell.row === plan.rows - 1 ? overlap : 0);
    if (cell.blank) {
      rectAdd(doc, { x, y, width: w, height: h });
      doc.setFillColor(BLANK_FILL);
      doc.fill();
    }
  }
  penSet(doc, PENS.hairline);
  for (const outline of canvas.outlines) {
    polylineAdd(doc, outline.map(toMap), true);
    doc.stroke();
  }
  penSet(doc, PENS.grid);
  rectAdd(doc, map.rect);
  doc.stroke();
  for (let col = 1; col < plan.cols; col++) {
    polylineAdd(doc, [{ x: map.origin.x + col * cellW, y: map.rect.y }, { x: map.origin.x + col * cellW, y: map.rect.y + map.rect.height }], false);
    doc.stroke();
  }
  for (let row = 1; row < plan.rows; row++) {
    polylineAdd(doc, [{ x: map.rect.x, y: map.origin.y + row * cellH }, { x: map.rect.x + map.rect.width, y: map.origin.y + row * cellH }], false);
    doc.stroke();
  }
  const sizePt = Math.max(5, Math.min(9, (Math.min(cellW, cellH) / 3) * 2.83));
  for (const cell of plan.cells) {
    const at = { x: map.origin.x + cell.col * cellW + 1.2, y: map.origin.y + cell.row * cellH + 1.2 + sizePt * 0.28 };
    textDraw(doc, textPlace('page-label', cell.label, sizePt, at), !cell.blank, { x: 0, y: 0 }, cell.blank ? QUIET_INK : INK);
  }
}

/**
 * Draws the furniture: `titleLines` (the first in bold) at the layout's baselines, the test
 * squares, and the map when the plan and canvas of a tiled print are given.
 */
export function furnitureDraw(doc: jsPDF, furniture: Furniture, titleLines: readonly string[], tiles?: { plan: TilePlan; canvas: CanvasLayout }): void {
  furniture.titleLines.forEach((at, i) => {
    const line = titleLines[i];
    if (line) textDraw(doc, textPlace('page-label', line, furniture.titleSizePt, at), i === 0);
  });
  for (const square of furniture.squares) {
    rectAdd(doc, square.rect);
    doc.setFillColor(SQUARE_FILL);
    doc.fill();
    textDraw(doc, textPlace('page-label', `${square.caption} square`, CAPTION_SIZE_PT, square.captionAt));
  }
  if (tiles) mapDraw(doc, furniture, tiles.plan, tiles.canvas);
}
