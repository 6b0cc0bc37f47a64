/** Points and vectors in the piece's frame (x from the fold, y down), lengths in mm. */
import type { Point } from '../types';

/** The point (x, y), mm. */
export function pointMake(x: number, y: number): Point {
  return { x, y };
}

/** a + b. */
export function pointAdd(a: Point, b: Point): Point {
  return { x: a.x + b.x, y: a.y + b.y };
}

/** a − b. */
export function pointSub(a: Point, b: Point): Point {
  return { x: a.x - b.x, y: a.y - b.y };
}

/** v × k. */
export function pointScale(v: Point, k: number): Point {
  return { x: v.x * k, y: v.y * k };
}

/** a + (b − a) × t: the point a fraction t of the way from a to b. */
export function pointLerp(a: Point, b: Point, t: number): Point {
  return { x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t };
}

/** Euclidean distance between two points, mm. */
export function pointDistance(a: Point, b: Point): number {
  return Math.hypot(b.x - a.x, b.y - a.y);
}

/** Length of a vector, mm. */
export function vectorLength(v: Point): number {
  return Math.hypot(v.x, v.y);
}

/** The unit vector along v; (0, 0) stays (0, 0). */
export function vectorNormalize(v: Point): Point {
  const length = Math.hypot(v.x, v.y);
  return length === 0 ? { x: 0, y: 0 } : { x: v.x / length, y: v.y / length };
}

/**
 * v turned a quarter turn clockwise as drawn (y down): (1, 0) → (0, 1).
 * For an outline drawn fold → hem → side → armhole → shoulder → neck this points outwards.
 */
export function vectorTurnClockwise(v: Point): Point {
  return { x: -v.y, y: v.x };
}

/** Dot product. */
export function vectorDot(a: Point, b: Point): number {
  return a.x * b.x + a.y * b.y;
}

/** z of the cross product a × b. */
export function vectorCross(a: Point, b: Point): number {
  return a.x * b.y - a.y * b.x;
}
