/** Polygons and polylines: area, bounds and simplicity. Lengths in mm, areas in mm². */
import type { Bounds, Point } from '../types';

/**
 * Signed area of a closed polygon by the shoelace formula, mm². With y pointing down, a
 * polygon that turns clockwise as drawn has positive area.
 */
export function polygonSignedArea(points: readonly Point[]): number {
  let twice = 0;
  for (let i = 0; i < points.length; i++) {
    const a = points[i] as Point;
    const b = points[(i + 1) % points.length] as Point;
    twice += a.x * b.y - b.x * a.y;
  }
  return twice / 2;
}

/** Axis-aligned bounds of a set of points, mm. An empty set has zero bounds at the origin. */
export function pointsBounds(points: readonly Point[]): Bounds {
  if (points.length === 0) return { minX: 0, minY: 0, maxX: 0, maxY: 0, width: 0, height: 0 };
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const p of points) {
    if (p.x < minX) minX = p.x;
    if (p.y < minY) minY = p.y;
    if (p.x > maxX) maxX = p.x;
    if (p.y > maxY) maxY = p.y;
  }
  return { minX, minY, maxX, maxY, width: maxX - minX, height: maxY - minY };
}

function orientation(a: Point, b: Point, c: Point): number {
  return (b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x);
}

/** True when r, known to be collinear with pq, lies within the segment pq. */
function onSegment(p: Point, q: Point, r: Point): boolean {
  return Math.min(p.x, q.x) <= r.x && r.x <= Math.max(p.x, q.x) && Math.min(p.y, q.y) <= r.y && r.y <= Math.max(p.y, q.y);
}

/** True when the closed segments ab and cd share a point (touching counts). */
export function segmentsCross(a: Point, b: Point, c: Point, d: Point): boolean {
  const o1 = orientation(a, b, c);
  const o2 = orientation(a, b, d);
  const o3 = orientation(c, d, a);
  const o4 = orientation(c, d, b);
  if (((o1 > 0 && o2 < 0) || (o1 < 0 && o2 > 0)) && ((o3 > 0 && o4 < 0) || (o3 < 0 && o4 > 0))) return true;
  if (o1 === 0 && onSegment(a, b, c)) return true;
  if (o2 === 0 && onSegment(a, b, d)) return true;
  if (o3 === 0 && onSegment(c, d, a)) return true;
  return o4 === 0 && onSegment(c, d, b);
}

/**
 * True when a closed polygon is simple: no two non-adjacent edges meet and no edge has zero
 * length. Sweep over the edges sorted by their top (Shamos & Hoey's sweep idea, simplified to
 * interval pruning): only edges whose y-ranges overlap are tested against each other.
 */
export function polygonIsSimple(points: readonly Point[]): boolean {
  const n = points.length;
  if (n < 3) return false;
  const top = new Float64Array(n);
  const bottom = new Float64Array(n);
  const order: number[] = [];
  for (let i = 0; i < n; i++) {
    const a = points[i] as Point;
    const b = points[(i + 1) % n] as Point;
    if (a.x === b.x && a.y === b.y) return false;
    top[i] = Math.min(a.y, b.y);
    bottom[i] = Math.max(a.y, b.y);
    order.push(i);
  }
  order.sort((i, j) => (top[i] as number) - (top[j] as number));
  const active: number[] = [];
  for (const i of order) {
    const start = top[i] as number;
    let kept = 0;
    for (let k = 0; k < active.length; k++) {
      const j = active[k] as number;
      if ((bottom[j] as number) >= start) active[kept++] = j;
    }
    active.length = kept;
    const a = points[i] as Point;
    const b = points[(i + 1) % n] as Point;
    const minX = a.x < b.x ? a.x : b.x;
    const maxX = a.x < b.x ? b.x : a.x;
    for (const j of active) {
      if (j === (i + 1) % n || i === (j + 1) % n) continue;
      const c = points[j] as Point;
      const d = points[(j + 1) % n] as Point;
      if ((c.x > d.x ? c.x : d.x) < minX || (c.x < d.x ? c.x : d.x) > maxX) continue;
      if (segmentsCross(a, b, c, d)) return false;
    }
    active.push(i);
  }
  return true;
}

/** True when every coordinate is a finite number. */
export function pointsAreFinite(points: readonly Point[]): boolean {
  return points.every((p) => Number.isFinite(p.x) && Number.isFinite(p.y));
}

/** Distance from a point to the segment ab, mm. */
export function pointSegmentDistance(p: Point, a: Point, b: Point): number {
  const abx = b.x - a.x;
  const aby = b.y - a.y;
  const squared = abx * abx + aby * aby;
  const t = squared === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * abx + (p.y - a.y) * aby) / squared));
  return Math.hypot(p.x - (a.x + t * abx), p.y - (a.y + t * aby));
}

/**
 * Least distance between two open polylines, mm: for polylines that do not cross, the least
 * vertex-to-segment distance either way (0 when they cross).
 */
export function polylinesDistance(first: readonly Point[], second: readonly Point[]): number {
  let best = Infinity;
  for (let i = 0; i + 1 < first.length; i++) {
    const a = first[i] as Point;
    const b = first[i + 1] as Point;
    for (let j = 0; j + 1 < second.length; j++) {
      const c = second[j] as Point;
      const d = second[j + 1] as Point;
      if (segmentsCross(a, b, c, d)) return 0;
    }
  }
  for (const p of first) {
    for (let j = 0; j + 1 < second.length; j++) best = Math.min(best, pointSegmentDistance(p, second[j] as Point, second[j + 1] as Point));
  }
  for (const p of second) {
    for (let i = 0; i + 1 < first.length; i++) best = Math.min(best, pointSegmentDistance(p, first[i] as Point, first[i + 1] as Point));
  }
  return best;
}
