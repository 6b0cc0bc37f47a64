/**
 * Public data types of the drafting engine.
 *
 * Every length is in millimetres; every coordinate is in the piece's own frame:
 * x grows away from the centre fold (x = 0 is the fold), y grows downwards from the
 * shoulder line (y = 0 is the highest point of the shoulder, at the strap's inner edge).
 * Everything is plain data: safe to JSON.stringify, send over the wire and store.
 */
import type { DraftInput } from '../schemas/draft-input';
import type { LengthUnit } from '../units/units';

export type { DraftInput } from '../schemas/draft-input';
export type { LengthUnit } from '../units/units';

/** A point in mm. */
export interface Point {
  x: number;
  y: number;
}

/** A straight segment, mm. */
export interface LineSegment {
  kind: 'line';
  from: Point;
  to: Point;
}

/** A cubic Bézier segment, mm (from, first control, second control, to). */
export interface CubicSegment {
  kind: 'cubic';
  from: Point;
  c1: Point;
  c2: Point;
  to: Point;
}

/** One segment of a path: a line or a cubic Bézier. */
export type Segment = LineSegment | CubicSegment;

/** Axis-aligned bounds, mm. */
export interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
  width: number;
  height: number;
}

/** A straight mark from one point to another, mm (grainline arrow, fold line). */
export interface MarkLine {
  from: Point;
  to: Point;
}

/** Names of the edges of a bodice piece. */
export type EdgeName = 'fold' | 'shoulder' | 'neck' | 'armhole' | 'side' | 'hem';

/**
 * One edge of a piece's stitching line, as its own path.
 * `d` is SVG path data in mm (absolute M/L/C commands), so any SVG tool can read and
 * measure it; `length` is its length along the curve in mm.
 * Direction: fold top→bottom, shoulder neck→armhole, neck shoulder→fold,
 * armhole shoulder→underarm, side underarm→hem, hem fold→side seam.
 */
export interface NamedEdge {
  name: EdgeName;
  d: string;
  length: number;
  segments: Segment[];
}

/**
 * A closed outline: SVG path data in mm, its segments (lines and cubics) and a sampled
 * polyline (closed implicitly: the last point joins the first; no repeated first point).
 */
export interface Outline {
  d: string;
  segments: Segment[];
  polyline: Point[];
}

/** What a notch marks. */
export type NotchKind = 'quarter' | 'half' | 'underarm' | 'waist';

/**
 * A notch: a short tick cut into the edge. `at` lies on the cutting line, `stitchAt` on the
 * stitching line; `inward` is the unit vector pointing into the piece; `depth` is the tick's
 * suggested length in mm.
 */
export interface Notch {
  edge: EdgeName;
  kind: NotchKind;
  at: Point;
  stitchAt: Point;
  inward: Point;
  depth: number;
}

/** The piece's printed label: title and lines of text, anchored at `at` (mm). */
export interface PieceLabel {
  title: string;
  lines: string[];
  at: Point;
}

/** Which side of the body a piece belongs to: drawings tint front and back differently. */
export type PieceSide = 'front' | 'back' | 'other';

/**
 * One pattern piece, drafted as a quarter of the body on the fold.
 * `cutting` is the cutting line (stitching line plus allowances); `stitching` is the seam
 * line. `bounds` are the cutting outline's bounds. `fold` lies on the cutting line at x = 0
 * (null when the piece is not cut on a fold).
 */
export interface Piece {
  id: string;
  name: string;
  side: PieceSide;
  cutCount: number;
  onFold: boolean;
  /** e.g. "cut 1 on fold". */
  cutNote: string;
  stitching: Outline;
  cutting: Outline;
  edges: NamedEdge[];
  /** Allowance added outside each edge's stitching line, mm. */
  allowances: Record<EdgeName, number>;
  notches: Notch[];
  grainline: MarkLine;
  fold: MarkLine | null;
  bounds: Bounds;
  label: PieceLabel;
}

/** Which opening a binding strip finishes. */
export type BindingOpening = 'neck' | 'armhole';

/**
 * A binding strip (knit tape or self-fabric band) for one opening.
 * `openingLength` is measured along the stitching line, front and back added, doubled from
 * the half on the fold where the opening crosses the fold. `cutLength` = openingLength ×
 * `ratio` + 2 × `joinAllowance`. `width` is the finished width; `cutWidth` what to cut
 * (a band is folded: 2 × width + 2 × seam allowance). `count` strips of this kind are cut.
 */
export interface Binding {
  id: string;
  name: string;
  opening: BindingOpening;
  finish: 'tape' | 'band';
  openingLength: number;
  ratio: number;
  joinAllowance: number;
  cutLength: number;
  width: number;
  cutWidth: number;
  count: number;
  /** Where the strip's join goes, in the trade's words. */
  joinAt: string;
}

/** An ease figure: finished minus body girth, in mm and in percent of the body girth. */
export interface Ease {
  mm: number;
  percent: number;
}

/**
 * Finished garment figures, mm. `stretchNeeded` is the stretch (percent) the fabric must
 * give at the bust when worn: (body ÷ finished − 1) × 100, 0 when the garment is not
 * smaller than the body; `fabricStretch` is the fabric's crosswise stretch for comparison.
 */
export interface Finished {
  bust: number;
  hip: number;
  waist: number | null;
  length: number;
  bustEase: Ease;
  hipEase: Ease;
  waistEase: Ease | null;
  stretchNeeded: number;
  hipStretchNeeded: number;
  fabricStretch: number;
}

/** How the fabric is folded for cutting. */
export type FoldKind = 'four-layers' | 'two-layers' | 'does-not-fit';

/**
 * Where a piece (or a stack of pieces cut together) lies on the folded fabric, mm:
 * x from the fold, y from the cut end of the fabric, in the piece's own frame shifted so that
 * its cutting bounds start at (x, y).
 */
export interface Placement {
  pieceIds: string[];
  x: number;
  y: number;
  width: number;
  height: number;
  layers: number;
}

/**
 * How to fold and cut. `fabricWidth` is the fabric's width when known (mm), `widthUsed` the
 * unfolded width the layout needs, `lengthNeeded` the length of fabric along the grain.
 */
export interface FoldLayout {
  fold: FoldKind;
  layers: number;
  fits: boolean;
  fabricWidth: number | null;
  widthUsed: number;
  lengthNeeded: number;
  placements: Placement[];
  steps: string[];
}

/** Warning codes a draft may carry. */
export type WarningCode =
  | 'stretch-insufficient'
  | 'hip-stretch-insufficient'
  | 'neckline-shallow'
  | 'seam-mismatch'
  | 'fabric-too-narrow';

/** A problem worth telling the user about; the draft is still usable. */
export interface Warning {
  code: WarningCode;
  message: string;
  /** The input field the warning concerns, e.g. "params.frontNeckDepth". */
  field?: string;
}

/** Style identifiers the engine knows how to draft. */
export type StyleId = 'tank';

/** A complete draft: everything a studio needs to cut and finish. */
export interface Draft {
  engineVersion: string;
  style: StyleId;
  /** The unit the input was given in: screens show figures in it. */
  unit: LengthUnit;
  input: DraftInput;
  pieces: Piece[];
  bindings: Binding[];
  finished: Finished;
  layout: FoldLayout;
  warnings: Warning[];
}

/** An input field that cannot be drafted, with a message naming it. */
export interface FieldError {
  /** Dotted path, e.g. "measurements.bust". */
  path: string;
  message: string;
}

/** The result of drafting: a draft, or the field errors that prevent it. */
export type DraftResult = { ok: true; draft: Draft } | { ok: false; errors: FieldError[] };
