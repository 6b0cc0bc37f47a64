/**
 * Edge lengths along the stitching line, mm, measured with svg-path-properties 1.3.0
 * (Gauss–Legendre quadrature on the path data), the same data an SVG tool would read.
 */
import { svgPathProperties } from 'svg-path-properties';
import { pathDataFromSegments } from '../export/path-data';
import type { EdgeName, NamedEdge, Point, Segment } from '../types';

type PathProperties = InstanceType<typeof svgPathProperties>;

/** Recently measured paths: front and back share most edges, and notches re-read them. */
const propertiesCache = new Map<string, PathProperties>();
const PROPERTIES_CACHE_SIZE = 64;

function propertiesOf(d: string): PathProperties {
  let properties = propertiesCache.get(d);
  if (!properties) {
    properties = new svgPathProperties(d);
    if (propertiesCache.size >= PROPERTIES_CACHE_SIZE) {
      const oldest = propertiesCache.keys().next().value;
      if (oldest !== undefined) propertiesCache.delete(oldest);
    }
    propertiesCache.set(d, properties);
  }
  return properties;
}

/** Length along SVG path data, mm. */
export function pathDataLength(d: string): number {
  if (d === '') return 0;
  return propertiesOf(d).getTotalLength();
}

/** A named edge: its path data in mm and its length along the curve, mm. */
export function edgeMeasure(name: EdgeName, segments: Segment[]): NamedEdge {
  const d = pathDataFromSegments(segments);
  return { name, d, length: pathDataLength(d), segments };
}

/** Point and unit tangent at a distance along an edge, mm (clamped to the edge). */
export function edgePointAt(edge: NamedEdge, distance: number): { point: Point; tangent: Point } {
  const properties = propertiesOf(edge.d);
  const at = Math.min(Math.max(distance, 0), properties.getTotalLength());
  const point = properties.getPointAtLength(at);
  const tangent = properties.getTangentAtLength(at);
  const size = Math.hypot(tangent.x, tangent.y) || 1;
  return { point: { x: point.x, y: point.y }, tangent: { x: tangent.x / size, y: tangent.y / size } };
}

/** Length along a chain of segments, mm (through its SVG path data). */
export function segmentsLength(segments: Segment[]): number {
  return pathDataLength(pathDataFromSegments(segments));
}
