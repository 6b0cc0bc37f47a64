/**
 * Where each piece sits on the canvas: side by side (front, then back to its right) or overlaid
 * at the shoulder. Every piece is drafted in its own frame with the fold at x = 0 and the
 * shoulder line at y = 0, so overlaying is drawing both frames at the same origin.
 */
import type { Piece } from '@shared/engine';
import type { Rect } from './view-transform';

export type ArrangementMode = 'side-by-side' | 'overlaid';

export interface PlacedPiece {
  piece: Piece;
  /** Offset of the piece's frame on the canvas, mm. */
  dx: number;
  dy: number;
}

export interface Arrangement {
  placed: PlacedPiece[];
  bounds: Rect;
}

function sideRank(piece: Piece): number {
  return piece.side === 'back' ? 0 : piece.side === 'front' ? 1 : 2;
}

/** Space between pieces side by side, mm (room for the fold bracket and labels). */
export const PIECE_SPACING_MM = 60;

export function piecesArrange(pieces: readonly Piece[], mode: ArrangementMode): Arrangement {
  const placed: PlacedPiece[] = [];
  let cursor = 0;
  // Overlaid, the back goes underneath so the front's lines (its deeper neckline) stay on top.
  const order = mode === 'overlaid' ? [...pieces].sort((a, b) => sideRank(a) - sideRank(b)) : pieces;
  for (const piece of order) {
    if (mode === 'overlaid') {
      placed.push({ piece, dx: 0, dy: 0 });
      continue;
    }
    const dx = placed.length === 0 ? 0 : cursor + PIECE_SPACING_MM - piece.bounds.minX;
    placed.push({ piece, dx, dy: 0 });
    cursor = dx + piece.bounds.maxX;
  }
  const bounds: Rect = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
  for (const { piece, dx, dy } of placed) {
    bounds.minX = Math.min(bounds.minX, piece.bounds.minX + dx);
    bounds.minY = Math.min(bounds.minY, piece.bounds.minY + dy);
    bounds.maxX = Math.max(bounds.maxX, piece.bounds.maxX + dx);
    bounds.maxY = Math.max(bounds.maxY, piece.bounds.maxY + dy);
  }
  if (placed.length === 0) return { placed, bounds: { minX: 0, minY: 0, maxX: 1, maxY: 1 } };
  return { placed, bounds };
}
