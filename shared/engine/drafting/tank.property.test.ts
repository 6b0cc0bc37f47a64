import { Clipper, PointInPolygonResult } from '@countertype/clipper2-ts';
import { Bezier } from 'bezier-js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { draft } from '../index';
import { polygonIsSimple, polygonSignedArea } from '../geometry/polygon';
import { tankEdgesBuild } from './tank-edges';
import { tankFrameBuild } from './tank-frame';
import { tankSpecResolve } from './tank-params';
import type { Draft, DraftInput, Segment } from '../types';

/** Property runs: enough to explore, few enough that the engine suite runs in seconds. */
const RUNS = 200;
/** Issue rules. */
const SEAM_MATCH_MM = 1;
const LENGTH_AGREEMENT_MM = 0.1;
/** Front neckline minimum, 3 in (common practice), in cm. */
const MIN_FRONT_NECK_CM = 7.62;

/** The cutting line is kept to 0.001 mm per coordinate; a stitching point may sit a hair outside it. */
const CUT_ROUNDING_MM = 0.01;

function distanceToOutline(p: { x: number; y: number }, outline: { x: number; y: number }[]): number {
  let best = Infinity;
  outline.forEach((a, i) => {
    const b = outline[(i + 1) % outline.length]!;
    const abx = b.x - a.x;
    const aby = b.y - a.y;
    const t = Math.max(0, Math.min(1, ((p.x - a.x) * abx + (p.y - a.y) * aby) / (abx * abx + aby * aby || 1)));
    best = Math.min(best, Math.hypot(p.x - (a.x + t * abx), p.y - (a.y + t * aby)));
  });
  return best;
}

const cm = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

/**
 * Plausible bodies and parameters in centimetres: bust 70–160, hip 75–170, armhole depth
 * 15–30 (issue ranges), lengths and necklines in their ranges. Some combinations break a
 * consistency rule on purpose; those must be refused with the right field named.
 */
const inputArbitrary = fc
  .record({
    bust: cm(70, 160),
    hip: cm(75, 170),
    waist: fc.option(cm(55, 150), { nil: undefined }),
    armholeDepth: cm(15, 30),
    lengthBelowArmhole: cm(8, 60),
    stretch: cm(0, 100),
    bustEase: cm(-15, 5),
    hipEase: cm(-10, 10),
    frontNeckShare: cm(0.05, 1.05),
    backNeckShare: cm(0.05, 0.6),
    strapInset: cm(4, 8),
    strapWidth: cm(1.5, 4),
    shoulderSlope: cm(0, 2),
    racerShare: fc.option(cm(0.2, 1.1), { nil: undefined }),
    sideHemRise: cm(0, 5),
    hemAllowance: cm(0, 3),
    seamAllowance: cm(0, 1.5),
    edgeFinish: fc.constantFrom('tape' as const, 'band' as const),
  })
  .map((b): DraftInput => {
    const strapOuter = b.strapInset + b.strapWidth;
    return {
      unit: 'cm',
      measurements: { bust: b.bust, hip: b.hip, armholeDepth: b.armholeDepth, ...(b.waist === undefined ? {} : { waist: b.waist }) },
      fabric: { stretch: b.stretch, recovery: 'good' },
      style: 'tank',
      params: {
        length: Math.max(25, b.armholeDepth + b.lengthBelowArmhole),
        bustEase: b.bustEase,
        hipEase: b.hipEase,
        frontNeckDepth: Math.max(1, b.frontNeckShare * b.armholeDepth),
        backNeckDepth: Math.max(1, b.backNeckShare * b.armholeDepth),
        strapInset: b.strapInset,
        strapWidth: b.strapWidth,
        shoulderSlope: b.shoulderSlope,
        ...(b.racerShare === undefined ? {} : { racerBackInset: Math.max(1.5, b.racerShare * strapOuter) }),
        sideHemRise: b.sideHemRise,
        hemAllowance: b.hemAllowance,
        seamAllowance: b.seamAllowance,
        edgeFinish: b.edgeFinish,
      },
    };
  });

/** Values this close to a limit count as on it, cm (the engine allows 1e-6 mm of rounding). */
const EDGE_CM = 1e-7;

/** The consistency rules restated from the issue and trade notes, in cm: the fields that break one. */
function brokenFields(input: DraftInput): string[] {
  const p = input.params!;
  const a = input.measurements.armholeDepth;
  const broken: string[] = [];
  if (p.length! < a + p.sideHemRise! + 5 - EDGE_CM) broken.push('params.length');
  if (p.frontNeckDepth! > a + EDGE_CM) broken.push('params.frontNeckDepth');
  const backMax = p.racerBackInset === undefined ? a : a / 2 - 1.5;
  if (p.backNeckDepth! > backMax + EDGE_CM) broken.push('params.backNeckDepth');
  const quarterBust = (input.measurements.bust * (1 + p.bustEase! / 100)) / 4;
  if (p.strapInset! + p.strapWidth! + 2.5 > quarterBust + EDGE_CM) broken.push('params.strapInset');
  if (p.shoulderSlope! > Math.min(p.strapWidth!, a / 4) + EDGE_CM) broken.push('params.shoulderSlope');
  if (p.racerBackInset !== undefined && p.racerBackInset > p.strapInset! + p.strapWidth! - 1 + EDGE_CM) broken.push('params.racerBackInset');
  return broken;
}

/** A racer strap narrower than 10 mm between back neck and back armhole is refused (engine rule). */
const MIN_RACER_STRAP_MM = 10;
/** Near the limit, the engine's flattened curves and bezier-js's samples may fall either side. */
const RACER_STRAP_BAND_MM = 0.3;

/**
 * Narrowest racer strap, mm, measured on bezier-js samples (reference library) of the back's
 * neck and armhole curves as the engine builds them.
 */
function racerStrapWidth(input: DraftInput): number {
  const spec = tankSpecResolve(input);
  const back = tankEdgesBuild(spec, tankFrameBuild(spec), 'back');
  const sample = (segments: Segment[]) =>
    segments.flatMap((s) =>
      s.kind === 'line' ? [s.from, s.to] : new Bezier(s.from.x, s.from.y, s.c1.x, s.c1.y, s.c2.x, s.c2.y, s.to.x, s.to.y).getLUT(200),
    );
  const neck = sample(back.neck);
  const armhole = sample(back.armhole);
  let best = Infinity;
  for (const p of neck) for (const q of armhole) best = Math.min(best, Math.hypot(p.x - q.x, p.y - q.y));
  return best;
}

/** The warnings the input should raise, restated (worn-stretch arithmetic; 3 in neckline, common practice). */
function expectedWarnings(input: DraftInput): string[] {
  const p = input.params!;
  const needed = (ease: number) => (ease < 0 ? (1 / (1 + ease / 100) - 1) * 100 : 0);
  const codes: string[] = [];
  if (needed(p.bustEase!) > input.fabric.stretch) codes.push('stretch-insufficient');
  if (needed(p.hipEase!) > input.fabric.stretch) codes.push('hip-stretch-insufficient');
  if (p.frontNeckDepth! < MIN_FRONT_NECK_CM) codes.push('neckline-shallow');
  return codes;
}

function everyNumber(value: unknown, visit: (n: number) => void): void {
  if (typeof value === 'number') visit(value);
  else if (Array.isArray(value)) value.forEach((v) => everyNumber(v, visit));
  else if (value && typeof value === 'object') Object.values(value).forEach((v) => everyNumber(v, visit));
}

function referenceLength(segments: Segment[]): number {
  return segments.reduce(
    (sum, s) =>
      sum +
      (s.kind === 'line'
        ? Math.hypot(s.to.x - s.from.x, s.to.y - s.from.y)
        : new Bezier(s.from.x, s.from.y, s.c1.x, s.c1.y, s.c2.x, s.c2.y, s.to.x, s.to.y).length()),
    0,
  );
}

function checkDraft(d: Draft, input: DraftInput): void {
  const notFinite: number[] = [];
  everyNumber(d, (n) => {
    if (!Number.isFinite(n)) notFinite.push(n);
  });
  expect(notFinite).toEqual([]);
  for (const piece of d.pieces) {
    expect(polygonIsSimple(piece.stitching.polyline)).toBe(true);
    expect(polygonIsSimple(piece.cutting.polyline)).toBe(true);
    const stitchingArea = polygonSignedArea(piece.stitching.polyline);
    const cuttingArea = polygonSignedArea(piece.cutting.polyline);
    expect(Math.abs(stitchingArea)).toBeGreaterThan(0);
    expect(Math.sign(cuttingArea)).toBe(Math.sign(stitchingArea));
    expect(Math.abs(cuttingArea)).toBeGreaterThanOrEqual(Math.abs(stitchingArea) - 1);
    // The cutting line encloses the stitching line (point in polygon by Clipper2, reference
    // library), allowing for the cutting line's rounding where an allowance is (nearly) 0.
    for (const point of piece.stitching.polyline) {
      if (Clipper.pointInPolygonD(point, piece.cutting.polyline) !== PointInPolygonResult.IsOutside) continue;
      expect(distanceToOutline(point, piece.cutting.polyline)).toBeLessThan(CUT_ROUNDING_MM);
    }
    expect(piece.bounds.minX).toBe(0);
    expect(piece.fold).not.toBeNull();
    for (const edge of piece.edges) {
      expect(Math.abs(edge.length - referenceLength(edge.segments))).toBeLessThan(LENGTH_AGREEMENT_MM);
    }
  }
  const [front, back] = d.pieces;
  for (const seam of ['side', 'shoulder'] as const) {
    const a = front!.edges.find((e) => e.name === seam)!.length;
    const b = back!.edges.find((e) => e.name === seam)!.length;
    expect(Math.abs(a - b)).toBeLessThanOrEqual(SEAM_MATCH_MM);
  }
  expect(d.warnings.map((w) => w.code).sort()).toEqual(expectedWarnings(input).sort());
  for (const b of d.bindings) expect(b.cutLength).toBeCloseTo(b.openingLength * b.ratio + 2 * b.joinAllowance, 6);
}

describe('tank top drafts over plausible bodies (fast-check)', () => {
  it('draft every consistent input soundly and refuse every inconsistent one by the field it breaks', () => {
    let drafted = 0;
    fc.assert(
      fc.property(inputArbitrary, (input) => {
        const broken = brokenFields(input);
        if (broken.length === 0 && input.params?.racerBackInset !== undefined) {
          const strap = racerStrapWidth(input);
          if (Math.abs(strap - MIN_RACER_STRAP_MM) < RACER_STRAP_BAND_MM) return;
          if (strap < MIN_RACER_STRAP_MM) broken.push('params.racerBackInset');
        }
        const result = draft(input);
        if (broken.length > 0) {
          expect(result.ok).toBe(false);
          if (!result.ok) expect(result.errors.map((e) => e.path).sort()).toEqual(broken.sort());
          return;
        }
        if (!result.ok) throw new Error(JSON.stringify(result.errors));
        drafted++;
        checkDraft(result.draft, input);
      }),
      { numRuns: RUNS },
    );
    // Most generated inputs are consistent, so the geometry checks ran many times.
    expect(drafted).toBeGreaterThan(RUNS / 3);
  });
});
