/**
 * A draft's pieces laid out for printing: the canvas, the texts on the pieces, and the tile
 * or sheet plan. Needs no PDF library, so a print dialog can preview the page grid and count
 * the pages before jsPDF is loaded.
 */
import type { Draft, Piece } from '../types';
import { PIECE_GAP_MM, printArrange } from './tiling-arrange';
import { canvasTexts, printItemFromPiece } from './tiling-pieces';
import { PrintLayoutError } from './tiling-place';
import { sheetPlan, type SheetLayout, type SheetOptions } from './tiling-sheet';
import type { CanvasLayout, PlacedText, TilePlan } from './tiling-types';
import { tilesPlan, type TilingOptions } from './tiling';

/** Which pieces to print and the extra lines written on each (e.g. the client's name). */
export interface DraftPrintChoice {
  pieceIds?: readonly string[];
  extraLines?: readonly string[];
}

/** The tiled print of a draft. */
export interface DraftTiles {
  pieces: Piece[];
  canvas: CanvasLayout;
  texts: PlacedText[];
  plan: TilePlan;
}

/** The wide sheet of a draft. */
export interface DraftSheet {
  pieces: Piece[];
  layout: SheetLayout;
  texts: PlacedText[];
}

/** The chosen pieces in the chosen order; throws a PrintLayoutError naming `pieceIds` for an unknown id. */
export function piecesChoose(draft: Draft, pieceIds?: readonly string[]): Piece[] {
  if (!pieceIds) return draft.pieces;
  const unknown = pieceIds.filter((id) => !draft.pieces.some((p) => p.id === id));
  if (unknown.length > 0) throw new PrintLayoutError('pieceIds', `no such piece in this draft: ${unknown.join(', ')}`);
  if (pieceIds.length === 0) throw new PrintLayoutError('pieceIds', 'choose at least one piece to print');
  return pieceIds.map((id) => draft.pieces.find((p) => p.id === id)!);
}

/** Gaps between pieces tried when tiling, widest first, mm: a narrower gap may save a column of pages. */
export const TILE_PIECE_GAPS_MM = [PIECE_GAP_MM, 10];

/**
 * Lays a draft's pieces side by side and plans its tiles (see {@link tilesPlan}). Of the
 * gaps in {@link TILE_PIECE_GAPS_MM} the one needing fewer pages wins, the wider on a tie.
 */
export function draftTilesPlan(draft: Draft, options: TilingOptions & DraftPrintChoice): DraftTiles {
  const pieces = piecesChoose(draft, options.pieceIds);
  const extraLines = options.extraLines ?? [];
  const items = pieces.map((piece) => printItemFromPiece(piece, extraLines));
  let best: { canvas: CanvasLayout; plan: TilePlan } | null = null;
  for (const gapMm of TILE_PIECE_GAPS_MM) {
    const canvas = printArrange(items, { gapMm });
    const plan = tilesPlan(canvas, options);
    if (!best || plan.pageCount < best.plan.pageCount) best = { canvas, plan };
    if (items.length < 2) break;
  }
  const { canvas, plan } = best!;
  return { pieces, canvas, plan, texts: canvasTexts(pieces, canvas.items, extraLines) };
}

/** Lays a draft's pieces on one wide sheet (see {@link sheetPlan}). */
export function draftSheetPlan(draft: Draft, options: SheetOptions & DraftPrintChoice): DraftSheet {
  const pieces = piecesChoose(draft, options.pieceIds);
  const extraLines = options.extraLines ?? [];
  const layout = sheetPlan(pieces.map((piece) => printItemFromPiece(piece, extraLines)), options);
  return { pieces, layout, texts: canvasTexts(pieces, layout.canvas.items, extraLines) };
}
