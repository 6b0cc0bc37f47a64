/**
 * Warnings: rules of the trade a draft breaks while still being cuttable. Messages in the
 * input's unit.
 */
import type { TankSpec } from '../drafting/tank-params';
import { lengthFormat } from '../../units';
import type { Finished, FoldLayout, Piece, Warning } from '../types';

/** Front and back seams sewn together must match within this, mm (issue rule). */
export const SEAM_MATCH_MM = 1;

/** Shallowest front neckline at the fold: 3 in (common practice). */
export const MIN_FRONT_NECK_MM = 76.2;
/** A length converted from inches may fall a hair short of the limit (3 in → 76.19999… mm). */
const LIMIT_TOLERANCE_MM = 0.01;

function edgeLength(piece: Piece, name: 'side' | 'shoulder'): number {
  return piece.edges.find((e) => e.name === name)?.length ?? 0;
}

function percent(value: number): string {
  return `${Math.round(value * 10) / 10} %`;
}

/** Collects the warnings of a tank top draft. */
export function warningsCollect(
  spec: TankSpec,
  finished: Finished,
  front: Piece,
  back: Piece,
  layout: FoldLayout,
): Warning[] {
  const show = (mm: number) => lengthFormat(mm, spec.unit);
  const warnings: Warning[] = [];
  if (finished.stretchNeeded > spec.stretch) {
    warnings.push({
      code: 'stretch-insufficient',
      field: 'params.bustEase',
      message: `The garment must stretch ${percent(finished.stretchNeeded)} at the bust, more than the fabric's ${percent(spec.stretch)}: take less negative ease or choose a stretchier knit.`,
    });
  }
  if (finished.hipStretchNeeded > spec.stretch) {
    warnings.push({
      code: 'hip-stretch-insufficient',
      field: 'params.hipEase',
      message: `The garment must stretch ${percent(finished.hipStretchNeeded)} at the hem, more than the fabric's ${percent(spec.stretch)}: take less negative ease at the hip.`,
    });
  }
  if (spec.frontNeckDepth < MIN_FRONT_NECK_MM - LIMIT_TOLERANCE_MM) {
    warnings.push({
      code: 'neckline-shallow',
      field: 'params.frontNeckDepth',
      message: `The front neckline (${show(spec.frontNeckDepth)}) is shallower than the usual minimum of ${show(MIN_FRONT_NECK_MM)}: check that it goes over the head.`,
    });
  }
  for (const seam of ['side', 'shoulder'] as const) {
    const difference = Math.abs(edgeLength(front, seam) - edgeLength(back, seam));
    if (difference > SEAM_MATCH_MM) {
      warnings.push({
        code: 'seam-mismatch',
        message: `Front and back ${seam} seams differ by ${show(difference)}: they will not match when sewn.`,
      });
    }
  }
  if (!layout.fits && layout.fabricWidth !== null) {
    warnings.push({
      code: 'fabric-too-narrow',
      field: 'fabric.width',
      message: `The fabric (${show(layout.fabricWidth)}) is narrower than the ${show(layout.widthUsed)} needed even folded once: choose a wider fabric.`,
    });
  }
  return warnings;
}
