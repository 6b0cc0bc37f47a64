/**
 * Assembles a pattern piece from its stitching-line edges: outlines, cutting line with
 * allowances, measured edges, grainline, fold line, bounds and label (mm).
 */
import { segmentEndDirection, segmentStartDirection, segmentsFlatten, segmentsReverse } from '../geometry/bezier';
import { outlineOffset, type AllowanceEdge } from '../geometry/offset';
import { pointsBounds } from '../geometry/polygon';
import { pathDataFromPolyline, pathDataFromSegments } from '../export/path-data';
import { edgeMeasure } from '../finishing/edge-length';
import type { EdgeName, MarkLine, Outline, Piece, PieceSide, Point, Segment } from '../types';

/**
 * Order and direction in which the edges make the closed outline: down the fold, along the
 * hem, up the side seam, up the armhole, in along the shoulder, down the neck to the fold.
 * `true` means the edge is travelled against its canonical direction.
 */
export const OUTLINE_ORDER: readonly (readonly [EdgeName, boolean])[] = [
  ['fold', false],
  ['hem', false],
  ['side', true],
  ['armhole', true],
  ['shoulder', true],
  ['neck', false],
];

/** A cutting-line point closer than this to x = 0 is on the fold, mm. */
const ON_FOLD_MM = 0.01;

/**
 * Butt ends of allowance strips are square to the flattened chord next to the fold, which is
 * a hair off square to the fold itself; points that stray across the fold by less than this
 * are moved onto it, mm.
 */
const FOLD_SNAP_MM = 0.5;

/** Moves points within {@link FOLD_SNAP_MM} of the fold onto it and drops repeated points. */
function foldSnap(points: readonly Point[]): Point[] {
  const result: Point[] = [];
  for (const p of points) {
    const q = p.x < ON_FOLD_MM && p.x > -FOLD_SNAP_MM ? { x: 0, y: p.y } : p;
    const last = result[result.length - 1];
    if (last && last.x === q.x && last.y === q.y) continue;
    result.push(q);
  }
  const first = result[0];
  const last = result[result.length - 1];
  if (result.length > 1 && first && last && first.x === last.x && first.y === last.y) result.pop();
  return result;
}

/** What a piece is, besides its geometry. */
export interface PieceMeta {
  id: string;
  name: string;
  side: PieceSide;
  cutCount: number;
  styleName: string;
  /** Where to put the grainline (parallel to the fold) and the label, mm. */
  grainX: number;
  grainTop: number;
  grainBottom: number;
  labelAt: Point;
}

function chordDirection(from: Point | undefined, to: Point | undefined): Point | null {
  if (!from || !to) return null;
  const length = Math.hypot(to.x - from.x, to.y - from.y);
  return length === 0 ? null : { x: (to.x - from.x) / length, y: (to.y - from.y) / length };
}

function cutNoteFor(count: number, onFold: boolean): string {
  return `cut ${count}${onFold ? ' on fold' : ''}`;
}

function cuttingFold(polyline: readonly Point[]): MarkLine | null {
  const onFold = polyline.filter((p) => p.x <= ON_FOLD_MM);
  if (onFold.length < 2) return null;
  let top = onFold[0] as Point;
  let bottom = top;
  for (const p of onFold) {
    if (p.y < top.y) top = p;
    if (p.y > bottom.y) bottom = p;
  }
  return { from: { x: 0, y: top.y }, to: { x: 0, y: bottom.y } };
}

/** Builds a piece (without notches) from its canonical edges and allowances, mm. */
export function pieceBuild(
  edges: Record<EdgeName, Segment[]>,
  allowances: Record<EdgeName, number>,
  meta: PieceMeta,
): Piece {
  const outlineSegments: Segment[] = [];
  const allowanceEdges: AllowanceEdge[] = [];
  for (const [name, reversed] of OUTLINE_ORDER) {
    const chain = reversed ? segmentsReverse(edges[name]) : edges[name];
    outlineSegments.push(...chain);
    const polyline = segmentsFlatten(chain);
    // Corners are mitred along the first and last chords, the same lines the edge's own offset
    // follows, so that the cutting line meets itself without a jog at each corner.
    allowanceEdges.push({
      polyline,
      startDirection: chordDirection(polyline[0], polyline[1]) ?? segmentStartDirection(chain[0] as Segment),
      endDirection:
        chordDirection(polyline[polyline.length - 2], polyline[polyline.length - 1]) ??
        segmentEndDirection(chain[chain.length - 1] as Segment),
      allowance: allowances[name],
    });
  }
  const stitchingPolyline: Point[] = [];
  for (const edge of allowanceEdges) stitchingPolyline.push(...edge.polyline.slice(0, -1));
  const stitching: Outline = {
    d: pathDataFromSegments(outlineSegments, true),
    segments: outlineSegments,
    polyline: stitchingPolyline,
  };
  const cuttingPolyline = foldSnap(outlineOffset(allowanceEdges, { foldAtZero: true }));
  const cuttingSegments: Segment[] = cuttingPolyline.map((from, i) => ({
    kind: 'line',
    from,
    to: cuttingPolyline[(i + 1) % cuttingPolyline.length] as Point,
  }));
  const cutting: Outline = {
    d: pathDataFromPolyline(cuttingPolyline, true),
    segments: cuttingSegments,
    polyline: cuttingPolyline,
  };
  const fold = cuttingFold(cuttingPolyline);
  const onFold = fold !== null;
  const bounds = pointsBounds(cuttingPolyline);
  const cutNote = cutNoteFor(meta.cutCount, onFold);
  const measured = (Object.keys(edges) as EdgeName[]).map((name) => edgeMeasure(name, edges[name]));
  return {
    id: meta.id,
    name: meta.name,
    side: meta.side,
    cutCount: meta.cutCount,
    onFold,
    cutNote,
    stitching,
    cutting,
    edges: measured,
    allowances,
    notches: [],
    grainline: { from: { x: meta.grainX, y: meta.grainTop }, to: { x: meta.grainX, y: meta.grainBottom } },
    fold,
    bounds,
    label: {
      title: meta.name,
      lines: [meta.styleName, cutNote],
      at: meta.labelAt,
    },
  };
}

/** The named edge of a piece; throws when a piece lacks it (a drafting bug, not bad input). */
export function pieceEdge(piece: Piece, name: EdgeName) {
  const edge = piece.edges.find((e) => e.name === name);
  if (!edge) throw new Error(`piece ${piece.id} has no ${name} edge`);
  return edge;
}
