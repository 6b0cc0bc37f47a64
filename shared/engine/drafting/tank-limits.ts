/**
 * Consistency of a tank top input: checks that need several fields at once (a neckline deeper
 * than the armhole allows, a strap inset wider than the shoulder, ...). Messages name the
 * field and state lengths in the input's unit. Run after every field is in its range.
 */
import type { DraftInput } from '../../schemas/draft-input';
import { lengthFormat } from '../../units';
import type { FieldError } from '../types';
import { segmentsFlatten } from '../geometry/bezier';
import { polylinesDistance } from '../geometry/polygon';
import { tankEdgesBuild } from './tank-edges';
import { tankFrameBuild, type TankFrame } from './tank-frame';
import { tankSpecResolve, type TankSpec } from './tank-params';

/** Least side seam below the underarm, mm (2 in; our limit: shorter is a crop, not a tank). */
export const MIN_SIDE_SEAM_MM = 50;

/** Least armhole width between the strap's outer edge and the side seam at the underarm, mm (1 in; our limit). */
export const MIN_ARMHOLE_WIDTH_MM = 25;

/** Least strap left inside the strap's outer edge, and between a racer back's armhole and its neckline, mm (our limit). */
export const MIN_RACER_STRAP_MM = 10;

/** Least fabric between a racer back's neckline and its armhole's innermost point, mm (our limit). */
export const MIN_RACER_NECK_CLEARANCE_MM = 15;

/** Flattening tolerance for the racer strap check, mm: coarse, the limit is 10 mm. */
const RACER_CHECK_TOLERANCE_MM = 0.2;

/**
 * Narrowest width of a racer back's strap: the least distance between the back neckline and
 * the back armhole, mm.
 */
export function racerStrapWidth(spec: TankSpec, frame: TankFrame): number {
  const back = tankEdgesBuild(spec, frame, 'back');
  return polylinesDistance(
    segmentsFlatten(back.neck, RACER_CHECK_TOLERANCE_MM),
    segmentsFlatten(back.armhole, RACER_CHECK_TOLERANCE_MM),
  );
}

/** The field errors of a tank top input whose fields are each in range; empty when consistent. */
export function tankInputCheck(input: DraftInput): FieldError[] {
  const spec = tankSpecResolve(input);
  const frame = tankFrameBuild(spec);
  const show = (mm: number) => lengthFormat(mm, spec.unit);
  const errors: FieldError[] = [];
  const minLength = spec.armholeDepth + spec.sideHemRise + MIN_SIDE_SEAM_MM;
  if (spec.length < minLength - 1e-6) {
    errors.push({
      path: 'params.length',
      message: `Length must be at least ${show(minLength)}: the armhole depth (${show(spec.armholeDepth)}) plus the side hem rise (${show(spec.sideHemRise)}) plus ${show(MIN_SIDE_SEAM_MM)} of side seam`,
    });
  }
  if (spec.frontNeckDepth > spec.armholeDepth + 1e-6) {
    errors.push({
      path: 'params.frontNeckDepth',
      message: `Front neck depth (${show(spec.frontNeckDepth)}) must not be deeper than the armhole depth (${show(spec.armholeDepth)})`,
    });
  }
  const backNeckMax =
    spec.racerBackInset === null ? spec.armholeDepth : spec.armholeDepth / 2 - MIN_RACER_NECK_CLEARANCE_MM;
  if (spec.backNeckDepth > backNeckMax + 1e-6) {
    errors.push({
      path: 'params.backNeckDepth',
      message:
        spec.racerBackInset === null
          ? `Back neck depth (${show(spec.backNeckDepth)}) must not be deeper than the armhole depth (${show(spec.armholeDepth)})`
          : `With a racer back, the back neck depth (${show(spec.backNeckDepth)}) must be at most ${show(backNeckMax)}, above the racer-back line at half the armhole depth`,
    });
  }
  const strapOuter = spec.strapInset + spec.strapWidth;
  if (strapOuter + MIN_ARMHOLE_WIDTH_MM > frame.quarterBust + 1e-6) {
    errors.push({
      path: 'params.strapInset',
      message: `Strap inset plus strap width (${show(strapOuter)}) must leave at least ${show(MIN_ARMHOLE_WIDTH_MM)} of armhole before the side seam, which lies ${show(frame.quarterBust)} from the fold at the underarm`,
    });
  }
  const slopeMax = Math.min(spec.strapWidth, spec.armholeDepth / 4);
  if (spec.shoulderSlope > slopeMax + 1e-6) {
    errors.push({
      path: 'params.shoulderSlope',
      message: `Shoulder slope (${show(spec.shoulderSlope)}) must be at most ${show(slopeMax)}: no more than the strap width and a quarter of the armhole depth`,
    });
  }
  if (spec.racerBackInset !== null) {
    const racerMax = strapOuter - MIN_RACER_STRAP_MM;
    if (spec.racerBackInset > racerMax + 1e-6) {
      errors.push({
        path: 'params.racerBackInset',
        message: `Racer back inset (${show(spec.racerBackInset)}) must be at most ${show(racerMax)}, inside the strap's outer edge`,
      });
    }
  }
  if (spec.racerBackInset !== null && errors.length === 0) {
    const clearance = racerStrapWidth(spec, frame);
    if (clearance < MIN_RACER_STRAP_MM) {
      errors.push({
        path: 'params.racerBackInset',
        message: `The racer back comes within ${show(clearance)} of the back neckline; the strap between them must be at least ${show(MIN_RACER_STRAP_MM)} wide: move the racer back inset out from the fold or raise the back neck`,
      });
    }
  }
  return errors;
}
