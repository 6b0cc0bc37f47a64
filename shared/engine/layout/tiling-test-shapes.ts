/**
 * Simple shapes for the tiling's tests and benches: rectangles and an L-shaped piece,
 * given as print items (closed cutting polylines, mm).
 */
import type { Point } from '../types';
import type { PrintItem } from './tiling-types';

/** A rectangular piece of `width` × `height` mm with its top-left corner at the origin. */
export function rectangleItem(id: string, width: number, height: number): PrintItem {
  const outline: Point[] = [
    { x: 0, y: 0 },
    { x: width, y: 0 },
    { x: width, y: height },
    { x: 0, y: height },
  ];
  return { id, extent: { x: 0, y: 0, width, height }, outlines: [outline], marks: [] };
}

/**
 * An L-shaped piece: a `width` × `height` outline with the top-right `notchWidth` ×
 * `notchHeight` corner cut away.
 */
export function lShapeItem(id: string, width: number, height: number, notchWidth: number, notchHeight: number): PrintItem {
  const outline: Point[] = [
    { x: 0, y: 0 },
    { x: width - notchWidth, y: 0 },
    { x: width - notchWidth, y: notchHeight },
    { x: width, y: notchHeight },
    { x: width, y: height },
    { x: 0, y: height },
  ];
  return { id, extent: { x: 0, y: 0, width, height }, outlines: [outline], marks: [] };
}

/** Points along a closed polyline no further than `spacing` mm apart. */
export function polylineDensify(polyline: readonly Point[], spacing: number): Point[] {
  const points: Point[] = [];
  for (let i = 0; i < polyline.length; i++) {
    const a = polyline[i] as Point;
    const b = polyline[(i + 1) % polyline.length] as Point;
    const steps = Math.max(1, Math.ceil(Math.hypot(b.x - a.x, b.y - a.y) / spacing));
    for (let s = 0; s < steps; s++) points.push({ x: a.x + ((b.x - a.x) * s) / steps, y: a.y + ((b.y - a.y) * s) / steps });
  }
  return points;
}
