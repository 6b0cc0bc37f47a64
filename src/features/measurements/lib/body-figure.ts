/**
 * Knitwright's own body figure for the fitting screen: a front and a back view side by side,
 * and for each measurement a mark showing where the tape goes. Coordinates are in the SVG's
 * own units (viewBox 0 0 400 280); the back view is the front outline moved 200 to the right.
 */
import { pointsMirror, pointsShift, smoothPathData, type DiagramPoint } from './smooth-path';

export const FIGURE_VIEWBOX = { width: 400, height: 280 } as const;
export const BACK_OFFSET = 200;
const AXIS = 100;

/** Right half of the front outline, from the top of the neck down the arm and back up the side. */
const RIGHT_HALF: readonly DiagramPoint[] = [
  [107, 42],
  [108, 55],
  [122, 60],
  [136, 66],
  [144, 76],
  [150, 100],
  [154, 140],
  [158, 180],
  [161, 204],
  [164, 221],
  [155, 226],
  [151, 204],
  [147, 172],
  [142, 140],
  [137, 112],
  [130, 97],
  [132, 114],
  [128, 128],
  [122, 150],
  [129, 172],
  [134, 192],
  [133, 212],
  [127, 262],
  [104, 262],
  [100, 222],
];

/** The whole outline of one view, closed, centred on x = 100. */
export function figureOutline(): DiagramPoint[] {
  return [...RIGHT_HALF, ...pointsMirror(RIGHT_HALF.slice(0, -1), AXIS)];
}

/** Path data of the front and back outlines. */
export function figureOutlinePaths(): { front: string; back: string } {
  const outline = figureOutline();
  return { front: smoothPathData(outline, true), back: smoothPathData(pointsShift(outline, BACK_OFFSET), true) };
}

/** Where the tape goes: round the body (a girth) or along it (a length). */
export type FigureMark =
  | { kind: 'girth'; cx: number; cy: number; rx: number; ry: number }
  | { kind: 'length'; points: DiagramPoint[]; smooth?: boolean };

const girth = (cx: number, cy: number, rx: number, ry = 4): FigureMark => ({ kind: 'girth', cx, cy, rx, ry });
const length = (points: DiagramPoint[], smooth = false): FigureMark => ({ kind: 'length', points, smooth });
const back = (points: DiagramPoint[]): DiagramPoint[] => pointsShift(points, BACK_OFFSET);

/**
 * One mark per measurement key of the shared measurement list. A key with no mark draws the
 * figure alone; the unit test checks that every field has one.
 */
export const FIGURE_MARKS: Readonly<Record<string, FigureMark>> = {
  bust: girth(100, 114, 33, 5),
  highBust: girth(100, 101, 31, 4),
  underbust: girth(100, 128, 29, 4),
  waist: girth(100, 150, 23, 4),
  hip: girth(100, 192, 35, 5),
  neckBase: girth(100, 55, 9, 3),
  upperArm: girth(143.5, 108, 7.5, 2.5),
  wrist: girth(156, 205, 5.5, 2),
  shoulderLength: length([
    [108, 55],
    [136, 66],
  ]),
  acrossFront: length([
    [75, 86],
    [125, 86],
  ]),
  acrossBack: length(
    back([
      [73, 84],
      [127, 84],
    ]),
  ),
  napeToWaist: length(
    back([
      [100, 52],
      [100, 150],
    ]),
  ),
  shoulderToBust: length([
    [112, 57],
    [113, 114],
  ]),
  armholeDepth: length(
    back([
      [124, 64],
      [124, 97],
    ]),
  ),
  shoulderToHip: length([
    [120, 60],
    [120, 192],
  ]),
  armLength: length(
    [
      [138, 64],
      [148, 78],
      [154, 100],
      [158, 140],
      [162, 180],
      [165, 204],
    ],
    true,
  ),
};

/** Path data of a mark: for a girth, the half in front of the body and the half behind it. */
export function markPaths(mark: FigureMark): { solid: string; hidden?: string } {
  if (mark.kind === 'length') {
    return { solid: mark.smooth ? smoothPathData(mark.points) : mark.points.map(([x, y], i) => `${i ? 'L' : 'M'}${x} ${y}`).join(' ') };
  }
  const { cx, cy, rx, ry } = mark;
  const left = `${cx - rx} ${cy}`;
  const right = `${cx + rx} ${cy}`;
  return {
    solid: `M${left} A${rx} ${ry} 0 0 0 ${right}`,
    hidden: `M${left} A${rx} ${ry} 0 0 1 ${right}`,
  };
}

/** The two ends of a length mark, for the end ticks. */
export function markEnds(mark: FigureMark): DiagramPoint[] {
  if (mark.kind !== 'length') return [];
  const first = mark.points[0];
  const last = mark.points[mark.points.length - 1];
  return first && last ? [first, last] : [];
}
