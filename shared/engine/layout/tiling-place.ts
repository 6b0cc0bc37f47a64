/**
 * Free room on a tile: a coarse occupancy grid of the pattern over the tile's printable
 * area (outline interiors filled by scanlines, lines and mark boxes stamped), queried with a
 * summed-area table (Crow, "Summed-area tables for texture mapping", SIGGRAPH 1984).
 * Paper frame, mm.
 */
import type { Point } from '../types';
import { rectAroundPoints, rectsIntersect } from './tiling-geometry';
import type { CanvasLayout, Rect, TilePage } from './tiling-types';

/** A layout option that cannot be honoured, naming the option. */
export class PrintLayoutError extends Error {
  readonly field: string;
  constructor(field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = 'PrintLayoutError';
    this.field = field;
  }
}

/** Side of an occupancy cell, mm. */
const CELL_MM = 2;
/** Clear room kept between the furniture or a label and the pattern, mm. */
export const FREE_CLEARANCE_MM = 3;

/** Which cells of a sheet's printable area the pattern covers. */
export interface Occupancy {
  origin: Point;
  cols: number;
  rows: number;
  /** Summed-area table, (cols + 1) × (rows + 1). */
  sums: Int32Array;
}

/** Builds the occupancy of `page` by the canvas drawn into it. */
export function occupancyBuild(page: Pick<TilePage, 'printable' | 'region'>, canvas: Pick<CanvasLayout, 'outlines' | 'marks'>): Occupancy {
  const area = page.printable;
  const cols = Math.ceil(area.width / CELL_MM);
  const rows = Math.ceil(area.height / CELL_MM);
  const cells = new Uint8Array(cols * rows);
  const dx = area.x - page.region.x;
  const dy = area.y - page.region.y;
  const mark = (col: number, row: number): void => {
    if (col >= 0 && row >= 0 && col < cols && row < rows) cells[row * cols + col] = 1;
  };
  for (const outline of canvas.outlines) {
    const around = rectAroundPoints(outline);
    if (!around || !rectsIntersect(around, page.region)) continue;
    const points = outline.map((p) => ({ x: p.x + dx, y: p.y + dy }));
    for (let row = 0; row < rows; row++) {
      const y = area.y + (row + 0.5) * CELL_MM;
      const xs: number[] = [];
      for (let i = 0; i < points.length; i++) {
        const a = points[i] as Point;
        const b = points[(i + 1) % points.length] as Point;
        if (a.y > y !== b.y > y) xs.push(a.x + ((y - a.y) * (b.x - a.x)) / (b.y - a.y));
      }
      xs.sort((p, q) => p - q);
      for (let k = 0; k + 1 < xs.length; k += 2) {
        const from = Math.max(0, Math.floor(((xs[k] as number) - area.x) / CELL_MM));
        const to = Math.min(cols - 1, Math.floor(((xs[k + 1] as number) - area.x) / CELL_MM));
        for (let col = from; col <= to; col++) mark(col, row);
      }
    }
    for (let i = 0; i < points.length; i++) {
      const a = points[i] as Point;
      const b = points[(i + 1) % points.length] as Point;
      const steps = Math.max(1, Math.ceil(Math.hypot(b.x - a.x, b.y - a.y) / (CELL_MM / 2)));
      for (let s = 0; s <= steps; s++) {
        const x = a.x + ((b.x - a.x) * s) / steps;
        const y = a.y + ((b.y - a.y) * s) / steps;
        mark(Math.floor((x - area.x) / CELL_MM), Math.floor((y - area.y) / CELL_MM));
      }
    }
  }
  for (const box of canvas.marks) {
    if (!rectsIntersect(box, page.region)) continue;
    const c0 = Math.floor((box.x + dx - area.x) / CELL_MM);
    const c1 = Math.floor((box.x + box.width + dx - area.x) / CELL_MM);
    const r0 = Math.floor((box.y + dy - area.y) / CELL_MM);
    const r1 = Math.floor((box.y + box.height + dy - area.y) / CELL_MM);
    for (let row = r0; row <= r1; row++) for (let col = c0; col <= c1; col++) mark(col, row);
  }
  const sums = new Int32Array((cols + 1) * (rows + 1));
  for (let row = 0; row < rows; row++) {
    for (let col = 0; col < cols; col++) {
      sums[(row + 1) * (cols + 1) + col + 1] =
        (cells[row * cols + col] as number) +
        (sums[row * (cols + 1) + col + 1] as number) +
        (sums[(row + 1) * (cols + 1) + col] as number) -
        (sums[row * (cols + 1) + col] as number);
    }
  }
  return { origin: { x: area.x, y: area.y }, cols, rows, sums };
}

/** True when no occupied cell touches `rect` grown by `clearance` (paper frame, mm). */
export function occupancyFree(occupancy: Occupancy, rect: Rect, clearance = FREE_CLEARANCE_MM): boolean {
  const { origin, cols, rows, sums } = occupancy;
  const c0 = Math.max(0, Math.floor((rect.x - clearance - origin.x) / CELL_MM));
  const r0 = Math.max(0, Math.floor((rect.y - clearance - origin.y) / CELL_MM));
  const c1 = Math.min(cols, Math.ceil((rect.x + rect.width + clearance - origin.x) / CELL_MM));
  const r1 = Math.min(rows, Math.ceil((rect.y + rect.height + clearance - origin.y) / CELL_MM));
  if (c1 <= c0 || r1 <= r0) return true;
  const at = (row: number, col: number): number => sums[row * (cols + 1) + col] as number;
  return at(r1, c1) - at(r0, c1) - at(r1, c0) + at(r0, c0) === 0;
}

/**
 * The first top-left corner (reading order, on the cell grid) where a `width` × `height`
 * box fits inside `within` without touching the pattern; null when there is none.
 */
export function freeSpotFind(occupancy: Occupancy, within: Rect, width: number, height: number): Point | null {
  for (let y = within.y; y + height <= within.y + within.height + 1e-9; y += CELL_MM) {
    for (let x = within.x; x + width <= within.x + within.width + 1e-9; x += CELL_MM) {
      if (occupancyFree(occupancy, { x, y, width, height })) return { x, y };
    }
  }
  return null;
}
