import { useCallback, useLayoutEffect, useMemo, useState } from 'react';
import type { Draft, EdgeName } from '@shared/engine';
import { edgePointAt } from '@shared/engine';
import { lengthFormat, type LengthUnit } from '@shared/units';
import { useCanvasView } from '../hooks/use-canvas-view';
import { gridPaths, gridSpec } from '../lib/canvas-grid';
import { EDGE_LABELS, type EdgeRef } from '../lib/edge-names';
import { redrawMeasure } from '../lib/perf-marks';
import { piecesArrange, type ArrangementMode } from '../lib/piece-arrangement';
import { viewToScreen } from '../lib/view-transform';
import { CanvasToolbar } from './canvas-toolbar';
import { labelBlockHeight, PieceMarks } from './piece-marks';
import { PieceDrawing } from './piece-drawing';

export interface PatternCanvasProps {
  draft: Draft;
  unit: LengthUnit;
  mode: ArrangementMode;
  onModeChange: (mode: ArrangementMode) => void;
  highlight: EdgeRef | null;
  onHighlight: (edge: EdgeRef | null) => void;
  /** Changing it fits the drawing again (another draft or revision). */
  fitKey: string;
  /** Said above the drawing when it is not the draft being edited (a revision, the last valid draft). */
  caption?: string;
}

/**
 * The pieces drawn to scale from the engine's data: path data straight from the draft, a grid
 * in the studio's unit, zoom, pan and fit by mouse, touch or keyboard, and an edge's length on
 * hover or tap.
 */
export function PatternCanvas({ draft, unit, mode, onModeChange, highlight, onHighlight, fitKey, caption }: PatternCanvasProps) {
  const arrangement = useMemo(() => piecesArrange(draft.pieces, mode), [draft.pieces, mode]);
  const [hover, setHover] = useState<EdgeRef | null>(null);
  const onTap = useCallback(
    (target: Element | null) => {
      const pieceId = target?.getAttribute('data-piece-id');
      const edge = target?.getAttribute('data-edge') as EdgeName | null | undefined;
      onHighlight(pieceId && edge ? { pieceId, edge } : null);
    },
    [onHighlight],
  );
  const { containerRef, view, size, fit, zoomBy, onKeyDown, onPointerDown, onPointerMove, onPointerUp, onPointerCancel } = useCanvasView(
    arrangement.bounds,
    `${fitKey}:${mode}`,
    onTap,
  );
  const grid = useMemo(() => gridPaths(view, size, gridSpec(unit)), [view, size, unit]);
  const onEdgeHover = useCallback((pieceId: string, edge: EdgeName | null) => setHover(edge ? { pieceId, edge } : null), []);

  useLayoutEffect(() => {
    redrawMeasure();
  }, [draft]);

  const shown = hover ?? highlight;
  const tip = useMemo(() => {
    if (!shown) return null;
    const placed = arrangement.placed.find((p) => p.piece.id === shown.pieceId);
    const edge = placed?.piece.edges.find((e) => e.name === shown.edge);
    if (!placed || !edge) return null;
    const { point } = edgePointAt(edge, edge.length / 2);
    const text = `${placed.piece.name} · ${EDGE_LABELS[edge.name].toLowerCase()}`;
    const length = lengthFormat(edge.length, unit);
    const at = viewToScreen(view, { x: point.x + placed.dx, y: point.y + placed.dy });
    // Kept inside the canvas: an estimate of its width from the characters (Inter at 14 px).
    const half = ((text.length + length.length + 1) * 7.4 + 20) / 2;
    const x = Math.min(Math.max(at.x, half + 4), Math.max(half + 4, size.width - half - 4));
    return { text, length, x, y: at.y, below: at.y < 48 };
  }, [shown, arrangement, view, unit, size.width]);

  const overlaid = mode === 'overlaid';
  // Overlaid pieces share one label anchor: stack their labels instead.
  const labelShifts = useMemo(() => {
    const out: number[] = [];
    let y = 0;
    for (const { piece } of arrangement.placed) {
      out.push(y);
      y += labelBlockHeight(piece);
    }
    return out;
  }, [arrangement]);
  const spec = gridSpec(unit);
  return (
    <section aria-label="Pattern pieces" className="relative flex h-full min-h-0 flex-col overflow-hidden rounded-xl border border-line bg-panel">
      <CanvasToolbar mode={mode} onModeChange={onModeChange} onZoomIn={() => zoomBy(1.25)} onZoomOut={() => zoomBy(0.8)} onFit={fit} />
      {caption && <p className="border-b border-line bg-surface px-3 py-1.5 text-sm font-medium text-warn">{caption}</p>}
      <div
        ref={containerRef}
        tabIndex={0}
        role="group"
        aria-label="Pattern drawing. Arrow keys pan, plus and minus zoom, 0 fits the pieces."
        aria-describedby="pattern-canvas-help"
        onKeyDown={onKeyDown}
        className="relative min-h-0 flex-1 touch-none select-none bg-panel outline-offset-[-3px]"
      >
        <svg
          width={size.width}
          height={size.height}
          className="absolute inset-0 block cursor-grab active:cursor-grabbing"
          role="img"
          aria-label={`${draft.pieces.map((p) => `${p.name}, ${p.cutNote}`).join('; ')}. Drawn to scale.`}
          onPointerDown={onPointerDown}
          onPointerMove={onPointerMove}
          onPointerUp={onPointerUp}
          onPointerCancel={onPointerCancel}
        >
          <path d={grid.minor} stroke="#ebe8e2" strokeWidth={1} fill="none" />
          <path d={grid.major} stroke="#d3cfc6" strokeWidth={1} fill="none" />
          <g data-testid="pattern-pieces" transform={`matrix(${view.scale} 0 0 ${view.scale} ${view.x} ${view.y})`}>
            {arrangement.placed.map(({ piece, dx, dy }) => (
              <PieceDrawing
                key={piece.id}
                piece={piece}
                dx={dx}
                dy={dy}
                translucent={overlaid}
                highlightEdge={shown?.pieceId === piece.id ? shown.edge : null}
                interactive
                onEdgeHover={onEdgeHover}
              />
            ))}
          </g>
          {arrangement.placed.map(({ piece, dx, dy }, i) => (
            <PieceMarks
              key={piece.id}
              piece={piece}
              dx={dx}
              dy={dy}
              view={view}
              labelShift={overlaid ? (labelShifts[i] ?? 0) : 0}
              showFoldAndGrain={!overlaid || i === 0}
              neckTag={overlaid}
            />
          ))}
        </svg>
        {tip && (
          <div
            data-testid="edge-tip"
            className={`pointer-events-none absolute z-10 -translate-x-1/2 rounded-md bg-ink px-2.5 py-1.5 text-sm whitespace-nowrap text-white shadow ${
              tip.below ? 'translate-y-[10px]' : '-translate-y-[calc(100%+10px)]'
            }`}
            style={{ left: tip.x, top: tip.y }}
          >
            {tip.text} <span className="num font-semibold">{tip.length}</span>
          </div>
        )}
      </div>
      <p id="pattern-canvas-help" className="border-t border-line px-3 py-1.5 text-xs text-muted">
        Grid squares {spec.label} · solid line: cut · dashed line: stitch · hover or tap an edge for its length
      </p>
      <p className="sr-only" aria-live="polite">
        {tip ? `${tip.text}: ${tip.length}` : ''}
      </p>
    </section>
  );
}
