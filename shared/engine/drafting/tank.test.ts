import { Bezier } from 'bezier-js';
import { describe, expect, it } from 'vitest';
import { lengthToMm } from '../../units';
import { polygonIsSimple } from '../geometry/polygon';
import { EXAMPLE_INPUT, METRIC_INPUT, draftOrThrow } from '../test-support/inputs';
import type { Draft, EdgeName, Piece, Point, Segment } from '../types';

/** Edge lengths must agree with the reference library within this (issue rule), mm. */
const LENGTH_AGREEMENT_MM = 0.1;
/** Seams sewn together must match within this (issue rule), mm. */
const SEAM_MATCH_MM = 1;
/** A right angle within this many degrees. */
const RIGHT_ANGLE_DEGREES = 0.01;
/** Exact arithmetic up to floating point, mm. */
const FLOAT_MM = 1e-6;

const inch = (value: number) => lengthToMm(value, 'in');

function edge(piece: Piece, name: EdgeName) {
  const found = piece.edges.find((e) => e.name === name);
  if (!found) throw new Error(`no ${name}`);
  return found;
}

function piece(draft: Draft, id: string): Piece {
  const found = draft.pieces.find((p) => p.id === id);
  if (!found) throw new Error(`no ${id}`);
  return found;
}

/** Length of a chain by bezier-js (reference library) and the closed form for lines. */
function referenceLength(segments: Segment[]): number {
  return segments.reduce((sum, s) => {
    if (s.kind === 'line') return sum + Math.hypot(s.to.x - s.from.x, s.to.y - s.from.y);
    return sum + new Bezier(s.from.x, s.from.y, s.c1.x, s.c1.y, s.c2.x, s.c2.y, s.to.x, s.to.y).length();
  }, 0);
}

/** Tangent direction at the start (t = 0) or end (t = 1) of a segment, from bezier-js. */
function tangent(segment: Segment, t: 0 | 1): Point {
  if (segment.kind === 'line') return { x: segment.to.x - segment.from.x, y: segment.to.y - segment.from.y };
  const { from, c1, c2, to } = segment;
  const curve = new Bezier(from.x, from.y, c1.x, c1.y, c2.x, c2.y, to.x, to.y);
  const d = curve.derivative(t);
  return { x: d.x, y: d.y };
}

function angleDegrees(a: Point, b: Point): number {
  const cos = (a.x * b.x + a.y * b.y) / (Math.hypot(a.x, a.y) * Math.hypot(b.x, b.y));
  return (Math.acos(Math.max(-1, Math.min(1, cos))) * 180) / Math.PI;
}

describe('worked example (common practice): bust 38 in with 3 in negative ease, hip 43 in with none', () => {
  const draft = draftOrThrow({
    unit: 'in',
    measurements: { bust: 38, hip: 43, armholeDepth: 8.5 },
    fabric: { stretch: 40, recovery: 'good' },
    style: 'tank',
    params: { bustEase: (-3 / 38) * 100, hipEase: 0, length: 25 },
  });
  const front = piece(draft, 'front');

  it('finishes the bust at 35 in, a quarter of 8 3/4 in at the underarm', () => {
    expect(draft.finished.bust).toBeCloseTo(inch(35), 6);
    expect(draft.finished.bustEase.mm).toBeCloseTo(inch(-3), 6);
    const underarm = edge(front, 'side').segments[0]!.from;
    expect(underarm.x).toBeCloseTo(inch(8.75), 6);
    expect(underarm.y).toBeCloseTo(inch(8.5), 6);
  });

  it('keeps the hip at 43 in, 10 3/4 in at the hem', () => {
    expect(draft.finished.hip).toBeCloseTo(inch(43), 6);
    const hemSide = edge(front, 'hem').segments.at(-1)!.to;
    expect(hemSide.x).toBeCloseTo(inch(10.75), 6);
  });

  it('needs 8.6 % stretch at the bust when worn (38 ÷ 35 − 1, worn-stretch arithmetic)', () => {
    expect(draft.finished.stretchNeeded).toBeCloseTo((38 / 35 - 1) * 100, 6);
  });
});

describe('the issue example input (inches)', () => {
  const draft = draftOrThrow(EXAMPLE_INPUT);
  const front = piece(draft, 'front');
  const back = piece(draft, 'back');

  it('cuts a front and a back, each once on the fold', () => {
    expect(draft.pieces.map((p) => p.id)).toEqual(['front', 'back']);
    for (const p of draft.pieces) {
      expect(p.cutCount).toBe(1);
      expect(p.onFold).toBe(true);
      expect(p.cutNote).toBe('cut 1 on fold');
      expect(p.fold?.from.x).toBe(0);
    }
    expect(draft.unit).toBe('in');
    expect(typeof draft.engineVersion).toBe('string');
  });

  it('measures every edge within 0.1 mm of bezier-js (reference library)', () => {
    for (const p of draft.pieces) {
      for (const e of p.edges) expect(Math.abs(e.length - referenceLength(e.segments))).toBeLessThan(LENGTH_AGREEMENT_MM);
    }
  });

  it('measures the fold as a straight line from the neck to the hem (closed form)', () => {
    expect(edge(front, 'fold').length).toBeCloseTo(inch(25 - 6), 6);
    expect(edge(back, 'fold').length).toBeCloseTo(inch(25 - 1), 6);
  });

  it('matches front and back side seams and shoulders within 1 mm', () => {
    for (const seam of ['side', 'shoulder'] as const) {
      expect(Math.abs(edge(front, seam).length - edge(back, seam).length)).toBeLessThanOrEqual(SEAM_MATCH_MM);
    }
  });

  it('meets the fold square with the neckline and the hem (tangents from bezier-js)', () => {
    for (const p of draft.pieces) {
      const fold = { x: 0, y: 1 };
      expect(Math.abs(angleDegrees(tangent(edge(p, 'neck').segments.at(-1)!, 1), fold) - 90)).toBeLessThan(RIGHT_ANGLE_DEGREES);
      expect(Math.abs(angleDegrees(tangent(edge(p, 'hem').segments[0]!, 0), fold) - 90)).toBeLessThan(RIGHT_ANGLE_DEGREES);
    }
  });

  it('meets the side seam square with the armhole at the underarm and with the hem', () => {
    for (const p of draft.pieces) {
      const side = edge(p, 'side').segments;
      const armholeEnd = tangent(edge(p, 'armhole').segments.at(-1)!, 1);
      expect(Math.abs(angleDegrees(armholeEnd, tangent(side[0]!, 0)) - 90)).toBeLessThan(RIGHT_ANGLE_DEGREES);
      const hemEnd = tangent(edge(p, 'hem').segments.at(-1)!, 1);
      expect(Math.abs(angleDegrees(hemEnd, tangent(side.at(-1)!, 1)) - 90)).toBeLessThan(RIGHT_ANGLE_DEGREES);
    }
  });

  it('raises the hem 1 in at the side seam and adds a 1/2 in hem allowance (common practice)', () => {
    const hem = edge(front, 'hem').segments;
    expect(hem[0]!.from.y - hem.at(-1)!.to.y).toBeCloseTo(inch(1), 6);
    expect(front.bounds.maxY).toBeCloseTo(inch(25 + 0.5), 2);
  });

  it('sets the strap 3 in from the fold and 1 in wide (common practice)', () => {
    const shoulder = edge(front, 'shoulder').segments[0]!;
    expect(shoulder.from.x).toBeCloseTo(inch(3), 6);
    expect(shoulder.to.x - shoulder.from.x).toBeCloseTo(inch(1), 6);
  });

  it('cuts the front neck to its own depth and the back neck to 1 in', () => {
    expect(edge(front, 'neck').segments.at(-1)!.to).toEqual({ x: 0, y: inch(6) });
    expect(edge(back, 'neck').segments.at(-1)!.to.y).toBeCloseTo(inch(1), 9);
  });

  it('adds allowances to the seams and the hem but none to taped edges or the fold (common practice)', () => {
    expect(front.allowances).toMatchObject({ fold: 0, neck: 0, armhole: 0, side: inch(3 / 8), shoulder: inch(3 / 8), hem: inch(1 / 2) });
    // The cutting line lies the side allowance outside the side seam at the underarm.
    expect(front.bounds.maxX).toBeGreaterThanOrEqual(inch(40 / 4 + 3 / 8) - 0.01);
  });

  it('keeps the cutting line its allowance away from the stitching line along every seam', () => {
    for (const p of draft.pieces) {
      for (const name of ['side', 'shoulder', 'hem'] as const) {
        const e = edge(p, name);
        const allowance = p.allowances[name];
        for (let i = 1; i < 10; i++) {
          const s = e.segments[0]!;
          const q = s.kind === 'line' ? { x: s.from.x + ((s.to.x - s.from.x) * i) / 10, y: s.from.y + ((s.to.y - s.from.y) * i) / 10 } : new Bezier(s.from.x, s.from.y, s.c1.x, s.c1.y, s.c2.x, s.c2.y, s.to.x, s.to.y).get(i / 10);
          // Near a neighbour without allowance (neck, armhole), that neighbour's edge is the cutting line.
          const ends = [s.from, s.to];
          if (ends.some((end) => Math.hypot(q.x - end.x, q.y - end.y) < allowance + 1)) continue;
          const distance = Math.min(
            ...p.cutting.polyline.map((a, k) => {
              const b = p.cutting.polyline[(k + 1) % p.cutting.polyline.length]!;
              const abx = b.x - a.x;
              const aby = b.y - a.y;
              const t = Math.max(0, Math.min(1, ((q.x - a.x) * abx + (q.y - a.y) * aby) / (abx * abx + aby * aby || 1)));
              return Math.hypot(q.x - (a.x + t * abx), q.y - (a.y + t * aby));
            }),
          );
          expect(Math.abs(distance - allowance)).toBeLessThan(0.1);
        }
      }
    }
  });

  it('draws simple closed outlines, the cutting line outside the stitching line', () => {
    for (const p of draft.pieces) {
      expect(polygonIsSimple(p.stitching.polyline)).toBe(true);
      expect(polygonIsSimple(p.cutting.polyline)).toBe(true);
      expect(p.stitching.d.startsWith('M')).toBe(true);
      expect(p.stitching.d.endsWith('Z')).toBe(true);
    }
  });

  it('notches the armhole quarters and the side seam', () => {
    // Front and back armholes are equally long here, so the half mark is the shoulder seam itself.
    const armholeNotches = [...front.notches, ...back.notches].filter((n) => n.edge === 'armhole');
    expect(armholeNotches.map((n) => n.kind).sort()).toEqual(['quarter', 'quarter']);
    expect(front.notches.some((n) => n.edge === 'side')).toBe(true);
    expect(front.notches.some((n) => n.edge === 'neck')).toBe(true);
    for (const n of [...front.notches, ...back.notches]) {
      expect(Math.hypot(n.inward.x, n.inward.y)).toBeCloseTo(1, 9);
      expect(n.depth).toBeGreaterThan(0);
    }
  });

  it('places each armhole quarter mark a quarter of the armhole from the underarm', () => {
    const frontArmhole = edge(front, 'armhole').length;
    const backArmhole = edge(back, 'armhole').length;
    const quarter = (frontArmhole + backArmhole) / 4;
    const first = front.notches.find((n) => n.edge === 'armhole' && n.kind === 'quarter');
    expect(first).toBeDefined();
    // Measured back from the underarm along the front armhole (bezier-js on the split curve).
    const s = edge(front, 'armhole').segments[0]!;
    if (s.kind !== 'cubic') throw new Error('armhole is a curve');
    const curve = new Bezier(s.from.x, s.from.y, s.c1.x, s.c1.y, s.c2.x, s.c2.y, s.to.x, s.to.y);
    const t = curve.project(first!.stitchAt).t ?? 0;
    expect(Math.abs(curve.split(t, 1).length() - quarter)).toBeLessThan(0.5);
  });
});

describe('a metric draft with a waist, a racer back and bands', () => {
  const draft = draftOrThrow(METRIC_INPUT);
  const front = piece(draft, 'front');
  const back = piece(draft, 'back');

  it('brings the back armhole in to the racer-back inset at half the armhole depth', () => {
    const racer = edge(back, 'armhole').segments[0]!.to;
    expect(racer.x).toBeCloseTo(60, 6);
    expect(racer.y).toBeCloseTo(105, 6);
    expect(edge(back, 'armhole').length).toBeGreaterThan(edge(front, 'armhole').length);
    expect(back.label.lines[0]).toContain('racer back');
  });

  it('shapes the side seam in to the waist and keeps seams matched', () => {
    expect(draft.finished.waist).not.toBeNull();
    expect(draft.finished.waist!).toBeLessThan(draft.finished.bust);
    expect(edge(front, 'side').segments).toHaveLength(2);
    expect(Math.abs(edge(front, 'side').length - edge(back, 'side').length)).toBeLessThanOrEqual(SEAM_MATCH_MM);
    expect(front.notches.some((n) => n.kind === 'waist')).toBe(true);
  });

  it('gives banded neck and armholes a seam allowance and notches the underarm on the side seam', () => {
    expect(front.allowances.neck).toBe(10);
    expect(front.allowances.armhole).toBe(10);
    expect(front.notches.some((n) => n.kind === 'underarm' && n.edge === 'side')).toBe(true);
  });

  it('derives the default bust ease from the stretch, within the 8–10 % fitted range (common practice)', () => {
    // 50 % stretch worn at a quarter of it: e = 12.5 %, capped at a 9 % reduction.
    expect(draft.finished.bustEase.percent).toBeCloseTo(-9, 9);
    expect(Math.abs(draft.finished.bust - 920 * 0.91)).toBeLessThan(FLOAT_MM);
  });
});
