/**
 * A draft's pieces as the print layout sees them: cutting outlines, the boxes of their marks
 * (fold bracket, grainline, label) and the text printed on them, placed on the canvas. The
 * marks follow the trade's conventions (common practice): fold bracket with arrows to the
 * fold and "place on fold", grainline arrow, piece name and "cut N" on the piece. mm.
 */
import type { MarkLine, Piece, Point } from '../types';
import { rectAroundPoints, rectUnion } from './tiling-geometry';
import { textBox, textPlace } from './tiling-marks';
import { PT_PER_MM } from './tiling-paper';
import type { ArrangedItem, PlacedText, PrintItem, Rect } from './tiling-types';

/** How far the fold bracket reaches into the piece, mm. */
export const FOLD_BRACKET_REACH_MM = 12;
/** Share of the fold line left free above and below the bracket. */
export const FOLD_BRACKET_INSET = 0.2;
/** Half-width of the grainline's arrow heads, mm. */
export const GRAIN_ARROW_MM = 5;
/** Type sizes of the piece title, the label lines and the fold note, pt. */
export const PIECE_TITLE_SIZE_PT = 26;
export const PIECE_LINE_SIZE_PT = 14;
export const FOLD_NOTE_SIZE_PT = 13;
/** Distance from the title's baseline to the first line's, and between lines, mm. */
const FIRST_LINE_DROP_MM = 9;
const LINE_STEP_MM = 6.5;
/** Distance of the fold note's baseline beyond the bracket, mm. */
const FOLD_NOTE_GAP_MM = 5;

/** The fold bracket: where it meets the fold and how far it reaches in, own frame, mm. */
export interface FoldBracket {
  top: number;
  bottom: number;
  reach: number;
}

/** The fold bracket for a fold line. */
export function foldBracket(fold: MarkLine): FoldBracket {
  const length = fold.to.y - fold.from.y;
  return { top: fold.from.y + FOLD_BRACKET_INSET * length, bottom: fold.to.y - FOLD_BRACKET_INSET * length, reach: FOLD_BRACKET_REACH_MM };
}

/**
 * The texts printed on a piece, own frame (move them with {@link textsMove}): the title in
 * capitals, the label's lines, `extraLines` (e.g. the client) and "place on fold" read
 * upwards beside the fold bracket.
 */
export function pieceTexts(piece: Piece, extraLines: readonly string[] = []): PlacedText[] {
  const { at, title, lines } = piece.label;
  const texts: PlacedText[] = [textPlace('piece-title', title.toUpperCase(), PIECE_TITLE_SIZE_PT, at)];
  [...lines, ...extraLines].forEach((line, i) => {
    texts.push(textPlace('piece-line', line, PIECE_LINE_SIZE_PT, { x: at.x, y: at.y + FIRST_LINE_DROP_MM + i * LINE_STEP_MM }));
  });
  if (piece.fold) {
    const bracket = foldBracket(piece.fold);
    const note = 'place on fold';
    const length = textBox(note, FOLD_NOTE_SIZE_PT, { x: 0, y: 0 }, 90).height;
    const middle = (bracket.top + bracket.bottom) / 2;
    const x = bracket.reach + FOLD_NOTE_GAP_MM + (0.75 * FOLD_NOTE_SIZE_PT) / PT_PER_MM;
    texts.push(textPlace('fold-note', note, FOLD_NOTE_SIZE_PT, { x, y: middle + length / 2 }, 90));
  }
  return texts;
}

/** Texts moved by `offset` (own frame → canvas). */
export function textsMove(texts: readonly PlacedText[], offset: Point): PlacedText[] {
  return texts.map((text) => ({
    ...text,
    at: { x: text.at.x + offset.x, y: text.at.y + offset.y },
    box: { ...text.box, x: text.box.x + offset.x, y: text.box.y + offset.y },
  }));
}

function grainBox(grain: MarkLine): Rect {
  const around = rectAroundPoints([grain.from, grain.to])!;
  return { x: around.x - GRAIN_ARROW_MM, y: around.y - 1, width: around.width + 2 * GRAIN_ARROW_MM, height: around.height + 2 };
}

/** A piece as a print item: its cutting outline and the boxes of its marks and texts. */
export function printItemFromPiece(piece: Piece, extraLines: readonly string[] = []): PrintItem {
  const marks: Rect[] = [grainBox(piece.grainline), ...pieceTexts(piece, extraLines).map((text) => text.box)];
  if (piece.fold) {
    const bracket = foldBracket(piece.fold);
    marks.push({ x: 0, y: bracket.top - 3, width: bracket.reach + 1, height: bracket.bottom - bracket.top + 6 });
  }
  let extent: Rect = { x: piece.bounds.minX, y: piece.bounds.minY, width: piece.bounds.width, height: piece.bounds.height };
  for (const mark of marks) extent = rectUnion(extent, mark);
  return { id: piece.id, extent, outlines: [piece.cutting.polyline], marks };
}

/** Every text of the arranged pieces, canvas frame. */
export function canvasTexts(pieces: readonly Piece[], items: readonly ArrangedItem[], extraLines: readonly string[] = []): PlacedText[] {
  const texts: PlacedText[] = [];
  for (const item of items) {
    const piece = pieces.find((p) => p.id === item.id);
    if (piece) texts.push(...textsMove(pieceTexts(piece, extraLines), item.offset));
  }
  return texts;
}
