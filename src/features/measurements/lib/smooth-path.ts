/** A point in the body diagram's own drawing units (the SVG viewBox). */
export type DiagramPoint = readonly [number, number];

function fmt(n: number): string {
  return String(Math.round(n * 100) / 100);
}

/**
 * SVG path data through every point, smoothed with a Catmull-Rom spline turned into cubic
 * Béziers (tension 1/6 per side: the usual uniform Catmull-Rom to Bézier conversion).
 * A closed path wraps the spline round so the start has no corner.
 */
export function smoothPathData(points: readonly DiagramPoint[], closed = false): string {
  const n = points.length;
  if (n === 0) return '';
  const at = (i: number): DiagramPoint => {
    const index = closed ? (i + n) % n : Math.min(Math.max(i, 0), n - 1);
    return points[index] as DiagramPoint;
  };
  const first = at(0);
  let d = `M${fmt(first[0])} ${fmt(first[1])}`;
  const segments = closed ? n : n - 1;
  for (let i = 0; i < segments; i++) {
    const p0 = at(i - 1);
    const p1 = at(i);
    const p2 = at(i + 1);
    const p3 = at(i + 2);
    const c1x = p1[0] + (p2[0] - p0[0]) / 6;
    const c1y = p1[1] + (p2[1] - p0[1]) / 6;
    const c2x = p2[0] - (p3[0] - p1[0]) / 6;
    const c2y = p2[1] - (p3[1] - p1[1]) / 6;
    d += ` C${fmt(c1x)} ${fmt(c1y)} ${fmt(c2x)} ${fmt(c2y)} ${fmt(p2[0])} ${fmt(p2[1])}`;
  }
  return closed ? `${d} Z` : d;
}

/** The same points reflected about the vertical line x = `axis`, in reverse order. */
export function pointsMirror(points: readonly DiagramPoint[], axis: number): DiagramPoint[] {
  return [...points].reverse().map(([x, y]) => [2 * axis - x, y] as const);
}

/** The points moved by (dx, dy). */
export function pointsShift(points: readonly DiagramPoint[], dx: number, dy = 0): DiagramPoint[] {
  return points.map(([x, y]) => [x + dx, y + dy] as const);
}
