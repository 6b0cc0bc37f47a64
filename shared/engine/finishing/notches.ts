/**
 * Notches: quarter marks on the neckline and armhole so that a band or tape divided into
 * quarters can be matched to its opening, and match points on the side seam (trade notes:
 * "bands and openings are divided into halves and quarters and matched at those marks",
 * common practice). Positions are measured along the stitching line, mm.
 */
import { segmentsFlatten } from '../geometry/bezier';
import type { EdgeName, NamedEdge, Notch, NotchKind, Piece, Point } from '../types';

/** Length of a notch tick, mm: about 1/4 in (common practice). */
export const NOTCH_DEPTH_MM = 6;

/** A mark closer than this to a seam or fold is left out: the seam itself marks the point, mm. */
export const NOTCH_SEAM_CLEARANCE_MM = 3;

function edgeOf(piece: Piece, name: EdgeName): NamedEdge {
  const edge = piece.edges.find((e) => e.name === name);
  if (!edge) throw new Error(`piece ${piece.id} has no ${name} edge`);
  return edge;
}

/**
 * Point and unit tangent at `distance` mm along an edge, walking its flattened stitching line
 * (within 0.1 mm of the curve) with chord lengths scaled to the edge's measured length, so a
 * mark lands where the measured length says. Exact enough for a notch, and many times cheaper
 * than inverting the arc length of each curve.
 */
export function edgeWalk(edge: NamedEdge, distance: number): { point: Point; tangent: Point } {
  const points = segmentsFlatten(edge.segments);
  const chords: number[] = [];
  let total = 0;
  for (let i = 0; i + 1 < points.length; i++) {
    const a = points[i] as Point;
    const b = points[i + 1] as Point;
    const chord = Math.hypot(b.x - a.x, b.y - a.y);
    chords.push(chord);
    total += chord;
  }
  let remaining = (Math.min(Math.max(distance, 0), edge.length) * total) / (edge.length || 1);
  for (let i = 0; i < chords.length; i++) {
    const chord = chords[i] as number;
    const a = points[i] as Point;
    const b = points[i + 1] as Point;
    if (remaining <= chord || i === chords.length - 1) {
      const t = chord === 0 ? 0 : Math.min(1, remaining / chord);
      return {
        point: { x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t },
        tangent: chord === 0 ? { x: 0, y: 0 } : { x: (b.x - a.x) / chord, y: (b.y - a.y) / chord },
      };
    }
    remaining -= chord;
  }
  const only = points[0] ?? { x: 0, y: 0 };
  return { point: only, tangent: { x: 0, y: 0 } };
}

/**
 * A notch on `edge` of `piece` at `distance` mm from the edge's canonical start, moved out to
 * the cutting line by the edge's allowance.
 */
function notchAt(piece: Piece, name: EdgeName, distance: number, kind: NotchKind): Notch | null {
  const edge = edgeOf(piece, name);
  if (distance < NOTCH_SEAM_CLEARANCE_MM || distance > edge.length - NOTCH_SEAM_CLEARANCE_MM) return null;
  const { point, tangent } = edgeWalk(edge, distance);
  // The outline travels side, armhole and shoulder against their canonical direction
  // (OUTLINE_ORDER), so their outward normal is on the other side of the tangent.
  const outwardSign = name === 'side' || name === 'armhole' || name === 'shoulder' ? -1 : 1;
  const outward: Point = { x: -tangent.y * outwardSign, y: tangent.x * outwardSign };
  const allowance = piece.allowances[name];
  return {
    edge: name,
    kind,
    stitchAt: point,
    at: { x: point.x + outward.x * allowance, y: point.y + outward.y * allowance },
    inward: { x: -outward.x, y: -outward.y },
    depth: NOTCH_DEPTH_MM,
  };
}

/**
 * Quarter marks around a loop made of one edge of the front and the same edge of the back.
 * The neckline loop runs centre front → shoulder → centre back, doubled for the other half,
 * so its quarter marks are centre front, centre back (the folds) and the two points half way
 * between; the armhole loop runs underarm → front → shoulder → back → underarm.
 */
export function openingNotches(front: Piece, back: Piece): { front: Notch[]; back: Notch[] } {
  const result = { front: [] as Notch[], back: [] as Notch[] };
  const push = (notch: Notch | null, into: Notch[]) => {
    if (notch) into.push(notch);
  };
  const frontNeck = edgeOf(front, 'neck').length;
  const backNeck = edgeOf(back, 'neck').length;
  // From centre front along the front neck (canonical neck runs shoulder → fold).
  const neckHalf = (frontNeck + backNeck) / 2;
  if (neckHalf <= frontNeck) push(notchAt(front, 'neck', frontNeck - neckHalf, 'quarter'), result.front);
  else push(notchAt(back, 'neck', neckHalf - frontNeck, 'quarter'), result.back);
  const frontArmhole = edgeOf(front, 'armhole').length;
  const backArmhole = edgeOf(back, 'armhole').length;
  const loop = frontArmhole + backArmhole;
  const marks: [number, NotchKind][] = [
    [loop / 4, 'quarter'],
    [loop / 2, 'half'],
    [(3 * loop) / 4, 'quarter'],
  ];
  for (const [fromUnderarm, kind] of marks) {
    // Canonical armhole runs shoulder → underarm.
    if (fromUnderarm <= frontArmhole) push(notchAt(front, 'armhole', frontArmhole - fromUnderarm, kind), result.front);
    else push(notchAt(back, 'armhole', fromUnderarm - frontArmhole, kind), result.back);
  }
  return result;
}

/**
 * Match points on a side seam: the underarm where the armhole carries an allowance (where the
 * armhole's stitching line crosses the side seam), and the waist when the seam is shaped,
 * otherwise its half-way point. `waistDistance` is measured from the underarm, mm.
 */
export function sideNotches(piece: Piece, waistDistance: number | null): Notch[] {
  const side = edgeOf(piece, 'side');
  const notches: Notch[] = [];
  if (piece.allowances.armhole > 0) {
    const top = side.segments[0];
    if (top) {
      const outward = { x: 1, y: 0 };
      const allowance = piece.allowances.side;
      notches.push({
        edge: 'side',
        kind: 'underarm',
        stitchAt: top.from,
        at: { x: top.from.x + outward.x * allowance, y: top.from.y },
        inward: { x: -1, y: 0 },
        depth: NOTCH_DEPTH_MM,
      });
    }
  }
  const middle =
    waistDistance === null ? notchAt(piece, 'side', side.length / 2, 'half') : notchAt(piece, 'side', waistDistance, 'waist');
  if (middle) notches.push(middle);
  return notches;
}
