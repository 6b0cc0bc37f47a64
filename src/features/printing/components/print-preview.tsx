import type { Piece, Point } from '@shared/engine';
import type { ArrangedItem, Rect } from '@shared/engine/layout/tiling-types';
import type { PrintPlan } from '../lib/print-plan';

type ReadyPlan = Extract<PrintPlan, { ok: true }>;

export interface PrintPreviewProps {
  plan: ReadyPlan;
  /** One line saying what the preview shows, read by screen readers as the picture's name. */
  summary: string;
}

/** Light tints that tell front from back beside their names (never colour alone). */
const TINT: Record<Piece['side'], string> = { front: '#e6eef6', back: '#f3ecdf', other: '#efefed' };

function pointsAttr(points: readonly Point[], offset: Point): string {
  return points.map((p) => `${(p.x + offset.x).toFixed(1)},${(p.y + offset.y).toFixed(1)}`).join(' ');
}

function union(rects: readonly Rect[]): Rect {
  const minX = Math.min(...rects.map((r) => r.x));
  const minY = Math.min(...rects.map((r) => r.y));
  const maxX = Math.max(...rects.map((r) => r.x + r.width));
  const maxY = Math.max(...rects.map((r) => r.y + r.height));
  return { x: minX, y: minY, width: maxX - minX, height: maxY - minY };
}

function PiecesDrawn({ pieces, items, offset, fontSize }: { pieces: Piece[]; items: ArrangedItem[]; offset: Point; fontSize: number }) {
  return (
    <g>
      {items.map((item) => {
        const piece = pieces.find((p) => p.id === item.id);
        if (!piece) return null;
        const at = { x: item.offset.x + offset.x, y: item.offset.y + offset.y };
        const centre = { x: at.x + piece.bounds.minX + piece.bounds.width / 2, y: at.y + piece.bounds.minY + piece.bounds.height / 2 };
        return (
          <g key={item.id}>
            <polygon points={pointsAttr(piece.cutting.polyline, at)} fill={TINT[piece.side]} stroke="#1d1f1e" strokeWidth={fontSize / 8} />
            <text x={centre.x} y={centre.y} textAnchor="middle" fontSize={fontSize * 1.2} fontWeight={600} fill="#1d1f1e">
              {piece.name}
            </text>
          </g>
        );
      })}
    </g>
  );
}

function TilesPreview({ plan }: { plan: Extract<ReadyPlan, { kind: 'tiles' }> }) {
  const { canvas, pieces, plan: tiles } = plan.tiles;
  const box = union([canvas.bounds, ...tiles.cells.map((c) => c.region)]);
  const pad = Math.max(box.width, box.height) * 0.02;
  const font = Math.max(box.width, box.height) * 0.028;
  return (
    <svg viewBox={`${box.x - pad} ${box.y - pad} ${box.width + 2 * pad} ${box.height + 2 * pad}`} className="h-full w-full" aria-hidden="true">
      <defs>
        <pattern id="print-blank-hatch" width={font} height={font} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <line x1={0} y1={0} x2={0} y2={font} stroke="#5d605c" strokeWidth={font / 10} strokeOpacity={0.45} />
        </pattern>
      </defs>
      <PiecesDrawn pieces={pieces} items={canvas.items} offset={{ x: 0, y: 0 }} fontSize={font} />
      {tiles.cells.map((cell) => (
        <g key={cell.label} data-cell={cell.label} data-blank={cell.blank || undefined}>
          <rect
            x={cell.region.x}
            y={cell.region.y}
            width={cell.region.width}
            height={cell.region.height}
            fill={cell.blank ? 'url(#print-blank-hatch)' : 'none'}
            fillOpacity={cell.blank ? 1 : 0}
            stroke={cell.blank ? '#5d605c' : '#17564f'}
            strokeWidth={font / 9}
            strokeDasharray={cell.blank ? `${font / 3} ${font / 4}` : undefined}
          />
          <text x={cell.region.x + font * 0.4} y={cell.region.y + font * 1.2} fontSize={font} fontWeight={700} fill={cell.blank ? '#5d605c' : '#17564f'}>
            {cell.label}
          </text>
          {cell.blank && (
            <text x={cell.region.x + font * 0.4} y={cell.region.y + font * 2.3} fontSize={font * 0.75} fill="#5d605c">
              left out
            </text>
          )}
        </g>
      ))}
    </svg>
  );
}

function SheetPreview({ plan }: { plan: Extract<ReadyPlan, { kind: 'sheet' }> }) {
  const { layout, pieces } = plan.sheet;
  const { sheet, canvasAt, furniture } = layout.plan;
  const font = Math.max(sheet.widthMm, sheet.heightMm) * 0.025;
  const pad = font;
  return (
    <svg viewBox={`${-pad} ${-pad} ${sheet.widthMm + 2 * pad} ${sheet.heightMm + 2 * pad}`} className="h-full w-full" aria-hidden="true">
      <rect x={0} y={0} width={sheet.widthMm} height={sheet.heightMm} fill="#ffffff" stroke="#17564f" strokeWidth={font / 6} />
      <PiecesDrawn pieces={pieces} items={layout.canvas.items} offset={canvasAt} fontSize={font} />
      {furniture.squares.map((sq) => (
        <rect key={sq.caption} x={sq.rect.x} y={sq.rect.y} width={sq.rect.width} height={sq.rect.height} fill="none" stroke="#1d1f1e" strokeWidth={font / 10} />
      ))}
    </svg>
  );
}

const TICKET_CONTENTS = [
  'Client, style, fabric and its stretch',
  'Pieces and how many to cut of each',
  'The fold layout to scale, fabric width and length needed',
  'Binding strips to cut, lengths and widths',
  'Finished measurements and the allowances used',
  'Finishing steps in order, and the safety cautions',
];

/** What will be printed: the page grid over the pieces (blank pages hatched), the wide sheet, or the ticket's contents. */
export function PrintPreview({ plan, summary }: PrintPreviewProps) {
  return (
    <figure className="flex flex-col gap-2">
      <div
        // A drawing is named by the summary; the ticket's list is read as it is.
        role={plan.kind === 'ticket' ? undefined : 'img'}
        aria-label={plan.kind === 'ticket' ? undefined : summary}
        data-testid="print-preview"
        className="flex h-64 items-center justify-center overflow-hidden rounded-lg border border-line bg-surface p-2 md:h-[22rem]"
      >
        {plan.kind === 'tiles' && <TilesPreview plan={plan} />}
        {plan.kind === 'sheet' && <SheetPreview plan={plan} />}
        {plan.kind === 'ticket' && (
          <ul aria-label="The ticket holds" className="w-full max-w-xs list-disc space-y-1 rounded-md border border-line bg-panel py-4 pr-4 pl-8 text-sm text-ink">
            {TICKET_CONTENTS.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
        )}
      </div>
      <figcaption className="num text-sm font-medium text-ink" data-testid="print-summary">
        {summary}
      </figcaption>
    </figure>
  );
}
