/**
 * Rectangle tests the print layout needs: containment, intersection with segments and
 * polygons, free room for a box among the pattern's lines. Lengths in mm.
 */
import type { Point } from '../types';
import type { Rect } from './tiling-types';

/** The rectangle (x, y, width, height). */
export function rectMake(x: number, y: number, width: number, height: number): Rect {
  return { x, y, width, height };
}

/** The rectangle grown by `d` on every side (shrunk when d < 0), mm. */
export function rectInflate(rect: Rect, d: number): Rect {
  return { x: rect.x - d, y: rect.y - d, width: rect.width + 2 * d, height: rect.height + 2 * d };
}

/** True when p lies in the closed rectangle, with a tolerance `slack` (mm). */
export function rectContainsPoint(rect: Rect, p: Point, slack = 0): boolean {
  return (
    p.x >= rect.x - slack &&
    p.x <= rect.x + rect.width + slack &&
    p.y >= rect.y - slack &&
    p.y <= rect.y + rect.height + slack
  );
}

/** True when `inner` lies inside `outer`, with a tolerance `slack` (mm). */
export function rectContainsRect(outer: Rect, inner: Rect, slack = 0): boolean {
  return (
    inner.x >= outer.x - slack &&
    inner.y >= outer.y - slack &&
    inner.x + inner.width <= outer.x + outer.width + slack &&
    inner.y + inner.height <= outer.y + outer.height + slack
  );
}

/** True when the two closed rectangles share at least a point. */
export function rectsIntersect(a: Rect, b: Rect): boolean {
  return a.x <= b.x + b.width && b.x <= a.x + a.width && a.y <= b.y + b.height && b.y <= a.y + a.height;
}

/** The common part of two rectangles, or null. */
export function rectIntersection(a: Rect, b: Rect): Rect | null {
  const x = Math.max(a.x, b.x);
  const y = Math.max(a.y, b.y);
  const right = Math.min(a.x + a.width, b.x + b.width);
  const bottom = Math.min(a.y + a.height, b.y + b.height);
  if (right < x || bottom < y) return null;
  return { x, y, width: right - x, height: bottom - y };
}

/** The smallest rectangle holding every point; null for no points. */
export function rectAroundPoints(points: readonly Point[]): Rect | null {
  const first = points[0];
  if (!first) return null;
  let minX = first.x;
  let minY = first.y;
  let maxX = first.x;
  let maxY = first.y;
  for (const p of points) {
    minX = Math.min(minX, p.x);
    minY = Math.min(minY, p.y);
    maxX = Math.max(maxX, p.x);
    maxY = Math.max(maxY, p.y);
  }
  return { x: minX, y: minY, width: maxX - minX, height: maxY - minY };
}

/** The smallest rectangle holding both. */
export function rectUnion(a: Rect, b: Rect): Rect {
  const x = Math.min(a.x, b.x);
  const y = Math.min(a.y, b.y);
  return {
    x,
    y,
    width: Math.max(a.x + a.width, b.x + b.width) - x,
    height: Math.max(a.y + a.height, b.y + b.height) - y,
  };
}

/**
 * True when the segment a–b meets the closed rectangle (Liang–Barsky clipping; Liang and
 * Barsky, "A new concept and method for line clipping", ACM TOG 3(1), 1984).
 */
export function segmentMeetsRect(a: Point, b: Point, rect: Rect): boolean {
  let t0 = 0;
  let t1 = 1;
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  // the four edges as p·t ≤ q: left, right, top, bottom
  for (let edge = 0; edge < 4; edge++) {
    const p = edge === 0 ? -dx : edge === 1 ? dx : edge === 2 ? -dy : dy;
    const q = edge === 0 ? a.x - rect.x : edge === 1 ? rect.x + rect.width - a.x : edge === 2 ? a.y - rect.y : rect.y + rect.height - a.y;
    if (p === 0) {
      if (q < 0) return false;
    } else {
      const r = q / p;
      if (p < 0) t0 = Math.max(t0, r);
      else t1 = Math.min(t1, r);
      if (t0 > t1) return false;
    }
  }
  return true;
}

/** True when p lies inside the closed polygon (even–odd ray casting). */
export function polygonContainsPoint(polygon: readonly Point[], p: Point): boolean {
  let inside = false;
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i++) {
    const a = polygon[i] as Point;
    const b = polygon[j] as Point;
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

/** True when the outline of the closed polyline crosses or touches the rectangle. */
export function polylineMeetsRect(polyline: readonly Point[], rect: Rect): boolean {
  const right = rect.x + rect.width;
  const bottom = rect.y + rect.height;
  for (let i = 0; i < polyline.length; i++) {
    const a = polyline[i] as Point;
    const b = polyline[(i + 1) % polyline.length] as Point;
    if ((a.x < rect.x && b.x < rect.x) || (a.x > right && b.x > right)) continue;
    if ((a.y < rect.y && b.y < rect.y) || (a.y > bottom && b.y > bottom)) continue;
    if (segmentMeetsRect(a, b, rect)) return true;
  }
  return false;
}

/** True when the closed polygon and the rectangle share any point (edge or area). */
export function polygonMeetsRect(polygon: readonly Point[], rect: Rect): boolean {
  if (polygon.length === 0) return false;
  if (polylineMeetsRect(polygon, rect)) return true;
  // no edge crosses: either the rectangle lies inside the polygon or they are apart
  return polygonContainsPoint(polygon, { x: rect.x, y: rect.y });
}
