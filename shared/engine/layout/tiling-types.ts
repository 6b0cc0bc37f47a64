/**
 * Data types of the print layout: where the pattern lies on the print canvas, which sheets
 * show which part of it, and where every mark goes. Plain data, lengths in mm.
 *
 * Two frames are used. The canvas frame holds the pieces laid out side by side at full
 * size (x right, y down, mm). The paper frame is one sheet (origin at its top-left corner,
 * x right, y down, mm).
 */
import type { Point } from '../types';
import type { Orientation, PaperId, SheetPaperId, TilePaperId } from './tiling-paper';

/** An axis-aligned rectangle, mm: top-left corner and size. */
export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** What the print layout must know about one piece: its id and its shapes in its own frame. */
export interface PrintItem {
  id: string;
  /** Everything the piece draws (outline, fold bracket, labels), own frame, mm. */
  extent: Rect;
  /** Closed cutting polylines in the piece's own frame, mm. */
  outlines: Point[][];
  /** Boxes of the marks drawn outside or inside the outline (fold bracket, label), own frame, mm. */
  marks: Rect[];
}

/** A piece placed on the canvas: canvas point = own point + offset. */
export interface ArrangedItem {
  id: string;
  offset: Point;
  /** The item's extent on the canvas, mm. */
  rect: Rect;
}

/** The pieces laid out on the canvas, and what the tiling needs to know of them. */
export interface CanvasLayout {
  items: ArrangedItem[];
  /** Everything drawn on the canvas, mm. */
  bounds: Rect;
  /** Closed cutting polylines, canvas frame, mm. */
  outlines: Point[][];
  /** Boxes of the marks, canvas frame, mm. */
  marks: Rect[];
}

/** A side of a sheet. */
export type SheetEdge = 'left' | 'right' | 'top' | 'bottom';

/**
 * A guide line on a tile, paper frame. `trim`: cut the sheet along it and lay it over the
 * neighbour. `join`: the neighbour's trimmed edge goes here.
 */
export interface TileGuide {
  kind: 'trim' | 'join';
  edge: SheetEdge;
  from: Point;
  to: Point;
  neighbour: string;
}

/**
 * A match mark: a diamond centred on the trim/join line; each of the two pages prints it,
 * so after trimming, the halves meet. Paper frame, mm.
 */
export interface MatchMark {
  edge: SheetEdge;
  centre: Point;
  /** Half the diamond's diagonal, mm. */
  halfSize: number;
  neighbour: string;
}

/** A line of text placed by the layout, paper frame: baseline-left `at`, size in pt. */
export interface PlacedText {
  role: 'page-label' | 'page-number' | 'trim-note' | 'join-note' | 'piece-title' | 'piece-line' | 'fold-note';
  text: string;
  at: Point;
  sizePt: number;
  /** Text turned a quarter turn counter-clockwise (reads bottom to top) when 90. */
  rotation: 0 | 90;
  /** The room the text takes, mm (estimated from the font size). */
  box: Rect;
}

/** One cell of the tile grid (printed or left out). */
export interface TileCell {
  label: string;
  row: number;
  col: number;
  /** The canvas area the cell's printable area shows, mm. */
  region: Rect;
  blank: boolean;
}

/** One printed tile. */
export interface TilePage extends TileCell {
  /** Page number in the document, from 1. */
  pageNumber: number;
  /** The sheet's printable area, paper frame, mm. */
  printable: Rect;
  guides: TileGuide[];
  marks: MatchMark[];
  texts: PlacedText[];
  neighbours: Partial<Record<SheetEdge, string>>;
}

/** A test square printed to check the scale: side in mm, caption beside it. */
export interface TestSquare {
  caption: string;
  rect: Rect;
  captionAt: Point;
}

/** The assembly map: the grid drawn small over the pieces. */
export interface AssemblyMap {
  /** Where the map sits, paper frame, mm. */
  rect: Rect;
  /** Paper mm per canvas mm. */
  scale: number;
  /** Paper point of the grid origin (canvas point `gridOrigin`). */
  origin: Point;
}

/**
 * Page 1's furniture: test squares, title lines and (for tiles) the assembly map.
 * `page` is the label of the tile it sits on, or "cover" for a page of its own.
 */
export interface Furniture {
  page: string;
  box: Rect;
  squares: TestSquare[];
  /** Baseline-left points of the title lines, paper frame. */
  titleLines: Point[];
  titleSizePt: number;
  map: AssemblyMap | null;
}

/** The complete plan of a tiled print. */
export interface TilePlan {
  paper: TilePaperId;
  orientation: Orientation;
  sheet: { widthMm: number; heightMm: number };
  marginMm: number;
  overlapMm: number;
  rows: number;
  cols: number;
  /** Canvas distance between the origins of neighbouring tiles, mm. */
  step: { x: number; y: number };
  /** Canvas point shown at the top-left of the printable area of tile A1, mm. */
  gridOrigin: Point;
  cells: TileCell[];
  /** Printed tiles in document order (after the cover page, when there is one). */
  pages: TilePage[];
  /** Labels of the tiles left out because nothing of the pattern falls on them. */
  blank: string[];
  /** True when page 1 is a page of its own carrying the furniture. */
  cover: boolean;
  furniture: Furniture;
  /** Pages in the document, cover included. */
  pageCount: number;
}

/** The plan of a wide sheet: one page holding every piece and the test squares. */
export interface SheetPlan {
  paper: SheetPaperId;
  orientation: Orientation;
  sheet: { widthMm: number; heightMm: number };
  marginMm: number;
  /** Paper point where the canvas origin is drawn, mm. */
  canvasAt: Point;
  furniture: Furniture;
}

export type { PaperId };
