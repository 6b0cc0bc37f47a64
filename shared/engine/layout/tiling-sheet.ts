/**
 * The wide sheet for a copy shop: every piece at full size on one page, with the test
 * squares and title, on a 36 in roll (length as needed; wide-format plotters commonly take
 * 36 in rolls, common practice) or on A0 (ISO 216, 841 × 1189 mm). Pure computation, mm.
 */
import { printArrange, PIECE_GAP_MM } from './tiling-arrange';
import { furnitureLay, furnitureSize } from './tiling-furniture';
import {
  DEFAULT_MARGIN_MM,
  MAX_SHEET_LENGTH_MM,
  MIN_MARGIN_MM,
  PAPER_SIZES,
  paperOriented,
  SHEET_PAPER_IDS,
  type Orientation,
  type OrientationChoice,
  type SheetPaperId,
} from './tiling-paper';
import { PrintLayoutError } from './tiling-place';
import type { CanvasLayout, PrintItem, SheetPlan } from './tiling-types';

/** Id of the furniture's place holder while the pieces are arranged. */
const FURNITURE_ID = '__furniture__';

/** Options for {@link sheetPlan}; lengths in mm. */
export interface SheetOptions {
  paper: SheetPaperId;
  /** For A0 only; the roll is always as wide as the roll. Default `auto`: the one that fits. */
  orientation?: OrientationChoice;
  marginMm?: number;
  titleLineCount?: number;
}

/** A wide sheet's plan and the canvas of pieces drawn on it. */
export interface SheetLayout {
  plan: SheetPlan;
  canvas: CanvasLayout;
}

function layFor(items: readonly PrintItem[], options: SheetOptions, orientation: Orientation, margin: number): SheetLayout | null {
  const titleLineCount = options.titleLineCount ?? 0;
  const roll = PAPER_SIZES[options.paper].heightMm === null;
  const sheetWidth = roll ? PAPER_SIZES[options.paper].widthMm : paperOriented(options.paper, orientation).widthMm;
  const printableWidth = sheetWidth - 2 * margin;
  const size = furnitureSize(titleLineCount, null);
  const holder: PrintItem = { id: FURNITURE_ID, extent: { x: 0, y: 0, ...size }, outlines: [], marks: [] };
  const arranged = printArrange([...items, holder], { maxWidthMm: printableWidth, gapMm: PIECE_GAP_MM });
  if (arranged.bounds.width > printableWidth + 1e-6) return null;
  const sheetHeight = roll ? arranged.bounds.height + 2 * margin : paperOriented(options.paper, orientation).heightMm;
  if (arranged.bounds.height > sheetHeight - 2 * margin + 1e-6) return null;
  const canvasAt = { x: margin, y: margin };
  const spot = arranged.items.find((item) => item.id === FURNITURE_ID)!;
  const furniture = furnitureLay({ x: canvasAt.x + spot.rect.x, y: canvasAt.y + spot.rect.y }, 'sheet', titleLineCount, null);
  const canvas: CanvasLayout = {
    items: arranged.items.filter((item) => item.id !== FURNITURE_ID),
    bounds: arranged.bounds,
    outlines: arranged.outlines,
    marks: arranged.marks,
  };
  const plan: SheetPlan = {
    paper: options.paper,
    orientation: roll ? 'portrait' : orientation,
    sheet: { widthMm: sheetWidth, heightMm: sheetHeight },
    marginMm: margin,
    canvasAt,
    furniture,
  };
  return { plan, canvas };
}

/**
 * Lays every piece and page 1's furniture (title lines and test squares) on one wide
 * sheet. The roll is 36 in wide and as long as needed (at most 200 in); A0 takes the
 * orientation that fits (portrait first). Throws a {@link PrintLayoutError} naming the
 * option when the pieces do not fit.
 */
export function sheetPlan(items: readonly PrintItem[], options: SheetOptions): SheetLayout {
  const margin = options.marginMm ?? DEFAULT_MARGIN_MM;
  if (!SHEET_PAPER_IDS.includes(options.paper)) throw new PrintLayoutError('paper', `paper must be one of ${SHEET_PAPER_IDS.join(', ')}`);
  if (!(margin >= MIN_MARGIN_MM - 1e-9) || margin > 30) {
    throw new PrintLayoutError('marginMm', 'margin must be between 1/4 in (6.35 mm) and 30 mm');
  }
  if (items.length === 0) throw new PrintLayoutError('pieces', 'choose at least one piece to print');
  const choice = options.orientation ?? 'auto';
  const tries: Orientation[] = choice === 'auto' ? ['portrait', 'landscape'] : [choice];
  for (const orientation of tries) {
    const layout = layFor(items, options, orientation, margin);
    if (!layout) continue;
    if (layout.plan.sheet.heightMm > MAX_SHEET_LENGTH_MM) {
      throw new PrintLayoutError('paper', 'the sheet would be longer than 200 in; print tiles instead');
    }
    return layout;
  }
  const name = PAPER_SIZES[options.paper].name;
  throw new PrintLayoutError('paper', `the pieces do not fit on one ${name} sheet; choose the 36 in roll or tiles`);
}
