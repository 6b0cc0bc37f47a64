import { Bezier } from 'bezier-js';
import { describe, expect, it } from 'vitest';
import { pathDataFromSegments } from '../export/path-data';
import { pathDataLength } from '../finishing/edge-length';
import type { CubicSegment } from '../types';
import { cubicMake, lineMake, segmentDerivativeAt, segmentPointAt, segmentsFlatten, segmentsReverse } from './bezier';

/** Edge lengths must agree with the reference library within this (issue rule), mm. */
const LENGTH_AGREEMENT_MM = 0.1;

/** Handle length of the usual cubic approximating a quarter circle: 4/3 · (√2 − 1) (Riškus, 2006). */
const QUARTER_CIRCLE_KAPPA = (4 / 3) * (Math.SQRT2 - 1);

function reference(segment: CubicSegment): Bezier {
  return new Bezier(segment.from.x, segment.from.y, segment.c1.x, segment.c1.y, segment.c2.x, segment.c2.y, segment.to.x, segment.to.y);
}

describe('cubic Bézier evaluation', () => {
  const curve = cubicMake({ x: 0, y: 0 }, { x: 30, y: 80 }, { x: 120, y: 90 }, { x: 150, y: 10 });

  it('matches bezier-js (reference library) at every sampled parameter', () => {
    const ref = reference(curve);
    for (let t = 0; t <= 1; t += 0.125) {
      const p = segmentPointAt(curve, t);
      const q = ref.get(t);
      expect(Math.hypot(p.x - q.x, p.y - q.y)).toBeLessThan(1e-9);
      const d = segmentDerivativeAt(curve, t);
      const e = ref.derivative(t);
      expect(Math.hypot(d.x - e.x, d.y - e.y)).toBeLessThan(1e-9);
    }
  });

  it('keeps a flattened curve within its tolerance of the curve (curve sampled densely by bezier-js)', () => {
    const tolerance = 0.05;
    const points = segmentsFlatten([curve], tolerance);
    // 5 000 samples on a 250 mm curve lie 0.05 mm apart: the nearest-sample distance overstates
    // the true distance by under 0.004 mm at these distances.
    const samples = reference(curve).getLUT(5000);
    for (let i = 0; i + 1 < points.length; i++) {
      const a = points[i]!;
      const b = points[i + 1]!;
      const middle = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
      let distance = Infinity;
      for (const q of samples) distance = Math.min(distance, Math.hypot(q.x - middle.x, q.y - middle.y));
      expect(distance).toBeLessThanOrEqual(tolerance + 0.004);
    }
  });

  it('reverses a chain of segments end for end', () => {
    const chain = [lineMake({ x: -10, y: 0 }, { x: 0, y: 0 }), curve];
    const reversed = segmentsReverse(chain);
    expect(reversed[0]!.from).toEqual(curve.to);
    expect(reversed[1]!.to).toEqual({ x: -10, y: 0 });
    expect(pathDataLength(pathDataFromSegments(reversed))).toBeCloseTo(pathDataLength(pathDataFromSegments(chain)), 6);
  });
});

describe('lengths measured with svg-path-properties', () => {
  it('measures a straight line as its Euclidean length (closed form)', () => {
    const d = pathDataFromSegments([lineMake({ x: 10, y: 20 }, { x: 40, y: 60 })]);
    expect(pathDataLength(d)).toBeCloseTo(50, 9);
  });

  it('measures the quarter-circle cubic slightly longer than the true arc (πr/2)', () => {
    const r = 100;
    const k = QUARTER_CIRCLE_KAPPA * r;
    const quarter = cubicMake({ x: r, y: 0 }, { x: r, y: k }, { x: k, y: r }, { x: 0, y: r });
    const length = pathDataLength(pathDataFromSegments([quarter]));
    const arc = (Math.PI * r) / 2;
    // The cubic bulges out by at most 0.027 % of r (Riškus), so it is a little longer than the arc.
    expect(length).toBeGreaterThan(arc);
    expect(length - arc).toBeLessThan(0.03);
    expect(Math.abs(length - reference(quarter).length())).toBeLessThan(LENGTH_AGREEMENT_MM);
  });

  it('agrees with bezier-js (reference library) within 0.1 mm on assorted curves', () => {
    const curves = [
      cubicMake({ x: 76, y: 0 }, { x: 70, y: 80 }, { x: 40, y: 150 }, { x: 0, y: 152 }),
      cubicMake({ x: 0, y: 0 }, { x: 0, y: 0 }, { x: 200, y: 0 }, { x: 200, y: 5 }),
      cubicMake({ x: 0, y: 0 }, { x: 300, y: 300 }, { x: -300, y: 300 }, { x: 0, y: 0.5 }),
    ];
    for (const curve of curves) {
      expect(Math.abs(pathDataLength(pathDataFromSegments([curve])) - reference(curve).length())).toBeLessThan(
        LENGTH_AGREEMENT_MM,
      );
    }
  });
});
