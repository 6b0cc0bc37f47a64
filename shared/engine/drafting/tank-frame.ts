/**
 * The frame of a tank top quarter: the girths after ease and the key points every edge runs
 * between. x from the fold, y down from the shoulder line, mm. Trade method (common practice):
 * a quarter of the bust after its ease at the underarm, a quarter of the hip after its ease at
 * the hem, the strap set in from the fold with a little shoulder slope.
 */
import type { Point } from '../types';
import type { TankSpec } from './tank-params';

/**
 * Waist level below the shoulder line per unit of armhole depth when the waist is shaped:
 * 1.9 (8 1/2 in armhole → about 16 in, close to a misses back-waist length; from memory).
 */
export const WAIST_LEVEL_PER_ARMHOLE_DEPTH = 1.9;

/** The waist is shaped only when it lies at least this far from the underarm and the hem, mm. */
export const WAIST_SHAPING_CLEARANCE_MM = 40;

/** The waist is shaped only when it comes in at least this far from the straight side, mm. */
export const WAIST_SHAPING_MIN_MM = 1;

/** Key figures and points of a tank top quarter, mm. */
export interface TankFrame {
  quarterBust: number;
  quarterHip: number;
  /** Quarter girth of the garment at the waist level, shaped or not; null when the waist is not given or falls outside the side seam. */
  quarterWaist: number | null;
  waistLevel: number | null;
  /** True when the side seam curves in to the waist point. */
  waistShaped: boolean;
  strapInner: Point;
  strapOuter: Point;
  underarm: Point;
  hemFold: Point;
  hemSide: Point;
}

/** Builds the frame of a tank top quarter from its resolved spec (mm). */
export function tankFrameBuild(spec: TankSpec): TankFrame {
  const quarterBust = (spec.bust * (1 + spec.bustEase / 100)) / 4;
  const quarterHip = (spec.hip * (1 + spec.hipEase / 100)) / 4;
  const underarm = { x: quarterBust, y: spec.armholeDepth };
  const hemSide = { x: quarterHip, y: spec.length - spec.sideHemRise };
  let quarterWaist: number | null = null;
  let waistLevel: number | null = null;
  let waistShaped = false;
  const level = WAIST_LEVEL_PER_ARMHOLE_DEPTH * spec.armholeDepth;
  if (
    spec.waist !== null &&
    level >= underarm.y + WAIST_SHAPING_CLEARANCE_MM &&
    level <= hemSide.y - WAIST_SHAPING_CLEARANCE_MM
  ) {
    waistLevel = level;
    const straight = quarterBust + ((quarterHip - quarterBust) * (level - underarm.y)) / (hemSide.y - underarm.y);
    // The waist takes the bust's ease: the same fabric tension through the body.
    const shaped = (spec.waist * (1 + spec.bustEase / 100)) / 4;
    waistShaped = shaped <= straight - WAIST_SHAPING_MIN_MM;
    quarterWaist = waistShaped ? shaped : straight;
  }
  return {
    quarterBust,
    quarterHip,
    quarterWaist,
    waistLevel,
    waistShaped,
    strapInner: { x: spec.strapInset, y: 0 },
    strapOuter: { x: spec.strapInset + spec.strapWidth, y: spec.shoulderSlope },
    underarm,
    hemFold: { x: 0, y: spec.length },
    hemSide,
  };
}
