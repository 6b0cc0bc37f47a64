/**
 * Binding strips for the neckline and the armholes. Openings are measured along the stitching
 * line, half on the fold doubled (common practice); cut length = opening × ratio + 2 × join
 * allowance. Default ratios (common practice, trade notes): knit tape applied unstretched 1:1;
 * self-fabric neckband 0.85; armhole band 0.9, between the neckband's 0.85 and interlock's 1:1.
 */
import type { TankSpec } from '../drafting/tank-params';
import type { Binding, BindingOpening, Piece } from '../types';

/** Default binding ratios by finish and opening. */
export const BINDING_RATIOS: Record<'tape' | 'band', Record<BindingOpening, number>> = {
  tape: { neck: 1, armhole: 1 },
  band: { neck: 0.85, armhole: 0.9 },
};

function edgeLength(piece: Piece, name: 'neck' | 'armhole'): number {
  const edge = piece.edges.find((e) => e.name === name);
  if (!edge) throw new Error(`piece ${piece.id} has no ${name} edge`);
  return edge.length;
}

function bindingMake(spec: TankSpec, opening: BindingOpening, openingLength: number, count: number): Binding {
  const ratio = spec.bindingRatio ?? BINDING_RATIOS[spec.edgeFinish][opening];
  const cutWidth = spec.edgeFinish === 'band' ? 2 * spec.bindingWidth + 2 * spec.seamAllowance : spec.bindingWidth;
  const kind = spec.edgeFinish === 'band' ? 'band' : 'binding';
  return {
    id: `${opening}-${spec.edgeFinish}`,
    name: opening === 'neck' ? `Neckline ${kind}` : `Armhole ${kind}`,
    opening,
    finish: spec.edgeFinish,
    openingLength,
    ratio,
    joinAllowance: spec.bindingJoinAllowance,
    cutLength: openingLength * ratio + 2 * spec.bindingJoinAllowance,
    width: spec.bindingWidth,
    cutWidth,
    count,
    // Neck join at centre back; armhole join about 1 cm behind the underarm seam (common practice).
    joinAt: opening === 'neck' ? 'centre back' : 'about 1 cm behind the underarm seam',
  };
}

/** The neckline strip and the two armhole strips of a tank top, mm. */
export function bindingsCompute(spec: TankSpec, front: Piece, back: Piece): Binding[] {
  const neck = 2 * (edgeLength(front, 'neck') + edgeLength(back, 'neck'));
  const armhole = edgeLength(front, 'armhole') + edgeLength(back, 'armhole');
  return [bindingMake(spec, 'neck', neck, 1), bindingMake(spec, 'armhole', armhole, 2)];
}
