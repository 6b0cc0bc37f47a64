/**
 * Fold layouts: how to fold the fabric and where the pieces lie, mm. A tank top quarter is
 * cut on fabric folded in four so that front and back are cut together, each on a fold; when
 * the fabric is too narrow for four layers, it is folded once lengthwise and front and back
 * lie one after the other on that fold (trade notes, common practice). Stretch goes round the
 * body, so pieces are never turned across the grain.
 */
import type { FoldLayout, Piece, Placement } from '../types';

/** Clearance between pieces laid one after the other, mm (room for the cutter's blade; our default). */
export const PIECE_GAP_MM = 10;

/** What the layout needs to know about the draft beyond its pieces. */
export interface FoldLayoutOptions {
  /** Fabric width, mm, or null when unknown. */
  fabricWidth: number | null;
  /** True when the back's armhole is cut in for a racer back after cutting together. */
  racerBack: boolean;
}

function stackSize(pieces: readonly Piece[]): { width: number; height: number } {
  let width = 0;
  let height = 0;
  for (const piece of pieces) {
    width = Math.max(width, piece.bounds.maxX);
    height = Math.max(height, piece.bounds.height);
  }
  return { width, height };
}

function fourLayerSteps(pieces: readonly Piece[], racerBack: boolean): string[] {
  const steps = [
    'Fold the fabric in half lengthwise, then fold it in half again the same way, so that four layers lie flat and smooth with both folds on one side.',
    'Lay the pattern with its fold edge on the double fold and its grainline parallel to the fold.',
    `Cut ${pieces.map((p) => p.name.toLowerCase()).join(' and ')} together through all four layers, following the higher neckline and the outer armhole.`,
    'Separate the two pieces. On the one that becomes the front, cut the neckline down to the front neckline.',
  ];
  if (racerBack) steps.push('On the back, cut the armhole in along the racer-back line.');
  return steps;
}

function twoLayerSteps(pieces: readonly Piece[]): string[] {
  return [
    'Fold the fabric in half lengthwise so that two layers lie flat and smooth.',
    `Lay ${pieces.map((p) => p.name.toLowerCase()).join(', then ')} one after the other with their fold edges on the fold and grainlines parallel to it.`,
    'Cut each piece through both layers.',
  ];
}

/**
 * Plans the fold layout: four layers when the fabric is at least four times the widest piece
 * (or its width is unknown), else two layers when at least twice as wide, else the two-layer
 * plan marked as not fitting. Widths in mm.
 */
export function foldLayoutPlan(pieces: readonly Piece[], options: FoldLayoutOptions): FoldLayout {
  const { width, height } = stackSize(pieces);
  const fabricWidth = options.fabricWidth;
  if (fabricWidth === null || fabricWidth >= 4 * width) {
    return {
      fold: 'four-layers',
      layers: 4,
      fits: true,
      fabricWidth,
      widthUsed: 4 * width,
      lengthNeeded: height,
      placements: [{ pieceIds: pieces.map((p) => p.id), x: 0, y: 0, width, height, layers: 4 }],
      steps: fourLayerSteps(pieces, options.racerBack),
    };
  }
  const placements: Placement[] = [];
  let y = 0;
  for (const piece of pieces) {
    placements.push({ pieceIds: [piece.id], x: 0, y, width: piece.bounds.maxX, height: piece.bounds.height, layers: 2 });
    y += piece.bounds.height + PIECE_GAP_MM;
  }
  const fits = fabricWidth >= 2 * width;
  return {
    fold: fits ? 'two-layers' : 'does-not-fit',
    layers: 2,
    fits,
    fabricWidth,
    widthUsed: 2 * width,
    lengthNeeded: Math.max(0, y - PIECE_GAP_MM),
    placements,
    steps: fits ? twoLayerSteps(pieces) : [],
  };
}
