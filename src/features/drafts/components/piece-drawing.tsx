import { memo } from 'react';
import type { EdgeName, Piece } from '@shared/engine';
import { EDGE_HIGHLIGHT, PATTERN_INK, PIECE_TINTS } from '../lib/edge-names';

export interface PieceDrawingProps {
  piece: Piece;
  /** Offset of the piece on the canvas, mm. */
  dx: number;
  dy: number;
  /** Overlaid pieces are drawn see-through so both outlines read. */
  translucent: boolean;
  highlightEdge: EdgeName | null;
  interactive: boolean;
  onEdgeHover: (pieceId: string, edge: EdgeName | null) => void;
}

/**
 * One piece in pattern space (mm), as the trade draws it: the cutting line solid over a light
 * tint, the stitching line dashed, notches as short ticks. Strokes keep their screen width at
 * any zoom. Each edge also gets a wide invisible stroke to hover or tap for its length.
 */
export const PieceDrawing = memo(function PieceDrawing({ piece, dx, dy, translucent, highlightEdge, interactive, onEdgeHover }: PieceDrawingProps) {
  const highlighted = highlightEdge ? piece.edges.find((e) => e.name === highlightEdge) : undefined;
  return (
    <g transform={dx || dy ? `translate(${dx} ${dy})` : undefined} data-piece={piece.id}>
      <path
        d={piece.cutting.d}
        fill={PIECE_TINTS[piece.side]}
        fillOpacity={translucent ? 0.4 : 1}
        stroke={PATTERN_INK}
        strokeWidth={1.6}
        strokeLinejoin="round"
        vectorEffect="non-scaling-stroke"
      />
      <path d={piece.stitching.d} fill="none" stroke={PATTERN_INK} strokeWidth={1} strokeDasharray="6 4" vectorEffect="non-scaling-stroke" />
      {piece.notches.map((notch, i) => (
        <line
          key={i}
          x1={notch.at.x}
          y1={notch.at.y}
          x2={notch.at.x + notch.inward.x * notch.depth}
          y2={notch.at.y + notch.inward.y * notch.depth}
          stroke={PATTERN_INK}
          strokeWidth={1.6}
          vectorEffect="non-scaling-stroke"
        />
      ))}
      {highlighted && (
        <path d={highlighted.d} fill="none" stroke={EDGE_HIGHLIGHT} strokeWidth={4} strokeLinecap="round" vectorEffect="non-scaling-stroke" />
      )}
      {interactive &&
        piece.edges.map((edge) => (
          <path
            key={edge.name}
            d={edge.d}
            fill="none"
            stroke="transparent"
            strokeWidth={18}
            vectorEffect="non-scaling-stroke"
            pointerEvents="stroke"
            data-piece-id={piece.id}
            data-edge={edge.name}
            className="cursor-help"
            onPointerEnter={(e) => e.pointerType === 'mouse' && onEdgeHover(piece.id, edge.name)}
            onPointerLeave={(e) => e.pointerType === 'mouse' && onEdgeHover(piece.id, null)}
          />
        ))}
    </g>
  );
});
