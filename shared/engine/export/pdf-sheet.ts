/**
 * Writes the wide sheet for a copy shop into a jsPDF document as the sheet plan says: every
 * piece at full size, its texts, the title lines and the test squares. Advanced API, pt.
 */
import type { jsPDF } from 'jspdf';
import type { SheetLayout } from '../layout/tiling-sheet';
import type { PlacedText } from '../layout/tiling-types';
import type { Piece } from '../types';
import { INK, textDraw } from './pdf-draw';
import { furnitureDraw } from './pdf-furniture';
import { patternDraw } from './pdf-pattern';

/** What the sheet writer draws. */
export interface SheetDrawing {
  layout: SheetLayout;
  pieces: readonly Piece[];
  /** Texts on the pieces, canvas frame. */
  texts: readonly PlacedText[];
  titleLines: readonly string[];
}

/** Writes the sheet on the current page of `doc`, which must have the plan's sheet size. */
export function pdfSheetWrite(doc: jsPDF, drawing: SheetDrawing): void {
  const { plan, canvas } = drawing.layout;
  doc.advancedAPI((d) => {
    patternDraw(d, drawing.pieces, canvas.items, plan.canvasAt);
    for (const text of drawing.texts) textDraw(d, text, text.role === 'piece-title', plan.canvasAt, INK);
    furnitureDraw(d, plan.furniture, drawing.titleLines);
  });
}
