import { describe, expect, it } from 'vitest';
import { rectContainsRect, rectsIntersect } from './tiling-geometry';
import { rectangleItem } from './tiling-test-shapes';
import { sheetPlan } from './tiling-sheet';

/** Float noise in mm sums. */
const MM_NOISE = 1e-6;

describe('sheetPlan', () => {
  const pieces = [rectangleItem('front', 300, 700), rectangleItem('back', 300, 690)];

  it('lays every piece on a 36 in roll, as long as needed', () => {
    const { plan, canvas } = sheetPlan(pieces, { paper: 'roll36', titleLineCount: 4 });
    expect(plan.sheet.widthMm).toBeCloseTo(914.4, 9); // 36 × 25.4 mm (NIST SP 811)
    const printable = { x: plan.marginMm, y: plan.marginMm, width: plan.sheet.widthMm - 2 * plan.marginMm, height: plan.sheet.heightMm - 2 * plan.marginMm };
    for (const item of canvas.items) {
      const onSheet = { ...item.rect, x: item.rect.x + plan.canvasAt.x, y: item.rect.y + plan.canvasAt.y };
      expect(rectContainsRect(printable, onSheet, MM_NOISE)).toBe(true);
      expect(rectsIntersect(onSheet, plan.furniture.box)).toBe(false);
    }
    expect(rectContainsRect(printable, plan.furniture.box, MM_NOISE)).toBe(true);
    expect(plan.furniture.map).toBeNull();
    expect(plan.furniture.squares.map((s) => s.caption)).toEqual(['2 in', '5 cm']);
  });

  it('starts a new row on the roll when the pieces are wider than the roll', () => {
    const wide = [rectangleItem('a', 500, 400), rectangleItem('b', 500, 400)];
    const { plan, canvas } = sheetPlan(wide, { paper: 'roll36' });
    expect(canvas.items[1]!.rect.y).toBeGreaterThan(canvas.items[0]!.rect.y + 400);
    expect(plan.sheet.heightMm).toBeGreaterThan(800);
  });

  it('uses A0 in the orientation that fits', () => {
    // three 250 × 700 mm pieces fit across A0 portrait (841 mm wide), the squares in a second row;
    // a 1000 mm wide piece only fits across A0 landscape (1189 mm wide)
    const tall = [rectangleItem('a', 250, 700), rectangleItem('b', 250, 700), rectangleItem('c', 250, 700)];
    const { plan } = sheetPlan(tall, { paper: 'a0' });
    expect(plan.orientation).toBe('portrait');
    expect(plan.sheet).toEqual({ widthMm: 841, heightMm: 1189 });
    const wide = [rectangleItem('a', 1000, 500)];
    expect(sheetPlan(wide, { paper: 'a0' }).plan.orientation).toBe('landscape');
  });

  it('refuses pieces that do not fit on A0 and names the field', () => {
    expect(() => sheetPlan([rectangleItem('huge', 900, 1200)], { paper: 'a0' })).toThrow(/^paper: the pieces do not fit/);
    expect(() => sheetPlan(pieces, { paper: 'roll36', marginMm: 2 })).toThrow(/^marginMm:/);
  });
});
