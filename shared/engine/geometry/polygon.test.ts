import { Clipper } from '@countertype/clipper2-ts';
import { describe, expect, it } from 'vitest';
import { pointsBounds, polygonIsSimple, polygonSignedArea } from './polygon';

describe('polygons', () => {
  it('finds the area of a 30 × 40 rectangle (closed form) and agrees with Clipper2 (reference library)', () => {
    const rectangle = [
      { x: 0, y: 0 },
      { x: 30, y: 0 },
      { x: 30, y: 40 },
      { x: 0, y: 40 },
    ];
    expect(Math.abs(polygonSignedArea(rectangle))).toBe(1200);
    expect(Math.abs(polygonSignedArea(rectangle))).toBeCloseTo(Math.abs(Clipper.areaD(rectangle)), 9);
    expect(Math.sign(polygonSignedArea(rectangle))).toBe(-Math.sign(polygonSignedArea([...rectangle].reverse())));
  });

  it('finds the bounds of a set of points', () => {
    expect(pointsBounds([{ x: 3, y: -2 }, { x: -1, y: 5 }])).toEqual({ minX: -1, minY: -2, maxX: 3, maxY: 5, width: 4, height: 7 });
  });

  it('tells a simple polygon from a bow tie', () => {
    const square = [
      { x: 0, y: 0 },
      { x: 10, y: 0 },
      { x: 10, y: 10 },
      { x: 0, y: 10 },
    ];
    const bowTie = [
      { x: 0, y: 0 },
      { x: 10, y: 10 },
      { x: 10, y: 0 },
      { x: 0, y: 10 },
    ];
    expect(polygonIsSimple(square)).toBe(true);
    expect(polygonIsSimple(bowTie)).toBe(false);
  });

  it('finds a spike that folds back onto its own edge, and a repeated point', () => {
    const spike = [
      { x: 0, y: 0 },
      { x: 10, y: 0 },
      { x: 10, y: 10 },
      { x: 5, y: 10 },
      { x: 12, y: 10 },
      { x: 0, y: 10 },
    ];
    expect(polygonIsSimple(spike)).toBe(false);
    expect(polygonIsSimple([{ x: 0, y: 0 }, { x: 0, y: 0 }, { x: 5, y: 5 }, { x: 0, y: 5 }])).toBe(false);
  });

  it('accepts a finely sampled circle (many short edges)', () => {
    const circle = Array.from({ length: 500 }, (_, i) => ({
      x: 100 * Math.cos((2 * Math.PI * i) / 500),
      y: 100 * Math.sin((2 * Math.PI * i) / 500),
    }));
    expect(polygonIsSimple(circle)).toBe(true);
    // Area of the inscribed 500-gon: (n/2) r² sin(2π/n) (closed form).
    expect(Math.abs(polygonSignedArea(circle))).toBeCloseTo((500 / 2) * 100 * 100 * Math.sin((2 * Math.PI) / 500), 6);
  });
});
