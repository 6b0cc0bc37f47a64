/**
 * Cubic Bézier and line segments: evaluation, tangents, flattening, reversal. Lengths in mm.
 * Reference: Farin, "Curves and Surfaces for CAGD" (de Casteljau evaluation); flattening
 * step count from Wang's formula (Filip, Magedson & Markot, "Surface algorithms using bounds
 * on derivatives", 1986).
 */
import type { CubicSegment, Point, Segment } from '../types';
import { pointDistance, pointLerp, pointSub, vectorNormalize } from './point';

/** Largest distance, mm, between a flattened curve and the true curve (a fifth of a drawn 0.5 mm line). */
export const FLATTEN_TOLERANCE_MM = 0.1;

/** A straight segment from `from` to `to`, mm. */
export function lineMake(from: Point, to: Point): Segment {
  return { kind: 'line', from, to };
}

/** A cubic Bézier segment, mm. */
export function cubicMake(from: Point, c1: Point, c2: Point, to: Point): CubicSegment {
  return { kind: 'cubic', from, c1, c2, to };
}

/** The point at parameter t ∈ [0, 1] of a segment (de Casteljau), mm. */
export function segmentPointAt(segment: Segment, t: number): Point {
  if (segment.kind === 'line') return pointLerp(segment.from, segment.to, t);
  const u = 1 - t;
  const a = u * u * u;
  const b = 3 * u * u * t;
  const c = 3 * u * t * t;
  const d = t * t * t;
  return {
    x: a * segment.from.x + b * segment.c1.x + c * segment.c2.x + d * segment.to.x,
    y: a * segment.from.y + b * segment.c1.y + c * segment.c2.y + d * segment.to.y,
  };
}

/** The derivative (velocity) at parameter t, mm per unit t. */
export function segmentDerivativeAt(segment: Segment, t: number): Point {
  if (segment.kind === 'line') return pointSub(segment.to, segment.from);
  const u = 1 - t;
  const p0 = segment.from;
  const p1 = segment.c1;
  const p2 = segment.c2;
  const p3 = segment.to;
  return {
    x: 3 * u * u * (p1.x - p0.x) + 6 * u * t * (p2.x - p1.x) + 3 * t * t * (p3.x - p2.x),
    y: 3 * u * u * (p1.y - p0.y) + 6 * u * t * (p2.y - p1.y) + 3 * t * t * (p3.y - p2.y),
  };
}

/**
 * Unit tangent at the start of a segment. A cubic whose first handle has zero length takes
 * the direction towards its next distinct control point.
 */
export function segmentStartDirection(segment: Segment): Point {
  if (segment.kind === 'line') return vectorNormalize(pointSub(segment.to, segment.from));
  for (const next of [segment.c1, segment.c2, segment.to]) {
    if (pointDistance(segment.from, next) > 1e-9) return vectorNormalize(pointSub(next, segment.from));
  }
  return { x: 0, y: 0 };
}

/** Unit tangent at the end of a segment (direction of travel). */
export function segmentEndDirection(segment: Segment): Point {
  if (segment.kind === 'line') return vectorNormalize(pointSub(segment.to, segment.from));
  for (const previous of [segment.c2, segment.c1, segment.from]) {
    if (pointDistance(previous, segment.to) > 1e-9) return vectorNormalize(pointSub(segment.to, previous));
  }
  return { x: 0, y: 0 };
}

/** The same segment travelled backwards. */
export function segmentReverse(segment: Segment): Segment {
  if (segment.kind === 'line') return { kind: 'line', from: segment.to, to: segment.from };
  return { kind: 'cubic', from: segment.to, c1: segment.c2, c2: segment.c1, to: segment.from };
}

/** A chain of segments travelled backwards. */
export function segmentsReverse(segments: readonly Segment[]): Segment[] {
  return segments.map(segmentReverse).reverse();
}

/**
 * Number of equal parameter steps that keep a cubic within `tolerance` of its chords
 * (Wang's formula: n = √(3 · M / (4 · tolerance)), M the largest second difference).
 */
export function cubicStepCount(segment: CubicSegment, tolerance: number): number {
  const ddx1 = segment.from.x - 2 * segment.c1.x + segment.c2.x;
  const ddy1 = segment.from.y - 2 * segment.c1.y + segment.c2.y;
  const ddx2 = segment.c1.x - 2 * segment.c2.x + segment.to.x;
  const ddy2 = segment.c1.y - 2 * segment.c2.y + segment.to.y;
  const m = Math.max(Math.hypot(ddx1, ddy1), Math.hypot(ddx2, ddy2));
  return Math.max(1, Math.ceil(Math.sqrt((3 * m) / (4 * tolerance))));
}

/**
 * Points along a chain of segments, within `tolerance` mm of the curves; the first point of
 * the chain, then the end of every step (so consecutive segments share no duplicate).
 */
export function segmentsFlatten(segments: readonly Segment[], tolerance = FLATTEN_TOLERANCE_MM): Point[] {
  const first = segments[0];
  if (!first) return [];
  const points: Point[] = [first.from];
  for (const segment of segments) {
    if (segment.kind === 'line') {
      points.push(segment.to);
      continue;
    }
    const steps = cubicStepCount(segment, tolerance);
    for (let i = 1; i < steps; i++) points.push(segmentPointAt(segment, i / steps));
    points.push(segment.to);
  }
  return points;
}
