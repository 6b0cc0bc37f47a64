/**
 * Page 1's furniture: title lines, the two test squares (2 in and 5 cm) and, for tiles,
 * the assembly map. Test squares of a known size let the maker check the scale before
 * printing every page (common practice). Paper frame, mm.
 */
import { MM_PER_INCH } from '../../units/units';
import type { Point } from '../types';
import type { Furniture, Rect, TestSquare } from './tiling-types';

/** Side of the inch test square: 2 in (1 in = 25.4 mm, NIST SP 811). */
export const TEST_SQUARE_INCH_MM = 2 * MM_PER_INCH;
/** Side of the metric test square: 5 cm. */
export const TEST_SQUARE_METRIC_MM = 50;
/** Type size of the title lines, pt. */
export const FURNITURE_TITLE_SIZE_PT = 9;
/** Distance between title baselines, mm (about 1.45 × the type size). */
export const FURNITURE_LINE_MM = 4.6;
/** Gap between the blocks of the furniture, mm. */
const BLOCK_GAP_MM = 5;
/** Gap between the two test squares, mm. */
const SQUARE_GAP_MM = 8;
/** Width of the furniture, mm: both squares side by side. */
export const FURNITURE_WIDTH_MM = TEST_SQUARE_INCH_MM + SQUARE_GAP_MM + TEST_SQUARE_METRIC_MM;
/** The tallest the assembly map may be drawn, mm. */
export const MAP_MAX_HEIGHT_MM = 90;

/** The grid the assembly map shows: canvas origin and size of the tile grid, mm. */
export interface MapGrid {
  origin: Point;
  width: number;
  height: number;
}

function mapScale(grid: MapGrid): number {
  return Math.min(FURNITURE_WIDTH_MM / grid.width, MAP_MAX_HEIGHT_MM / grid.height);
}

/** Width and height the furniture needs, mm, for `titleLineCount` lines and a map (or none). */
export function furnitureSize(titleLineCount: number, grid: MapGrid | null): { width: number; height: number } {
  const titles = titleLineCount * FURNITURE_LINE_MM;
  const squares = TEST_SQUARE_INCH_MM + FURNITURE_LINE_MM;
  const map = grid ? BLOCK_GAP_MM + grid.height * mapScale(grid) : 0;
  return { width: FURNITURE_WIDTH_MM, height: titles + BLOCK_GAP_MM + squares + map };
}

/**
 * Lays the furniture out with its top-left corner at `at` (paper frame, mm) on `page`
 * (a tile label or "cover").
 */
export function furnitureLay(at: Point, page: string, titleLineCount: number, grid: MapGrid | null): Furniture {
  const size = furnitureSize(titleLineCount, grid);
  const box: Rect = { x: at.x, y: at.y, width: size.width, height: size.height };
  const titleLines: Point[] = [];
  for (let i = 0; i < titleLineCount; i++) titleLines.push({ x: at.x, y: at.y + (i + 0.8) * FURNITURE_LINE_MM });
  const squaresTop = at.y + titleLineCount * FURNITURE_LINE_MM + BLOCK_GAP_MM;
  const captionY = squaresTop + TEST_SQUARE_INCH_MM + 0.85 * FURNITURE_LINE_MM;
  const metricX = at.x + TEST_SQUARE_INCH_MM + SQUARE_GAP_MM;
  const squares: TestSquare[] = [
    {
      caption: '2 in',
      rect: { x: at.x, y: squaresTop, width: TEST_SQUARE_INCH_MM, height: TEST_SQUARE_INCH_MM },
      captionAt: { x: at.x, y: captionY },
    },
    {
      caption: '5 cm',
      rect: { x: metricX, y: squaresTop, width: TEST_SQUARE_METRIC_MM, height: TEST_SQUARE_METRIC_MM },
      captionAt: { x: metricX, y: captionY },
    },
  ];
  let map: Furniture['map'] = null;
  if (grid) {
    const scale = mapScale(grid);
    const width = grid.width * scale;
    const rect: Rect = {
      x: at.x + (FURNITURE_WIDTH_MM - width) / 2,
      y: squaresTop + TEST_SQUARE_INCH_MM + FURNITURE_LINE_MM + BLOCK_GAP_MM,
      width,
      height: grid.height * scale,
    };
    map = { rect, scale, origin: { x: rect.x, y: rect.y } };
  }
  return { page, box, squares, titleLines, titleSizePt: FURNITURE_TITLE_SIZE_PT, map };
}
