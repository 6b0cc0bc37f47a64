import { Clipper, EndType, JoinType } from '@countertype/clipper2-ts';
import { describe, expect, it } from 'vitest';
import type { Point } from '../types';
import { MITRE_LIMIT, outlineOffset, type AllowanceEdge } from './offset';
import { pointSub, vectorNormalize } from './point';
import { pointsBounds, polygonIsSimple, polygonSignedArea } from './polygon';

/** Agreement between two offset outlines built different ways, as a share of the area. */
const AREA_AGREEMENT = 0.002;

function straightEdge(from: Point, to: Point, allowance: number): AllowanceEdge {
  const direction = vectorNormalize(pointSub(to, from));
  return { polyline: [from, to], startDirection: direction, endDirection: direction, allowance };
}

function polylineEdge(points: Point[], allowance: number): AllowanceEdge {
  return {
    polyline: points,
    startDirection: vectorNormalize(pointSub(points[1]!, points[0]!)),
    endDirection: vectorNormalize(pointSub(points[points.length - 1]!, points[points.length - 2]!)),
    allowance,
  };
}

function distanceToSegment(p: Point, a: Point, b: Point): number {
  const abx = b.x - a.x;
  const aby = b.y - a.y;
  const t = Math.max(0, Math.min(1, ((p.x - a.x) * abx + (p.y - a.y) * aby) / (abx * abx + aby * aby || 1)));
  return Math.hypot(p.x - (a.x + t * abx), p.y - (a.y + t * aby));
}

function distanceToOutline(p: Point, outline: Point[]): number {
  let best = Infinity;
  outline.forEach((a, i) => {
    best = Math.min(best, distanceToSegment(p, a, outline[(i + 1) % outline.length]!));
  });
  return best;
}

describe('cutting outlines from stitching outlines', () => {
  it('adds a different allowance to each side of a rectangle, squared at the fold (closed form)', () => {
    // Fold down the left (no allowance), hem 12 mm, side 10 mm, shoulder 10 mm.
    const edges = [
      straightEdge({ x: 0, y: 0 }, { x: 0, y: 200 }, 0),
      straightEdge({ x: 0, y: 200 }, { x: 100, y: 200 }, 12),
      straightEdge({ x: 100, y: 200 }, { x: 100, y: 0 }, 10),
      straightEdge({ x: 100, y: 0 }, { x: 0, y: 0 }, 10),
    ];
    const cut = outlineOffset(edges);
    const bounds = pointsBounds(cut);
    expect(bounds.minX).toBeCloseTo(0, 3);
    expect(bounds.maxX).toBeCloseTo(110, 3);
    expect(bounds.minY).toBeCloseTo(-10, 3);
    expect(bounds.maxY).toBeCloseTo(212, 3);
    expect(Math.abs(polygonSignedArea(cut))).toBeCloseTo(110 * 222, 1);
    expect(polygonIsSimple(cut)).toBe(true);
  });

  it('keeps the orientation of the stitching outline and starts near its first point', () => {
    const edges = [
      straightEdge({ x: 0, y: 0 }, { x: 0, y: 200 }, 0),
      straightEdge({ x: 0, y: 200 }, { x: 100, y: 200 }, 12),
      straightEdge({ x: 100, y: 200 }, { x: 100, y: 0 }, 10),
      straightEdge({ x: 100, y: 0 }, { x: 0, y: 0 }, 0),
    ];
    const cut = outlineOffset(edges);
    const stitching = edges.map((e) => e.polyline[0]!);
    expect(Math.sign(polygonSignedArea(cut))).toBe(Math.sign(polygonSignedArea(stitching)));
    expect(cut[0]).toEqual({ x: 0, y: 0 });
  });

  it('agrees with Clipper2 mitred polygon offsetting (reference library) for an even allowance', () => {
    // A circle of radius 100 sampled every 2°, travelled so that outward is a clockwise turn.
    const circle = Array.from({ length: 181 }, (_, i) => {
      const angle = (-2 * Math.PI * i) / 180;
      return { x: 100 * Math.cos(angle), y: 100 * Math.sin(angle) };
    });
    const halves = [circle.slice(0, 91), circle.slice(90, 181)].map((points) => polylineEdge(points, 10));
    const cut = outlineOffset(halves);
    const reference = Clipper.inflatePathsD([circle.slice(0, 180)], 10, JoinType.Miter, EndType.Polygon, MITRE_LIMIT, 3);
    const referenceArea = Math.abs(Clipper.areaD(reference[0]!));
    expect(Math.abs(Math.abs(polygonSignedArea(cut)) - referenceArea) / referenceArea).toBeLessThan(AREA_AGREEMENT);
    // And with the closed form: a circle of radius 110 (π r²), within the sampling's error.
    expect(Math.abs(Math.abs(polygonSignedArea(cut)) - Math.PI * 110 * 110) / (Math.PI * 110 * 110)).toBeLessThan(AREA_AGREEMENT);
  });

  it('limits the mitre at an acute corner to the mitre limit', () => {
    // A 20° spike: a full mitre would reach 10 / sin(10°) ≈ 57.6 mm from the corner.
    const tip = { x: 200, y: 0 };
    const edges = [
      straightEdge({ x: 0, y: -35.27 }, tip, 10),
      straightEdge(tip, { x: 0, y: 35.27 }, 10),
      straightEdge({ x: 0, y: 35.27 }, { x: 0, y: -35.27 }, 10),
    ];
    const cut = outlineOffset(edges);
    const stitching = edges.map((e) => e.polyline[0]!);
    expect(polygonIsSimple(cut)).toBe(true);
    for (const p of cut) expect(distanceToOutline(p, stitching)).toBeLessThanOrEqual(MITRE_LIMIT * 10 + 1e-3);
    expect(Math.max(...cut.map((p) => p.x))).toBeLessThan(200 + MITRE_LIMIT * 10);
  });

  it('closes over a concave notch narrower than the allowance without loops', () => {
    // A rectangle whose top edge dips into a half circle of radius 4 mm; allowance 10 mm everywhere.
    const notch = Array.from({ length: 19 }, (_, i) => {
      const angle = (Math.PI * i) / 18;
      return { x: 50 + 4 * Math.cos(angle), y: 4 * Math.sin(angle) };
    });
    const top = [{ x: 100, y: 0 }, ...notch, { x: 0, y: 0 }];
    const edges = [
      straightEdge({ x: 0, y: 0 }, { x: 0, y: 100 }, 10),
      straightEdge({ x: 0, y: 100 }, { x: 100, y: 100 }, 10),
      straightEdge({ x: 100, y: 100 }, { x: 100, y: 0 }, 10),
      polylineEdge(top, 10),
    ];
    const cut = outlineOffset(edges);
    expect(polygonIsSimple(cut)).toBe(true);
    expect(pointsBounds(cut).minY).toBeCloseTo(-10, 3);
    // The allowance fills the notch: no cutting point lies below the offset top line near it.
    expect(cut.filter((p) => p.x > 40 && p.x < 60).every((p) => p.y <= -10 + 1e-3 || p.y >= 100)).toBe(true);
  });
});
