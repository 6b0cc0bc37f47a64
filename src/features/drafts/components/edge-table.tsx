import type { Piece } from '@shared/engine';
import { lengthFormat, type LengthUnit } from '@shared/units';
import { cx } from '@/components/ui/cx';
import { EDGE_LABELS, edgeRefEqual, type EdgeRef } from '../lib/edge-names';

export interface EdgeTableProps {
  pieces: Piece[];
  unit: LengthUnit;
  highlight: EdgeRef | null;
  onHighlight: (edge: EdgeRef | null) => void;
}

/**
 * Every edge's length on the stitching line, front and back side by side. Choosing a row
 * highlights the edge on the drawing: the keyboard's way to what hovering shows.
 */
export function EdgeTable({ pieces, unit, highlight, onHighlight }: EdgeTableProps) {
  const names = pieces[0]?.edges.map((e) => e.name) ?? [];
  return (
    <table className="w-full text-sm">
      <thead>
        <tr className="text-left text-xs text-muted">
          <th scope="col" className="py-1 font-medium">
            Edge
          </th>
          {pieces.map((p) => (
            <th key={p.id} scope="col" className="py-1 text-right font-medium">
              {p.name}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {names.map((name) => (
          <tr key={name} className="border-t border-line/60">
            <th scope="row" className="py-0.5 text-left font-normal text-ink">
              {EDGE_LABELS[name]}
            </th>
            {pieces.map((p) => {
              const edge = p.edges.find((e) => e.name === name);
              const ref = { pieceId: p.id, edge: name };
              const on = edgeRefEqual(highlight, ref);
              return (
                <td key={p.id} className="py-0.5 text-right">
                  {edge && (
                    <button
                      type="button"
                      aria-pressed={on}
                      aria-label={`${p.name} ${EDGE_LABELS[name].toLowerCase()}: ${lengthFormat(edge.length, unit)}. Show on the drawing`}
                      onClick={() => onHighlight(on ? null : ref)}
                      className={cx('num min-h-[32px] rounded px-1.5', on ? 'bg-accent-soft font-semibold text-accent-strong' : 'hover:bg-surface')}
                    >
                      {lengthFormat(edge.length, unit)}
                    </button>
                  )}
                </td>
              );
            })}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
