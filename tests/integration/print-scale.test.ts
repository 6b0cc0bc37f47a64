/**
 * True scale: pages rendered by poppler's pdftoppm (Debian's poppler-utils) at 100 dpi and
 * measured by scanning pixels. At 100 dpi, 1 in = 100 px (1 in = 25.4 mm, NIST SP 811;
 * 72 pt per inch, ISO 32000-1, 8.3.2.3): the 2 in square is 200 px and the 5 cm square
 * 5 / 2.54 × 100 = 196.85 px.
 */
import { describe, expect, it } from 'vitest';
import { draftTilesPlan } from '../../shared/engine/layout/tiling-draft';
import { rectsIntersect } from '../../shared/engine/layout/tiling-geometry';
import type { Rect, TestSquare } from '../../shared/engine/layout/tiling-types';
import { built, darkRuns, darkRunsDown, demoDraft, pageRender, type GreyImage } from './print-fixtures';

const DPI = 100;
/** One pixel either way: the edge of an anti-aliased fill or line. */
const PIXEL = 1;
/** Between the squares' grey (#c8c8c8 = 200) and the paper (255). */
const SQUARE_THRESHOLD = 228;
/** Between black lines and the paper. */
const LINE_THRESHOLD = 128;

const px = (mm: number): number => (mm / 25.4) * DPI;
const draft = demoDraft();

/** The square's width and height in px, measured through its middle. */
function squareMeasure(image: GreyImage, square: TestSquare): { width: number; height: number } {
  const { rect } = square;
  const row = Math.round(px(rect.y + rect.height / 2));
  const col = Math.round(px(rect.x + rect.width / 2));
  const across = darkRuns(image, row, Math.floor(px(rect.x - 4)), Math.ceil(px(rect.x + rect.width + 4)), SQUARE_THRESHOLD);
  const down = darkRunsDown(image, col, Math.floor(px(rect.y - 4)), Math.ceil(px(rect.y + rect.height + 4)), SQUARE_THRESHOLD);
  expect(across).toHaveLength(1);
  expect(down).toHaveLength(1);
  return { width: across[0]![1] - across[0]![0], height: down[0]![1] - down[0]![0] };
}

function squaresCheck(image: GreyImage, squares: TestSquare[]): void {
  const [inch, metric] = squares;
  const a = squareMeasure(image, inch!);
  expect(Math.abs(a.width - 200)).toBeLessThanOrEqual(PIXEL); // 2 in at 100 dpi
  expect(Math.abs(a.height - 200)).toBeLessThanOrEqual(PIXEL);
  const b = squareMeasure(image, metric!);
  expect(Math.abs(b.width - 196.85)).toBeLessThanOrEqual(PIXEL); // 5 cm at 100 dpi
  expect(Math.abs(b.height - 196.85)).toBeLessThanOrEqual(PIXEL);
}

describe('true scale of the printed pages', () => {
  for (const paper of ['letter', 'a4'] as const) {
    it(`prints the test squares on page 1 of ${paper} tiles at their size`, () => {
      const result = built(draft, { kind: 'tiles', paper, meta: { client: 'Maren Holt', date: '2025-03-14' } });
      const image = pageRender(result.bytes, 1, DPI);
      // the sheet itself: Letter 8.5 in = 850 px, A4 210 mm = 826.8 px (pdftoppm rounds up)
      expect(Math.abs(image.width - px(result.tiles!.sheet.widthMm))).toBeLessThanOrEqual(PIXEL);
      squaresCheck(image, result.tiles!.furniture.squares);
    });
  }

  it('prints the test squares on the wide sheet at their size', () => {
    const result = built(draft, { kind: 'sheet', paper: 'roll36' });
    squaresCheck(pageRender(result.bytes, 1, DPI), result.sheet!.furniture.squares);
  });

  it('prints a known length of the pattern at its size on an inner page', () => {
    // the back's grainline runs parallel to its fold at a known distance (the draft's own figure)
    const options = { paper: 'letter', orientation: 'portrait', titleLineCount: 6 } as const;
    const laid = draftTilesPlan(draft, options);
    const plan = laid.plan;
    expect(plan.rows).toBeGreaterThanOrEqual(3);
    expect(plan.cols).toBeGreaterThanOrEqual(3);
    const page = plan.pages.find((p) => p.row === 1 && p.col === 1)!; // B2: neighbours on all four sides
    expect(Object.keys(page.neighbours)).toHaveLength(4);
    const back = laid.pieces.find((p) => p.id === 'back')!;
    const item = laid.canvas.items.find((i) => i.id === 'back')!;
    const foldX = item.offset.x;
    const grainX = item.offset.x + back.grainline.from.x;
    const toPaperX = (x: number): number => x - page.region.x + page.printable.x;
    const toPaperY = (y: number): number => y - page.region.y + page.printable.y;
    expect(grainX).toBeGreaterThan(page.region.x + plan.overlapMm);
    expect(grainX).toBeLessThan(page.region.x + page.region.width - plan.overlapMm);

    // a row inside the page's own area, along the grainline's shaft, clear of every text
    const top = Math.max(page.region.y + plan.overlapMm, item.offset.y + back.grainline.from.y + 10);
    const bottom = Math.min(page.region.y + page.region.height - plan.overlapMm, item.offset.y + back.grainline.to.y - 10);
    let rowY: number | null = null;
    for (let y = top; y <= bottom; y += 2) {
      const band: Rect = { x: foldX - 5, y: y - 2, width: grainX - foldX + 10, height: 4 };
      if (!laid.texts.some((t) => rectsIntersect(t.box, band))) {
        rowY = y;
        break;
      }
    }
    expect(rowY).not.toBeNull();

    const result = built(draft, { kind: 'tiles', paper: options.paper, orientation: options.orientation });
    expect(result.tiles!.pages.find((p) => p.label === page.label)!.region).toEqual(page.region);
    const image = pageRender(result.bytes, page.pageNumber, DPI);
    const row = Math.round(px(toPaperY(rowY!)));
    const runs = darkRuns(image, row, Math.floor(px(toPaperX(foldX) - 3)), Math.ceil(px(toPaperX(grainX) + 3)), LINE_THRESHOLD);
    const centre = (run: [number, number]): number => (run[0] + run[1]) / 2;
    const near = (x: number) => runs.filter((run) => Math.abs(centre(run) - px(toPaperX(x))) <= px(1.5));
    expect(near(foldX)).toHaveLength(1);
    expect(near(grainX)).toHaveLength(1);
    const measured = centre(near(grainX)[0]!) - centre(near(foldX)[0]!);
    expect(Math.abs(measured - px(back.grainline.from.x))).toBeLessThanOrEqual(PIXEL);
  });
});
