import type { FoldLayout, Piece } from '@shared/engine';
import { lengthFormat, type LengthUnit } from '@shared/units';
import { PATTERN_INK, PIECE_TINTS } from '../lib/edge-names';

export interface FoldLayoutMiniProps {
  layout: FoldLayout;
  pieces: Piece[];
  unit: LengthUnit;
}

const MAX_W_PX = 200;
const MAX_H_PX = 220;

/**
 * The fold layout drawn small: the folded fabric with its fold on the left and the pieces'
 * cutting lines where they lie (pieces cut together drawn over each other).
 */
export function FoldLayoutMini({ layout, pieces, unit }: FoldLayoutMiniProps) {
  const used = Math.max(1, ...layout.placements.map((p) => p.x + p.width));
  const folded = layout.fabricWidth !== null ? Math.max(used, layout.fabricWidth / layout.layers) : used * 1.1;
  const length = Math.max(1, layout.lengthNeeded);
  const scale = Math.min(MAX_W_PX / folded, MAX_H_PX / length);
  const w = folded * scale;
  const h = length * scale;
  const byId = new Map(pieces.map((p) => [p.id, p]));
  return (
    <svg width={w + 44} height={h + 22} role="img" aria-label={`Fold layout: ${layout.steps[0] ?? 'the pieces do not fit the fabric width'}`} className="max-w-full">
      <g transform="translate(22 2)">
        <rect x={0} y={0} width={w} height={h} fill="#fbfaf8" stroke="#bdb8ad" strokeDasharray={layout.fabricWidth === null ? '4 3' : undefined} />
        {layout.placements.map((placement, i) =>
          placement.pieceIds.map((id) => {
            const piece = byId.get(id);
            if (!piece) return null;
            const tx = placement.x - piece.bounds.minX;
            const ty = placement.y - piece.bounds.minY;
            return (
              <path
                key={`${i}-${id}`}
                d={piece.cutting.d}
                transform={`scale(${scale}) translate(${tx} ${ty})`}
                fill={PIECE_TINTS[piece.side]}
                fillOpacity={placement.pieceIds.length > 1 ? 0.6 : 1}
                stroke={PATTERN_INK}
                strokeWidth={1}
                vectorEffect="non-scaling-stroke"
              />
            );
          }),
        )}
        <line x1={0} y1={0} x2={0} y2={h} stroke={PATTERN_INK} strokeWidth={3} />
        <text x={-8} y={h / 2} transform={`rotate(-90 -8 ${h / 2})`} textAnchor="middle" fontSize={10} fill={PATTERN_INK}>
          fold{layout.layers === 4 ? 's' : ''}
        </text>
        <text x={w + 6} y={h / 2} transform={`rotate(90 ${w + 6} ${h / 2})`} textAnchor="middle" fontSize={10} fill={PATTERN_INK}>
          {lengthFormat(layout.lengthNeeded, unit)}
        </text>
      </g>
    </svg>
  );
}
