/**
 * Tiled printing: which sheets of home-printer paper show which part of the full-size
 * pattern, and where every mark goes. Pure computation; the PDF writer only draws it.
 *
 * Tiles form a grid over the pattern; neighbouring tiles share an overlap strip. Tiles with
 * nothing of the pattern on them are left out and listed. Rows are lettered and columns
 * numbered (A1, A2, …, B1, …; common practice for tiled patterns).
 */
import type { Point } from '../types';
import { furnitureLay, furnitureSize, type MapGrid } from './tiling-furniture';
import { polygonMeetsRect, polylineMeetsRect, rectInflate, rectsIntersect } from './tiling-geometry';
import { edgeMarks, textAscentMm, textPlace } from './tiling-marks';
import {
  DEFAULT_MARGIN_MM,
  DEFAULT_OVERLAP_MM,
  MAX_OVERLAP_MM,
  MIN_MARGIN_MM,
  MIN_OVERLAP_MM,
  paperOriented,
  TILE_PAPER_IDS,
  type Orientation,
  type OrientationChoice,
  type TilePaperId,
} from './tiling-paper';
import { freeSpotFind, occupancyBuild, PrintLayoutError } from './tiling-place';
import type { CanvasLayout, Furniture, Rect, SheetEdge, TileCell, TilePage, TilePlan } from './tiling-types';

/** Rounding slack when counting tiles, mm: a pattern a hair wider than n tiles still needs n. */
const FIT_SLACK_MM = 0.01;
/** Type size of the page label, pt, and of the page number under it. */
export const PAGE_LABEL_SIZE_PT = 20;
export const PAGE_NUMBER_SIZE_PT = 8;
/** Gap between the page label and the page number, mm. */
const LABEL_LINE_GAP_MM = 1;
/** Clear room between the page label and the pattern's lines, mm. */
const LABEL_CLEARANCE_MM = 1.5;

/** Options for {@link tilesPlan}; lengths in mm. */
export interface TilingOptions {
  paper: TilePaperId;
  orientation?: OrientationChoice;
  marginMm?: number;
  overlapMm?: number;
  /** Lines of title text on page 1 (client, style, date, instructions). */
  titleLineCount?: number;
}

/** Row label: A … Z, then AA, AB, … (the way spreadsheets name columns). */
export function rowLetters(row: number): string {
  let n = row + 1;
  let text = '';
  while (n > 0) {
    const rest = (n - 1) % 26;
    text = String.fromCharCode(65 + rest) + text;
    n = Math.floor((n - 1) / 26);
  }
  return text;
}

/** The label of the tile in `row`, `col` (both from 0): "A1", "B3". */
export function tileLabel(row: number, col: number): string {
  return `${rowLetters(row)}${col + 1}`;
}

/** Tiles needed along one direction: n × step + overlap ≥ length. */
export function tileCount(length: number, printable: number, overlap: number): number {
  return Math.max(1, Math.ceil((length - overlap - FIT_SLACK_MM) / (printable - overlap)));
}

function optionsCheck(options: TilingOptions, margin: number, overlap: number): void {
  if (!TILE_PAPER_IDS.includes(options.paper)) throw new PrintLayoutError('paper', `paper must be one of ${TILE_PAPER_IDS.join(', ')}`);
  if (!(margin >= MIN_MARGIN_MM - 1e-9) || margin > 30) {
    throw new PrintLayoutError('marginMm', 'margin must be between 1/4 in (6.35 mm) and 30 mm: home printers cannot print closer to the edge');
  }
  if (!(overlap >= MIN_OVERLAP_MM - 1e-9) || overlap > MAX_OVERLAP_MM) {
    throw new PrintLayoutError('overlapMm', `overlap must be between 1/4 in (6.35 mm) and ${MAX_OVERLAP_MM} mm`);
  }
}

function cellIsBlank(canvas: CanvasLayout, region: Rect): boolean {
  if (canvas.marks.some((mark) => rectsIntersect(mark, region))) return false;
  return !canvas.outlines.some((outline) => polygonMeetsRect(outline, region));
}

function planFor(canvas: CanvasLayout, options: TilingOptions, orientation: Orientation, margin: number, overlap: number): TilePlan {
  const sheet = paperOriented(options.paper, orientation);
  const printable: Rect = { x: margin, y: margin, width: sheet.widthMm - 2 * margin, height: sheet.heightMm - 2 * margin };
  const step = { x: printable.width - overlap, y: printable.height - overlap };
  const { bounds } = canvas;
  const cols = tileCount(bounds.width, printable.width, overlap);
  const rows = tileCount(bounds.height, printable.height, overlap);
  const gridWidth = cols * step.x + overlap;
  const gridHeight = rows * step.y + overlap;
  // centre the pattern on the grid so that no line runs along a sheet's edge
  const gridOrigin: Point = { x: bounds.x - (gridWidth - bounds.width) / 2, y: bounds.y - (gridHeight - bounds.height) / 2 };

  const cells: TileCell[] = [];
  for (let row = 0; row < rows; row++) {
    for (let col = 0; col < cols; col++) {
      const region: Rect = { x: gridOrigin.x + col * step.x, y: gridOrigin.y + row * step.y, width: printable.width, height: printable.height };
      cells.push({ label: tileLabel(row, col), row, col, region, blank: cellIsBlank(canvas, region) });
    }
  }
  const printed = (row: number, col: number): string | undefined => {
    const cell = row >= 0 && col >= 0 && row < rows && col < cols ? cells[row * cols + col] : undefined;
    return cell && !cell.blank ? cell.label : undefined;
  };
  const titleLineCount = options.titleLineCount ?? 0;
  const grid: MapGrid = { origin: gridOrigin, width: gridWidth, height: gridHeight };

  const pages: TilePage[] = [];
  for (const cell of cells) {
    if (cell.blank) continue;
    const neighbours: Partial<Record<SheetEdge, string>> = {};
    const left = printed(cell.row, cell.col - 1);
    const right = printed(cell.row, cell.col + 1);
    const top = printed(cell.row - 1, cell.col);
    const bottom = printed(cell.row + 1, cell.col);
    if (left) neighbours.left = left;
    if (right) neighbours.right = right;
    if (top) neighbours.top = top;
    if (bottom) neighbours.bottom = bottom;
    const edges = edgeMarks(printable, overlap, neighbours);
    pages.push({ ...cell, pageNumber: 0, printable, neighbours, guides: edges.guides, marks: edges.marks, texts: edges.texts });
  }

  // page 1's furniture: on the first tile when the pattern leaves room, else a cover page
  const size = furnitureSize(titleLineCount, grid);
  if (size.width > printable.width || size.height > printable.height) {
    throw new PrintLayoutError('paper', 'the test squares and assembly map do not fit on this paper');
  }
  let furniture: Furniture | null = null;
  const first = pages[0];
  if (first) {
    const at = freeSpotFind(occupancyBuild(first, canvas), visibleArea(first, overlap), size.width, size.height);
    if (at) furniture = furnitureLay(at, first.label, titleLineCount, grid);
  }
  const cover = furniture === null;
  furniture ??= furnitureLay({ x: printable.x + (printable.width - size.width) / 2, y: printable.y }, 'cover', titleLineCount, grid);

  const pageCount = pages.length + (cover ? 1 : 0);
  for (const [index, page] of pages.entries()) {
    page.pageNumber = index + 1 + (cover ? 1 : 0);
    labelPlace(page, canvas, overlap, pageCount, furniture);
  }
  const blank = cells.filter((cell) => cell.blank).map((cell) => cell.label);
  return {
    paper: options.paper,
    orientation,
    sheet,
    marginMm: margin,
    overlapMm: overlap,
    rows,
    cols,
    step,
    gridOrigin,
    cells,
    pages,
    blank,
    cover,
    furniture,
    pageCount,
  };
}

/** Places the page label and page number in a corner of the tile that the pattern leaves free. */
function labelPlace(page: TilePage, canvas: CanvasLayout, overlap: number, pageCount: number, furniture: Furniture): void {
  const inset = 2;
  const visible = visibleArea(page, overlap);
  const numberText = `page ${page.pageNumber} of ${pageCount}`;
  const label = textPlace('page-label', page.label, PAGE_LABEL_SIZE_PT, { x: 0, y: 0 });
  const num = textPlace('page-number', numberText, PAGE_NUMBER_SIZE_PT, { x: 0, y: 0 });
  const width = Math.max(label.box.width, num.box.width);
  const height = label.box.height + LABEL_LINE_GAP_MM + num.box.height;
  const candidates = [0, 1, 2, 3].map((corner) => {
    const x = corner % 2 === 0 ? visible.x + inset : visible.x + visible.width - inset - width;
    const y = corner < 2 ? visible.y + inset : visible.y + visible.height - inset - height;
    const box: Rect = { x, y, width, height };
    const texts = [
      textPlace('page-label', page.label, PAGE_LABEL_SIZE_PT, { x, y: y + textAscentMm(PAGE_LABEL_SIZE_PT) }),
      textPlace('page-number', numberText, PAGE_NUMBER_SIZE_PT, {
        x,
        y: y + label.box.height + LABEL_LINE_GAP_MM + textAscentMm(PAGE_NUMBER_SIZE_PT),
      }),
    ];
    return { box, texts };
  });
  const shift = { x: page.region.x - page.printable.x, y: page.region.y - page.printable.y };
  const free = candidates.find((candidate) => {
    if (furniture.page === page.label && rectsIntersect(rectInflate(furniture.box, 2), candidate.box)) return false;
    const onCanvas = rectInflate({ ...candidate.box, x: candidate.box.x + shift.x, y: candidate.box.y + shift.y }, LABEL_CLEARANCE_MM);
    if (canvas.marks.some((mark) => rectsIntersect(mark, onCanvas))) return false;
    return !canvas.outlines.some((outline) => polylineMeetsRect(outline, onCanvas));
  });
  // on a tile full of lines the label goes top-left and the pattern is drawn over it
  page.texts.push(...(free ?? candidates[0]!).texts);
}

/** The part of a tile that stays in view after assembly: its printable area less the overlap strips. */
export function visibleArea(page: Pick<TilePage, 'printable' | 'neighbours'>, overlapMm?: number): Rect {
  const { printable, neighbours } = page;
  const strip = overlapMm ?? 0;
  const left = neighbours.left ? strip : 0;
  const top = neighbours.top ? strip : 0;
  const right = neighbours.right ? strip : 0;
  const bottom = neighbours.bottom ? strip : 0;
  return { x: printable.x + left, y: printable.y + top, width: printable.width - left - right, height: printable.height - top - bottom };
}

/**
 * Plans a tiled print of the canvas on `options.paper`. With orientation `auto` (the
 * default) the orientation that needs fewer pages wins, portrait on a tie.
 * Margin at least 1/4 in (default 3/8 in); overlap 1/4 in to 50 mm (default 1/2 in).
 * Throws a {@link PrintLayoutError} naming the option when an option is out of range.
 */
export function tilesPlan(canvas: CanvasLayout, options: TilingOptions): TilePlan {
  const margin = options.marginMm ?? DEFAULT_MARGIN_MM;
  const overlap = options.overlapMm ?? DEFAULT_OVERLAP_MM;
  optionsCheck(options, margin, overlap);
  if (canvas.outlines.length === 0) throw new PrintLayoutError('pieces', 'choose at least one piece to print');
  const choice = options.orientation ?? 'auto';
  if (choice !== 'auto') return planFor(canvas, options, choice, margin, overlap);
  const portrait = planFor(canvas, options, 'portrait', margin, overlap);
  const landscape = planFor(canvas, options, 'landscape', margin, overlap);
  if (landscape.pageCount < portrait.pageCount) return landscape;
  if (landscape.pageCount === portrait.pageCount && landscape.cells.length < portrait.cells.length) return landscape;
  return portrait;
}
