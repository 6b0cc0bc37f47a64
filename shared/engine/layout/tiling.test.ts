import { describe, expect, it } from 'vitest';
import { printArrange } from './tiling-arrange';
import { polygonMeetsRect, rectContainsPoint, rectContainsRect } from './tiling-geometry';
import { mmToPt, PAPER_SIZES, paperOriented } from './tiling-paper';
import { PrintLayoutError } from './tiling-place';
import { lShapeItem, polylineDensify, rectangleItem } from './tiling-test-shapes';
import { rowLetters, tileCount, tileLabel, tilesPlan, visibleArea } from './tiling';
import type { Rect, TilePage, TilePlan } from './tiling-types';

/** Two PDF coordinates closer than this print as the same point: jsPDF writes them to 0.01 pt. */
const PT_ROUNDING = 0.005;
/** Float noise in mm sums. */
const MM_NOISE = 1e-6;

function pageToCanvas(page: TilePage, p: { x: number; y: number }) {
  return { x: p.x - page.printable.x + page.region.x, y: p.y - page.printable.y + page.region.y };
}

function allInside(plan: TilePlan, check: (page: TilePage, box: Rect) => void) {
  for (const page of plan.pages) {
    for (const mark of page.marks) {
      const h = mark.halfSize;
      check(page, { x: mark.centre.x - h, y: mark.centre.y - h, width: 2 * h, height: 2 * h });
    }
    for (const text of page.texts) check(page, text.box);
    for (const guide of page.guides) {
      check(page, { x: Math.min(guide.from.x, guide.to.x), y: Math.min(guide.from.y, guide.to.y), width: Math.abs(guide.to.x - guide.from.x), height: Math.abs(guide.to.y - guide.from.y) });
    }
  }
}

describe('paper sizes', () => {
  it('gives ANSI sizes in points at 72 pt per inch', () => {
    // ANSI Letter 8.5 × 11 in, Legal 8.5 × 14 in, Tabloid 11 × 17 in; 72 pt/in (ISO 32000-1, 8.3.2.3)
    expect(mmToPt(PAPER_SIZES.letter.widthMm)).toBeCloseTo(612, 9);
    expect(mmToPt(PAPER_SIZES.letter.heightMm!)).toBeCloseTo(792, 9);
    expect(mmToPt(PAPER_SIZES.legal.heightMm!)).toBeCloseTo(1008, 9);
    expect(mmToPt(PAPER_SIZES.tabloid.widthMm)).toBeCloseTo(792, 9);
    expect(mmToPt(PAPER_SIZES.tabloid.heightMm!)).toBeCloseTo(1224, 9);
  });

  it('gives ISO 216 sizes in points to 0.01 pt', () => {
    // ISO 216: A4 210 × 297 mm = 595.28 × 841.89 pt, A3 297 × 420 mm = 841.89 × 1190.55 pt
    expect(Math.abs(mmToPt(PAPER_SIZES.a4.widthMm) - 595.28)).toBeLessThan(PT_ROUNDING);
    expect(Math.abs(mmToPt(PAPER_SIZES.a4.heightMm!) - 841.89)).toBeLessThan(PT_ROUNDING);
    expect(Math.abs(mmToPt(PAPER_SIZES.a3.heightMm!) - 1190.55)).toBeLessThan(PT_ROUNDING);
    // A0 has an area of 1 m² (ISO 216), to the whole millimetre
    expect(Math.abs((PAPER_SIZES.a0.widthMm * PAPER_SIZES.a0.heightMm!) / 1e6 - 1)).toBeLessThan(0.001);
  });

  it('turns the sheet for landscape', () => {
    expect(paperOriented('a4', 'landscape')).toEqual({ widthMm: 297, heightMm: 210 });
  });
});

describe('tile labels', () => {
  it('letters rows and numbers columns', () => {
    expect(tileLabel(0, 0)).toBe('A1');
    expect(tileLabel(1, 2)).toBe('B3');
    expect(rowLetters(25)).toBe('Z');
    expect(rowLetters(26)).toBe('AA');
  });
});

describe('tile count', () => {
  it('needs n tiles when n steps and one overlap reach the length', () => {
    // 500 mm on 200 mm printable with 10 mm overlap: 2 tiles reach 390 mm, 3 reach 580 mm
    expect(tileCount(500, 200, 10)).toBe(3);
    expect(tileCount(390, 200, 10)).toBe(2);
    expect(tileCount(50, 200, 10)).toBe(1);
  });
});

describe('tilesPlan on a rectangle', () => {
  const canvas = printArrange([rectangleItem('front', 500, 700)]);

  it('chooses the orientation that needs fewer pages', () => {
    // Letter printable with 3/8 in margins: 196.85 × 260.35 mm; steps 184.15 × 247.65 mm with 1/2 in overlap.
    // Portrait: 3 × 3 tiles; landscape: 2 columns × 4 rows.
    const portrait = tilesPlan(canvas, { paper: 'letter', orientation: 'portrait' });
    const landscape = tilesPlan(canvas, { paper: 'letter', orientation: 'landscape' });
    expect([portrait.cols, portrait.rows]).toEqual([3, 3]);
    expect([landscape.cols, landscape.rows]).toEqual([2, 4]);
    const auto = tilesPlan(canvas, { paper: 'letter' });
    expect(auto.orientation).toBe('landscape');
    expect(auto.pageCount).toBe(Math.min(portrait.pageCount, landscape.pageCount));
  });

  it('keeps the orientation set by hand', () => {
    expect(tilesPlan(canvas, { paper: 'a4', orientation: 'portrait' }).orientation).toBe('portrait');
  });

  it('overlaps neighbours by exactly the set amount', () => {
    const plan = tilesPlan(canvas, { paper: 'a4', overlapMm: 15 });
    for (const cell of plan.cells) {
      const right = plan.cells.find((c) => c.row === cell.row && c.col === cell.col + 1);
      const below = plan.cells.find((c) => c.row === cell.row + 1 && c.col === cell.col);
      if (right) expect(cell.region.x + cell.region.width - right.region.x).toBeCloseTo(15, 9);
      if (below) expect(cell.region.y + cell.region.height - below.region.y).toBeCloseTo(15, 9);
    }
  });

  it('keeps the printable area inside the margin', () => {
    const plan = tilesPlan(canvas, { paper: 'legal', marginMm: 8 });
    const page = plan.pages[0]!;
    expect(page.printable.x).toBe(8);
    expect(page.printable.x + page.printable.width).toBeCloseTo(plan.sheet.widthMm - 8, 9);
  });

  it('refuses a margin in the unprintable band and names the field', () => {
    expect(() => tilesPlan(canvas, { paper: 'letter', marginMm: 5 })).toThrow(PrintLayoutError);
    expect(() => tilesPlan(canvas, { paper: 'letter', marginMm: 5 })).toThrow(/^marginMm:/);
    expect(() => tilesPlan(canvas, { paper: 'letter', overlapMm: 80 })).toThrow(/^overlapMm:/);
    expect(() => tilesPlan(printArrange([]), { paper: 'letter' })).toThrow(/^pieces:/);
  });
});

describe('tilesPlan on shapes with empty tiles', () => {
  // an L with a large empty corner, and a small square far to the right
  const canvas = printArrange([lShapeItem('body', 600, 800, 420, 560), rectangleItem('strip', 60, 60)], { gapMm: 400 });
  const plan = tilesPlan(canvas, { paper: 'letter', orientation: 'portrait' });

  it('covers every point of every cutting line with a printed page', () => {
    for (const outline of canvas.outlines) {
      for (const p of polylineDensify(outline, 2)) {
        expect(plan.pages.some((page) => rectContainsPoint(page.region, p, MM_NOISE))).toBe(true);
      }
    }
  });

  it('leaves out the pages nothing falls on and lists them', () => {
    expect(plan.blank.length).toBeGreaterThan(0);
    for (const label of plan.blank) {
      const cell = plan.cells.find((c) => c.label === label)!;
      expect(canvas.outlines.some((outline) => polygonMeetsRect(outline, cell.region))).toBe(false);
      expect(plan.pages.some((page) => page.label === label)).toBe(false);
    }
    expect(plan.pages.length + plan.blank.length).toBe(plan.rows * plan.cols);
  });

  it('numbers the pages in reading order after the cover', () => {
    const numbers = plan.pages.map((page) => page.pageNumber);
    const first = plan.cover ? 2 : 1;
    expect(numbers).toEqual(numbers.map((_, i) => first + i));
    expect(plan.pageCount).toBe(plan.pages.length + (plan.cover ? 1 : 0));
  });

  it('puts every mark and note inside the printable area', () => {
    allInside(plan, (page, box) => expect(rectContainsRect(page.printable, box, MM_NOISE)).toBe(true));
  });

  it('prints each match mark at the same point of the pattern on both neighbours', () => {
    let pairs = 0;
    for (const page of plan.pages) {
      for (const mark of page.marks.filter((m) => m.edge === 'right' || m.edge === 'bottom')) {
        const other = plan.pages.find((p) => p.label === mark.neighbour)!;
        const facing = mark.edge === 'right' ? 'left' : 'top';
        const here = pageToCanvas(page, mark.centre);
        const match = other.marks.filter((m) => m.edge === facing && m.neighbour === page.label).map((m) => pageToCanvas(other, m.centre));
        expect(match.some((p) => Math.hypot(p.x - here.x, p.y - here.y) < MM_NOISE)).toBe(true);
        pairs++;
      }
    }
    expect(pairs).toBeGreaterThan(0);
  });

  it('draws trim lines only towards printed neighbours, halfway into the overlap', () => {
    for (const page of plan.pages) {
      for (const guide of page.guides) {
        expect(plan.pages.some((p) => p.label === guide.neighbour)).toBe(true);
        if (guide.edge === 'left') expect(guide.from.x - page.printable.x).toBeCloseTo(plan.overlapMm / 2, 9);
        if (guide.edge === 'bottom') expect(page.printable.y + page.printable.height - guide.from.y).toBeCloseTo(plan.overlapMm / 2, 9);
      }
    }
  });

  it('labels each page where it stays in view after assembly', () => {
    for (const page of plan.pages) {
      const label = page.texts.find((t) => t.role === 'page-label')!;
      expect(label.text).toBe(page.label);
      expect(rectContainsRect(visibleArea(page, plan.overlapMm), label.box, MM_NOISE)).toBe(true);
    }
  });
});

describe('page 1 furniture', () => {
  it('sits on the first tile, clear of the pattern, when there is room', () => {
    // a narrow strip leaves most of A1 free on A3
    const canvas = printArrange([lShapeItem('strap', 250, 500, 200, 300)]);
    const plan = tilesPlan(canvas, { paper: 'a3', titleLineCount: 5 });
    expect(plan.cover).toBe(false);
    const first = plan.pages[0]!;
    expect(plan.furniture.page).toBe(first.label);
    const onCanvas = { ...plan.furniture.box, ...pageToCanvas(first, plan.furniture.box) };
    expect(canvas.outlines.some((outline) => polygonMeetsRect(outline, onCanvas))).toBe(false);
    expect(rectContainsRect(first.printable, plan.furniture.box)).toBe(true);
  });

  it('gets a cover page when the first tile is full', () => {
    const plan = tilesPlan(printArrange([rectangleItem('front', 500, 700)]), { paper: 'letter', titleLineCount: 5 });
    expect(plan.cover).toBe(true);
    expect(plan.furniture.page).toBe('cover');
    expect(plan.pages[0]!.pageNumber).toBe(2);
  });

  it('carries a 2 in and a 5 cm test square and a map of the whole grid', () => {
    const plan = tilesPlan(printArrange([rectangleItem('front', 500, 700)]), { paper: 'a4', titleLineCount: 4 });
    const [inch, metric] = plan.furniture.squares;
    expect(inch!.rect.width).toBeCloseTo(50.8, 9); // 2 in × 25.4 mm (NIST SP 811)
    expect(metric!.rect.width).toBe(50);
    const map = plan.furniture.map!;
    expect(map.rect.width).toBeCloseTo((plan.cols * plan.step.x + plan.overlapMm) * map.scale, 9);
    expect(map.rect.height).toBeCloseTo((plan.rows * plan.step.y + plan.overlapMm) * map.scale, 9);
    expect(plan.furniture.titleLines).toHaveLength(4);
  });
});
