/**
 * Cutting lines from stitching lines: each edge of a closed outline is offset outwards by its
 * own allowance, corners between two allowances are mitred (limited at acute angles), and the
 * raw offset is cleaned by a union in Clipper2 (A. Johnson; @countertype/clipper2-ts).
 */
import { Clipper, ClipType, FillRule, type PathD } from '@countertype/clipper2-ts';
import type { Point } from '../types';
import { pointAdd, pointDistance, pointScale, vectorCross, vectorNormalize, pointSub, vectorTurnClockwise } from './point';
import { polygonSignedArea } from './polygon';

/** Decimal places Clipper keeps: 0.001 mm. */
const CLIPPER_PRECISION = 3;

/**
 * A mitre reaches at most this many allowances from its corner; beyond that the corner is
 * squared off, so that acute corners do not fly out (Clipper's default mitre limit is 2).
 */
export const MITRE_LIMIT = 2;

/** One edge of a closed outline, in travel order, with the allowance to add outside it (mm). */
export interface AllowanceEdge {
  /** Points of the stitching line, first to last in the outline's direction of travel. */
  polyline: Point[];
  /** Unit tangent at the first point, in the direction of travel. */
  startDirection: Point;
  /** Unit tangent at the last point, in the direction of travel. */
  endDirection: Point;
  /** Allowance outside this edge, mm (0 for a fold or an edge bound with tape). */
  allowance: number;
}

/**
 * The filler between the offsets of two edges meeting at `corner` (allowances a and b) so
 * that the cutting line turns the corner as a mitre, limited to {@link MITRE_LIMIT}
 * allowances from the corner. Null where the corner turns inwards and the offsets overlap.
 */
export function cornerMitre(
  corner: Point,
  incoming: Point,
  outgoing: Point,
  a: number,
  b: number,
): Point[] | null {
  const startA = pointAdd(corner, pointScale(vectorTurnClockwise(incoming), a));
  const startB = pointAdd(corner, pointScale(vectorTurnClockwise(outgoing), b));
  const turn = vectorCross(incoming, outgoing);
  const reach = MITRE_LIMIT * Math.max(a, b);
  if (Math.abs(turn) < 1e-9) {
    return pointDistance(startA, startB) < 1e-6 ? null : [corner, startA, startB];
  }
  // Where the line through startA along `incoming` meets the line through startB along `outgoing`.
  const t = vectorCross(pointSub(startB, startA), outgoing) / turn;
  if (t <= 0) return null;
  const mitre = pointAdd(startA, pointScale(incoming, t));
  if (pointDistance(corner, mitre) <= reach) return [corner, startA, mitre, startB];
  const extendA = pointAdd(startA, pointScale(incoming, Math.min(t, reach)));
  const u = vectorCross(pointSub(startB, startA), incoming) / turn;
  const extendB = pointAdd(startB, pointScale(vectorNormalize(outgoing), -Math.min(Math.abs(u), reach)));
  return [corner, startA, extendA, extendB, startB];
}

/** Offsets one edge's polyline outwards by its allowance, mitring its vertices (mm). */
function edgeOffset(edge: AllowanceEdge): Point[] {
  const points = edge.polyline;
  const a = edge.allowance;
  const count = points.length;
  const normals: Point[] = [];
  for (let i = 0; i + 1 < count; i++) {
    normals.push(vectorTurnClockwise(vectorNormalize(pointSub(points[i + 1] as Point, points[i] as Point))));
  }
  const result: Point[] = [];
  for (let i = 0; i < count; i++) {
    const p = points[i] as Point;
    const before = normals[i - 1];
    const after = normals[i];
    if (!before || !after) {
      const normal = (before ?? after) as Point;
      result.push(pointAdd(p, pointScale(normal, a)));
      continue;
    }
    const bisector = vectorNormalize(pointAdd(before, after));
    const cosHalf = bisector.x * before.x + bisector.y * before.y;
    if (cosHalf >= 1 / MITRE_LIMIT) {
      result.push(pointAdd(p, pointScale(bisector, a / cosHalf)));
    } else {
      result.push(pointAdd(p, pointScale(before, a)), pointAdd(p, pointScale(after, a)));
    }
  }
  return result;
}

/**
 * The cutting outline around a closed stitching outline whose edges carry their own
 * allowances, mm. Edges are given in travel order; outward is a clockwise quarter turn of the
 * direction of travel (y down). Each edge is offset by its allowance with mitred vertices,
 * corners between two allowances are mitred (limited by {@link MITRE_LIMIT}), an edge next to
 * one without allowance is squared off; where an allowance exceeds a concave curve's radius
 * the raw offset loops back on itself, and a Clipper2 boolean operation with the orientation's
 * fill rule removes those loops (the offset-then-union method Clipper's own ClipperOffset
 * uses) and, with `foldAtZero`, trims anything beyond the fold at x = 0 (the fold is the
 * piece's mirror line).
 * Returns a simple polygon oriented like the input, starting at the vertex nearest the first
 * edge's first point.
 */
export function outlineOffset(edges: readonly AllowanceEdge[], options: { foldAtZero?: boolean } = {}): Point[] {
  const outline: Point[] = [];
  for (const edge of edges) outline.push(...edge.polyline.slice(0, -1));
  const ring: Point[] = [];
  edges.forEach((edge, i) => {
    const previous = edges[(i + edges.length - 1) % edges.length] as AllowanceEdge;
    const corner = edge.polyline[0] as Point;
    if (edge.allowance > 0 && previous.allowance > 0) {
      const fill = cornerMitre(corner, previous.endDirection, edge.startDirection, previous.allowance, edge.allowance);
      // The fill runs corner, end of previous offset, mitre point(s), start of this offset.
      if (fill) ring.push(...fill.slice(2, -1));
    } else if (edge.allowance <= 0 && previous.allowance <= 0) {
      ring.push(corner);
    } else if (edge.allowance > 0) {
      ring.push(corner);
    }
    if (edge.allowance > 0) {
      ring.push(...edge.polyline.length > 1 ? edgeOffset(edge) : []);
      const end = edge.polyline[edge.polyline.length - 1] as Point;
      const next = edges[(i + 1) % edges.length] as AllowanceEdge;
      if (next.allowance <= 0) ring.push(end);
    } else {
      ring.push(...edge.polyline.slice(1, -1));
    }
  });
  const area = polygonSignedArea(outline);
  const clipperArea = Clipper.areaD(outline);
  // Keep the regions wound the same way as the outline; loops wound the other way drop out.
  const rule = Math.sign(clipperArea) >= 0 ? FillRule.Positive : FillRule.Negative;
  // Nothing is cut beyond the fold: the fold is the piece's mirror line.
  const far = 1e6;
  let halfPlane: PathD = [
    { x: 0, y: -far },
    { x: far, y: -far },
    { x: far, y: far },
    { x: 0, y: far },
  ];
  if (Math.sign(Clipper.areaD(halfPlane)) !== Math.sign(clipperArea)) halfPlane = Clipper.reversePathD(halfPlane);
  const merged = options.foldAtZero
    ? Clipper.booleanOpD(ClipType.Intersection, [ring], [halfPlane], rule, CLIPPER_PRECISION)
    : Clipper.booleanOpD(ClipType.Union, [ring], null, rule, CLIPPER_PRECISION);
  let best: PathD = merged[0] ?? [];
  for (const path of merged) if (Math.abs(Clipper.areaD(path)) > Math.abs(Clipper.areaD(best))) best = path;
  let result: Point[] = best.map((p) => ({ x: p.x, y: p.y }));
  if (Math.sign(polygonSignedArea(result)) !== Math.sign(area)) result.reverse();
  const start = outline[0] as Point;
  let startIndex = 0;
  let nearest = Infinity;
  result.forEach((p, i) => {
    const distance = pointDistance(p, start);
    if (distance < nearest) {
      nearest = distance;
      startIndex = i;
    }
  });
  result = [...result.slice(startIndex), ...result.slice(0, startIndex)];
  return result;
}
