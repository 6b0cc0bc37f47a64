/**
 * Lays the pieces to print side by side on the print canvas, full size (mm), in rows
 * ("shelves") no wider than a limit, with a gap between them.
 */
import type { Point } from '../types';
import { rectAroundPoints, rectUnion } from './tiling-geometry';
import type { ArrangedItem, CanvasLayout, PrintItem, Rect } from './tiling-types';

/** Room left between pieces on the canvas, mm (space for cutting around each; common practice). */
export const PIECE_GAP_MM = 20;

/** Options for {@link printArrange}. */
export interface ArrangeOptions {
  /** Gap between pieces, mm. */
  gapMm?: number;
  /** Widest row, mm; a piece wider than this gets a row of its own. Unlimited by default. */
  maxWidthMm?: number;
}

/**
 * Places the items left to right in their given order, starting a new row below when the
 * next one would pass `maxWidthMm`. The canvas origin is the top-left of the first row.
 * Returns the placements, the bounds of everything and the cutting outlines on the canvas.
 */
export function printArrange(items: readonly PrintItem[], options: ArrangeOptions = {}): CanvasLayout {
  const gap = options.gapMm ?? PIECE_GAP_MM;
  const maxWidth = options.maxWidthMm ?? Number.POSITIVE_INFINITY;
  const arranged: ArrangedItem[] = [];
  const outlines: Point[][] = [];
  const marks: Rect[] = [];
  let cursorX = 0;
  let shelfY = 0;
  let shelfHeight = 0;
  let bounds: Rect | null = null;
  for (const item of items) {
    const { extent } = item;
    if (cursorX > 0 && cursorX + extent.width > maxWidth) {
      shelfY += shelfHeight + gap;
      cursorX = 0;
      shelfHeight = 0;
    }
    const offset = { x: cursorX - extent.x, y: shelfY - extent.y };
    const rect: Rect = { x: cursorX, y: shelfY, width: extent.width, height: extent.height };
    arranged.push({ id: item.id, offset, rect });
    for (const outline of item.outlines) outlines.push(outline.map((p) => ({ x: p.x + offset.x, y: p.y + offset.y })));
    for (const mark of item.marks) marks.push({ ...mark, x: mark.x + offset.x, y: mark.y + offset.y });
    bounds = bounds ? rectUnion(bounds, rect) : rect;
    cursorX += extent.width + gap;
    shelfHeight = Math.max(shelfHeight, extent.height);
  }
  return { items: arranged, bounds: bounds ?? { x: 0, y: 0, width: 0, height: 0 }, outlines, marks };
}

/** The extent of a set of polylines and boxes, mm; null when there is nothing. */
export function extentOf(polylines: readonly (readonly Point[])[], boxes: readonly Rect[] = []): Rect | null {
  let extent: Rect | null = null;
  for (const polyline of polylines) {
    const around = rectAroundPoints(polyline);
    if (around) extent = extent ? rectUnion(extent, around) : around;
  }
  for (const box of boxes) extent = extent ? rectUnion(extent, box) : box;
  return extent;
}
