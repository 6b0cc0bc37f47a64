import { describe, expect, it } from 'vitest';
import { draft as draftMake } from '../index';
import { segmentsFlatten } from '../geometry/bezier';
import type { Draft, DraftInput } from '../types';
import { rectContainsPoint, rectContainsRect } from './tiling-geometry';
import { TILE_PAPER_IDS } from './tiling-paper';
import { PIECE_GAP_MM, printArrange } from './tiling-arrange';
import { draftSheetPlan, draftTilesPlan, piecesChoose, TILE_PIECE_GAPS_MM } from './tiling-draft';
import { printItemFromPiece } from './tiling-pieces';
import { tilesPlan } from './tiling';
import { EXAMPLE_INPUT } from '../test-support/inputs';

/** Float noise in mm sums. */
const MM_NOISE = 1e-6;

const inputs: DraftInput[] = [
  EXAMPLE_INPUT,
  { unit: 'cm', measurements: { bust: 128, hip: 140, waist: 118, armholeDepth: 26 }, fabric: { stretch: 60, recovery: 'fair' }, style: 'tank', params: { length: 110, racerBackInset: 7 } },
];

function drafted(input: DraftInput): Draft {
  const result = draftMake(input);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result.draft;
}

describe('tiling a drafted tank top', () => {
  for (const input of inputs) {
    const d = drafted(input);
    for (const paper of TILE_PAPER_IDS) {
      it(`covers every point of every cutting line on ${paper} (bust ${input.measurements.bust} ${input.unit})`, () => {
        const { plan, canvas, pieces } = draftTilesPlan(d, { paper, overlapMm: 12.7 });
        for (const item of canvas.items) {
          const piece = pieces.find((p) => p.id === item.id)!;
          // the cutting line itself, its curves flattened finely, moved to its place on the canvas
          const points = segmentsFlatten(piece.cutting.segments, 0.05).map((p) => ({ x: p.x + item.offset.x, y: p.y + item.offset.y }));
          for (const p of points) expect(plan.pages.some((page) => rectContainsPoint(page.region, p, MM_NOISE))).toBe(true);
        }
        for (const page of plan.pages) {
          for (const mark of page.marks) expect(rectContainsPoint(page.printable, mark.centre)).toBe(true);
          for (const text of page.texts) expect(rectContainsRect(page.printable, text.box, MM_NOISE)).toBe(true);
        }
      });
    }
  }

  it('prints every part of every piece text', () => {
    for (const paper of TILE_PAPER_IDS) {
      const { plan, texts } = draftTilesPlan(drafted(inputs[0]!), { paper });
      for (const { box } of texts) {
        for (let i = 0; i <= 10; i++) {
          for (let j = 0; j <= 4; j++) {
            const p = { x: box.x + (box.width * i) / 10, y: box.y + (box.height * j) / 4 };
            expect(plan.pages.some((page) => rectContainsPoint(page.region, p, MM_NOISE))).toBe(true);
          }
        }
      }
    }
  });

  it('keeps every piece inside the wide sheet', () => {
    const { layout } = draftSheetPlan(drafted(inputs[1]!), { paper: 'roll36' });
    const printable = { x: layout.plan.marginMm, y: layout.plan.marginMm, width: layout.plan.sheet.widthMm - 2 * layout.plan.marginMm, height: layout.plan.sheet.heightMm - 2 * layout.plan.marginMm };
    for (const item of layout.canvas.items) {
      expect(rectContainsRect(printable, { ...item.rect, x: item.rect.x + layout.plan.canvasAt.x, y: item.rect.y + layout.plan.canvasAt.y }, MM_NOISE)).toBe(true);
    }
  });

  it('narrows the gap between pieces when that saves pages', () => {
    const d = drafted(inputs[0]!);
    const chosen = draftTilesPlan(d, { paper: 'a3' });
    const wide = tilesPlan(printArrange(d.pieces.map((p) => printItemFromPiece(p)), { gapMm: PIECE_GAP_MM }), { paper: 'a3' });
    expect(chosen.plan.pageCount).toBeLessThan(wide.pageCount);
    const gap = chosen.canvas.items[1]!.rect.x - (chosen.canvas.items[0]!.rect.x + chosen.canvas.items[0]!.rect.width);
    expect(gap).toBe(TILE_PIECE_GAPS_MM[1]);
    for (const paper of TILE_PAPER_IDS) {
      const best = draftTilesPlan(d, { paper }).plan.pageCount;
      const widest = tilesPlan(printArrange(d.pieces.map((p) => printItemFromPiece(p))), { paper }).pageCount;
      expect(best).toBeLessThanOrEqual(widest);
    }
  });

  it('refuses an unknown piece, naming the field', () => {
    expect(() => piecesChoose(drafted(inputs[0]!), ['sleeve'])).toThrow(/^pieceIds: no such piece in this draft: sleeve$/);
  });
});
