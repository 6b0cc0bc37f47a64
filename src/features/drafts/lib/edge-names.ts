import type { EdgeName, PieceSide } from '@shared/engine';

/** Edge names in the trade's words, for tooltips and the edge table. */
export const EDGE_LABELS: Record<EdgeName, string> = {
  fold: 'Centre fold',
  shoulder: 'Shoulder seam',
  neck: 'Neckline',
  armhole: 'Armhole',
  side: 'Side seam',
  hem: 'Hem',
};

/**
 * Light tints that tell front from back at a glance, always beside the piece's label (never
 * colour alone); neither is the accent, which marks the selection.
 */
export const PIECE_TINTS: Record<PieceSide, string> = { front: '#e9eef5', back: '#f4ecdf', other: '#efefef' };

/** The pattern's ink: near-black lines and text. */
export const PATTERN_INK = '#1d1f1e';

/** A highlighted (hovered, tapped or chosen in the table) edge: the selection colour. */
export const EDGE_HIGHLIGHT = '#1f6f66';

/** Which edge of which piece is highlighted. */
export interface EdgeRef {
  pieceId: string;
  edge: EdgeName;
}

export function edgeRefEqual(a: EdgeRef | null, b: EdgeRef | null): boolean {
  return a === b || (a !== null && b !== null && a.pieceId === b.pieceId && a.edge === b.edge);
}
