/**
 * The stitching-line edges of a tank top front or back, as chains of lines and cubic Béziers
 * in mm. Each edge meets the fold and the side seam at a right angle (neck and hem at the
 * fold, armhole and hem at the side seam), so that opened pieces have no points or dips;
 * neck and armhole leave the shoulder at a right angle to it.
 */
import { cubicMake, lineMake } from '../geometry/bezier';
import { pointAdd, pointScale, pointSub, vectorNormalize, vectorTurnClockwise } from '../geometry/point';
import type { EdgeName, Point, Segment } from '../types';
import type { TankFrame } from './tank-frame';
import type { TankSpec } from './tank-params';

/** Handle lengths as fractions of the span they bridge (chosen by eye for smooth curves). */
const NECK_SHOULDER_HANDLE = 0.55;
const NECK_FOLD_HANDLE = 0.55;
const ARMHOLE_SHOULDER_HANDLE = 0.5;
const ARMHOLE_UNDERARM_HANDLE = 0.55;
const SIDE_HANDLE = 0.4;
const HEM_FOLD_HANDLE = 0.55;
const HEM_SIDE_HANDLE = 0.35;
/** A handle leaving the shoulder may lean in by at most this share of the strap (keeps curves apart). */
const NECK_LEAN_LIMIT = 0.75;
const ARMHOLE_LEAN_LIMIT = 0.3;

/** Which body piece. */
export type BodiceSide = 'front' | 'back';

/** Edges of one piece, each a chain in its canonical direction (see NamedEdge). */
export type TankEdges = Record<EdgeName, Segment[]>;

/** Unit vector leaving the shoulder line at a right angle, down into the piece. */
function shoulderDown(frame: TankFrame): Point {
  return vectorTurnClockwise(vectorNormalize(pointSub(frame.strapOuter, frame.strapInner)));
}

/** Handle length that leans in by no more than `maxLean` mm along `direction`. */
function handleLimit(wanted: number, direction: Point, maxLean: number): number {
  const lean = -direction.x;
  return lean > 1e-9 ? Math.min(wanted, maxLean / lean) : wanted;
}

function neckBuild(spec: TankSpec, frame: TankFrame, depth: number): Segment[] {
  const down = shoulderDown(frame);
  const handle = handleLimit(NECK_SHOULDER_HANDLE * depth, down, NECK_LEAN_LIMIT * spec.strapInset);
  const fold = { x: 0, y: depth };
  return [
    cubicMake(
      frame.strapInner,
      pointAdd(frame.strapInner, pointScale(down, handle)),
      { x: NECK_FOLD_HANDLE * spec.strapInset, y: depth },
      fold,
    ),
  ];
}

function armholeBuild(spec: TankSpec, frame: TankFrame, side: BodiceSide): Segment[] {
  const down = shoulderDown(frame);
  const start = frame.strapOuter;
  const underarm = frame.underarm;
  const lean = ARMHOLE_LEAN_LIMIT * spec.strapWidth;
  if (side === 'back' && spec.racerBackInset !== null) {
    const racer = { x: spec.racerBackInset, y: spec.armholeDepth / 2 };
    const upper = racer.y - start.y;
    const lower = underarm.y - racer.y;
    return [
      cubicMake(
        start,
        pointAdd(start, pointScale(down, handleLimit(ARMHOLE_SHOULDER_HANDLE * upper, down, lean))),
        { x: racer.x, y: racer.y - ARMHOLE_SHOULDER_HANDLE * upper },
        racer,
      ),
      cubicMake(
        racer,
        { x: racer.x, y: racer.y + ARMHOLE_UNDERARM_HANDLE * lower },
        { x: underarm.x - ARMHOLE_UNDERARM_HANDLE * (underarm.x - racer.x), y: underarm.y },
        underarm,
      ),
    ];
  }
  const drop = underarm.y - start.y;
  return [
    cubicMake(
      start,
      pointAdd(start, pointScale(down, handleLimit(ARMHOLE_SHOULDER_HANDLE * drop, down, lean))),
      { x: underarm.x - ARMHOLE_UNDERARM_HANDLE * (underarm.x - start.x), y: underarm.y },
      underarm,
    ),
  ];
}

function sideBuild(frame: TankFrame): Segment[] {
  const stops: Point[] = [frame.underarm];
  if (frame.waistShaped && frame.quarterWaist !== null && frame.waistLevel !== null) {
    stops.push({ x: frame.quarterWaist, y: frame.waistLevel });
  }
  stops.push(frame.hemSide);
  const segments: Segment[] = [];
  for (let i = 0; i + 1 < stops.length; i++) {
    const a = stops[i] as Point;
    const b = stops[i + 1] as Point;
    const reach = SIDE_HANDLE * (b.y - a.y);
    // Vertical at both ends: square to the armhole at the underarm, to the hem at the side, and
    // a smooth turning point at the waist.
    segments.push(a.x === b.x ? lineMake(a, b) : cubicMake(a, { x: a.x, y: a.y + reach }, { x: b.x, y: b.y - reach }, b));
  }
  return segments;
}

function hemBuild(frame: TankFrame): Segment[] {
  const { hemFold, hemSide } = frame;
  if (hemFold.y - hemSide.y < 1e-6) return [lineMake(hemFold, hemSide)];
  const width = hemSide.x;
  return [
    cubicMake(
      hemFold,
      { x: HEM_FOLD_HANDLE * width, y: hemFold.y },
      { x: width - HEM_SIDE_HANDLE * width, y: hemSide.y },
      hemSide,
    ),
  ];
}

/** The six edges of a tank top front or back (stitching line, mm). */
export function tankEdgesBuild(spec: TankSpec, frame: TankFrame, side: BodiceSide): TankEdges {
  const neckDepth = side === 'front' ? spec.frontNeckDepth : spec.backNeckDepth;
  return {
    fold: [lineMake({ x: 0, y: neckDepth }, frame.hemFold)],
    shoulder: [lineMake(frame.strapInner, frame.strapOuter)],
    neck: neckBuild(spec, frame, neckDepth),
    armhole: armholeBuild(spec, frame, side),
    side: sideBuild(frame),
    hem: hemBuild(frame),
  };
}
