import type { Piece, Point } from '@shared/engine';
import { edgePointAt } from '@shared/engine';
import { PATTERN_INK, PIECE_TINTS } from '../lib/edge-names';
import { viewToScreen, type View } from '../lib/view-transform';

export interface PieceMarksProps {
  piece: Piece;
  dx: number;
  dy: number;
  view: View;
  /** Moves the label down, px (overlaid pieces share one anchor). */
  labelShift: number;
  /** Overlaid pieces share the fold and grainline: only one draws them. */
  showFoldAndGrain: boolean;
  /** Overlaid pieces name their necklines, the edge that tells them apart. */
  neckTag: boolean;
}

const TITLE_PX = 14;
const LINE_PX = 12;
const ARROW_PX = 7;
/** Average advance of Inter at 1 px font size, for placing labels without measuring text. */
const CHAR_EM = 0.56;

function arrow(tip: Point, from: Point): string {
  const length = Math.hypot(tip.x - from.x, tip.y - from.y) || 1;
  const ux = (tip.x - from.x) / length;
  const uy = (tip.y - from.y) / length;
  const bx = tip.x - ux * ARROW_PX;
  const by = tip.y - uy * ARROW_PX;
  return `M${bx - uy * ARROW_PX * 0.45} ${by + ux * ARROW_PX * 0.45}L${tip.x} ${tip.y}L${bx + uy * ARROW_PX * 0.45} ${by - ux * ARROW_PX * 0.45}Z`;
}

/**
 * The fold bracket: a line just inside the fold, its ends turned to the fold with arrows, and
 * "place on fold" between bracket and fold, kept clear of the grainline (`room` px away).
 */
function FoldBracket({ top, bottom, room }: { top: Point; bottom: Point; room: number }) {
  const length = bottom.y - top.y;
  const reach = Math.min(24, room - 6);
  if (length < 80 || reach < 8) return null;
  const y1 = top.y + 0.15 * length;
  const y2 = bottom.y - 0.15 * length;
  const x0 = top.x + 1.5;
  const x1 = top.x + reach;
  const middle = (y1 + y2) / 2;
  // Between bracket and fold when there is room, else just outside the fold.
  const textX = reach >= 18 ? top.x + reach / 2 + 4 : top.x - 5;
  return (
    <g>
      <path d={`M${x0 + ARROW_PX} ${y1}H${x1}V${y2}H${x0 + ARROW_PX}`} fill="none" stroke={PATTERN_INK} strokeWidth={1.2} />
      <path d={`${arrow({ x: x0, y: y1 }, { x: x1, y: y1 })}${arrow({ x: x0, y: y2 }, { x: x1, y: y2 })}`} fill={PATTERN_INK} />
      <text x={textX} y={middle} transform={`rotate(-90 ${textX} ${middle})`} textAnchor="middle" fontSize={10.5} fontWeight={600} letterSpacing="0.06em" fill={PATTERN_INK}>
        PLACE ON FOLD
      </text>
    </g>
  );
}

/**
 * The marks that must stay readable at any zoom, drawn in screen pixels over the piece:
 * grainline arrow, fold bracket with "place on fold", the piece's name and how to cut it.
 */
export function PieceMarks({ piece, dx, dy, view, labelShift, showFoldAndGrain, neckTag }: PieceMarksProps) {
  const at = (p: Point) => viewToScreen(view, { x: p.x + dx, y: p.y + dy });
  const grainFrom = at(piece.grainline.from);
  const grainTo = at(piece.grainline.to);
  const foldTop = piece.fold ? at(piece.fold.from) : null;
  const foldBottom = piece.fold ? at(piece.fold.to) : null;
  const lines = piece.label.lines.length > 0 ? piece.label.lines : [piece.cutNote];
  const widest = Math.max(piece.label.title.length * TITLE_PX * 1.1, ...lines.map((l) => l.length * LINE_PX)) * CHAR_EM;
  const anchor = at(piece.label.at);
  // Centred on the engine's anchor, but never over the grainline.
  const labelX = Math.max(anchor.x, Math.max(grainFrom.x, grainTo.x) + 10 + widest / 2);
  const labelY = anchor.y + labelShift;
  const neck = neckTag ? piece.edges.find((e) => e.name === 'neck') : undefined;
  const neckMid = neck ? edgePointAt(neck, neck.length * 0.5) : null;
  return (
    <g aria-hidden="true" pointerEvents="none">
      {showFoldAndGrain && (
        <>
          <line x1={grainFrom.x} y1={grainFrom.y} x2={grainTo.x} y2={grainTo.y} stroke={PATTERN_INK} strokeWidth={1.2} />
          <path d={`${arrow(grainFrom, grainTo)}${arrow(grainTo, grainFrom)}`} fill={PATTERN_INK} />
          {foldTop && foldBottom && <FoldBracket top={foldTop} bottom={foldBottom} room={Math.min(grainFrom.x, grainTo.x) - foldTop.x} />}
        </>
      )}
      {/* A halo in the piece's tint keeps the words readable where they cross a line. */}
      <g fill={PATTERN_INK} textAnchor="middle" stroke={PIECE_TINTS[piece.side]} strokeWidth={4} strokeLinejoin="round" paintOrder="stroke">
        <text x={labelX} y={labelY} fontSize={TITLE_PX} fontWeight={700} letterSpacing="0.04em">
          {piece.label.title.toUpperCase()}
        </text>
        {lines.map((line, i) => (
          <text key={i} x={labelX} y={labelY + TITLE_PX + 2 + i * (LINE_PX + 3)} fontSize={LINE_PX}>
            {line}
          </text>
        ))}
        {neckMid && (
          <text x={at(neckMid.point).x + 6} y={at(neckMid.point).y + 16} textAnchor="start" fontSize={11} fontStyle="italic">
            {piece.name.toLowerCase()} neckline
          </text>
        )}
      </g>
    </g>
  );
}

/** Height of a piece's label block, px: overlaid pieces stack their labels by it. */
export function labelBlockHeight(piece: Piece): number {
  const count = piece.label.lines.length > 0 ? piece.label.lines.length : 1;
  return TITLE_PX + 2 + count * (LINE_PX + 3) + 10;
}
