/**
 * The pattern's lines on the print canvas, drawn into a jsPDF document (advanced API, pt):
 * solid cutting line, dashed stitching line, notches as short ticks, the fold bracket with
 * arrows to the fold, the grainline arrow (trade conventions, common practice). Lines only:
 * the texts are written per page (see pdf-tiles), so the pattern can live in a form
 * XObject that needs no resources.
 */
import type { jsPDF } from 'jspdf';
import { foldBracket, GRAIN_ARROW_MM } from '../layout/tiling-pieces';
import type { ArrangedItem } from '../layout/tiling-types';
import type { Piece, Point } from '../types';
import { arrowHeadFill, lineStroke, PENS, penSet, polylineAdd, segmentsAdd } from './pdf-draw';

/** Gap left between the fold bracket's ends and the fold line, mm. */
const BRACKET_FOLD_GAP_MM = 0.6;
/** Length of the fold bracket's arrow heads, mm. */
const BRACKET_ARROW_MM = 4;

function pieceDraw(doc: jsPDF, piece: Piece, offset: Point): void {
  penSet(doc, PENS.cutting);
  doc.setLineJoin('round');
  segmentsAdd(doc, piece.cutting.segments, true, offset);
  doc.stroke();

  penSet(doc, PENS.stitching);
  segmentsAdd(doc, piece.stitching.segments, true, offset);
  doc.stroke();

  penSet(doc, PENS.notch);
  for (const notch of piece.notches) {
    const at = { x: notch.at.x + offset.x, y: notch.at.y + offset.y };
    lineStroke(doc, at, { x: at.x + notch.inward.x * notch.depth, y: at.y + notch.inward.y * notch.depth });
  }

  penSet(doc, PENS.mark);
  if (piece.fold) {
    const bracket = foldBracket(piece.fold);
    const x0 = offset.x + BRACKET_FOLD_GAP_MM;
    const x1 = offset.x + bracket.reach;
    const top = offset.y + bracket.top;
    const bottom = offset.y + bracket.bottom;
    polylineAdd(doc, [
      { x: x0 + BRACKET_ARROW_MM * 0.5, y: top },
      { x: x1, y: top },
      { x: x1, y: bottom },
      { x: x0 + BRACKET_ARROW_MM * 0.5, y: bottom },
    ], false);
    doc.stroke();
    arrowHeadFill(doc, { x: offset.x + BRACKET_FOLD_GAP_MM / 2, y: top }, { x: x1, y: top }, BRACKET_ARROW_MM);
    arrowHeadFill(doc, { x: offset.x + BRACKET_FOLD_GAP_MM / 2, y: bottom }, { x: x1, y: bottom }, BRACKET_ARROW_MM);
  }
  const from = { x: piece.grainline.from.x + offset.x, y: piece.grainline.from.y + offset.y };
  const to = { x: piece.grainline.to.x + offset.x, y: piece.grainline.to.y + offset.y };
  lineStroke(doc, from, to);
  arrowHeadFill(doc, from, to, GRAIN_ARROW_MM);
  arrowHeadFill(doc, to, from, GRAIN_ARROW_MM);
}

/**
 * Draws the lines of every arranged piece at its place on the canvas (canvas mm, y down),
 * moved by `shift` (mm). Pieces missing from `pieces` are skipped.
 */
export function patternDraw(doc: jsPDF, pieces: readonly Piece[], items: readonly ArrangedItem[], shift: Point = { x: 0, y: 0 }): void {
  for (const item of items) {
    const piece = pieces.find((p) => p.id === item.id);
    if (piece) pieceDraw(doc, piece, { x: item.offset.x + shift.x, y: item.offset.y + shift.y });
  }
}
