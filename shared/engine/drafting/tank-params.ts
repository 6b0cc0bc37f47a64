/**
 * Tank top parameters resolved to millimetres, with the trade's defaults filled in.
 * Defaults are round numbers in the input's unit system (3 in, or 75 mm), so that a studio
 * working in inches sees 3 in and not 2 61/64 in.
 */
import type { DraftInput } from '../../schemas/draft-input';
import { lengthToMm, type LengthUnit } from '../../units';

/** Every tank top figure the drafting needs, lengths in mm, eases in percent. */
export interface TankSpec {
  unit: LengthUnit;
  bust: number;
  hip: number;
  waist: number | null;
  armholeDepth: number;
  stretch: number;
  stretchLengthwise: number | null;
  recovery: 'good' | 'fair' | 'poor';
  fabricWidth: number | null;
  length: number;
  bustEase: number;
  hipEase: number;
  frontNeckDepth: number;
  backNeckDepth: number;
  strapInset: number;
  strapWidth: number;
  shoulderSlope: number;
  racerBackInset: number | null;
  sideHemRise: number;
  hemAllowance: number;
  seamAllowance: number;
  edgeFinish: 'tape' | 'band';
  bindingWidth: number;
  /** The ratio the user set, or null to use the finish's defaults. */
  bindingRatio: number | null;
  bindingJoinAllowance: number;
}

function byUnit(unit: LengthUnit, inches: number, millimetres: number): number {
  return unit === 'in' ? lengthToMm(inches, 'in') : millimetres;
}

/**
 * The garment length when none is given: three armhole depths from the shoulder line, about
 * hip length (8 1/2 in armhole → 25 1/2 in; our rule of thumb, from memory).
 */
export const DEFAULT_LENGTH_PER_ARMHOLE_DEPTH = 3;

/** Largest default bust reduction, percent: 9 %, within the 8–10 % of a fitted knit tank (common practice). */
export const DEFAULT_MAX_BUST_REDUCTION = 9;

/**
 * Bust ease (percent, negative) that suits a fabric's crosswise stretch when none is given:
 * the garment is worn stretched by a quarter of the fabric's stretch (our default), i.e. cut
 * at body ÷ (1 + e) (worn-stretch arithmetic, see trade notes), and never reduced by more
 * than {@link DEFAULT_MAX_BUST_REDUCTION} %.
 * @param stretch crosswise stretch, percent
 */
export function bustEaseDefault(stretch: number): number {
  const worn = Math.max(0, stretch) / 4 / 100;
  const reduction = (worn / (1 + worn)) * 100;
  const ease = -Math.min(reduction, DEFAULT_MAX_BUST_REDUCTION);
  return ease === 0 ? 0 : ease;
}

/** Front neck depth when none is given: 6 in (a scoop), but at most 0.7 of the armhole depth (our default). */
export function frontNeckDepthDefault(unit: LengthUnit, armholeDepth: number): number {
  return Math.min(byUnit(unit, 6, 150), 0.7 * armholeDepth);
}

/** Resolves a DraftInput into a TankSpec in mm, filling defaults (trade notes: common practice). */
export function tankSpecResolve(input: DraftInput): TankSpec {
  const unit = input.unit;
  const p = input.params ?? {};
  const mm = (value: number | undefined, fallback: number): number =>
    value === undefined ? fallback : lengthToMm(value, unit);
  const armholeDepth = lengthToMm(input.measurements.armholeDepth, unit);
  const edgeFinish = p.edgeFinish ?? 'tape';
  return {
    unit,
    bust: lengthToMm(input.measurements.bust, unit),
    hip: lengthToMm(input.measurements.hip, unit),
    waist: input.measurements.waist === undefined ? null : lengthToMm(input.measurements.waist, unit),
    armholeDepth,
    stretch: input.fabric.stretch,
    stretchLengthwise: input.fabric.stretchLengthwise ?? null,
    recovery: input.fabric.recovery,
    fabricWidth: input.fabric.width === undefined ? null : lengthToMm(input.fabric.width, unit),
    length: mm(p.length, DEFAULT_LENGTH_PER_ARMHOLE_DEPTH * armholeDepth),
    bustEase: p.bustEase ?? bustEaseDefault(input.fabric.stretch),
    // Hip drafted with no reduction so the hem hangs loose (common practice).
    hipEase: p.hipEase ?? 0,
    frontNeckDepth: mm(p.frontNeckDepth, frontNeckDepthDefault(unit, armholeDepth)),
    // Back neck about 1 in deep at the fold (common practice).
    backNeckDepth: mm(p.backNeckDepth, byUnit(unit, 1, 25)),
    // Strap's inner edge about 3 in from the fold, strap about 1 in wide (common practice).
    strapInset: mm(p.strapInset, byUnit(unit, 3, 75)),
    strapWidth: mm(p.strapWidth, byUnit(unit, 1, 25)),
    // "A little shoulder slope": 3/8 in across the strap (our default, about 20°).
    shoulderSlope: mm(p.shoulderSlope, byUnit(unit, 3 / 8, 10)),
    racerBackInset: p.racerBackInset === undefined ? null : lengthToMm(p.racerBackInset, unit),
    // Hem raised about 1 in at the side seam; hem allowance about 1/2 in (common practice).
    sideHemRise: mm(p.sideHemRise, byUnit(unit, 1, 25)),
    hemAllowance: mm(p.hemAllowance, byUnit(unit, 1 / 2, 12)),
    // 3/8 in (10 mm) for 3- or 4-thread overlocked seams (fashion-incubator.com, "The rules on seam allowances").
    seamAllowance: mm(p.seamAllowance, byUnit(unit, 3 / 8, 10)),
    edgeFinish,
    // Knit tape about 1/4 in finished (common practice); a band 5/8 in (our default).
    bindingWidth: mm(p.bindingWidth, edgeFinish === 'tape' ? byUnit(unit, 1 / 4, 6) : byUnit(unit, 5 / 8, 15)),
    bindingRatio: p.bindingRatio ?? null,
    // Join allowance about 1 cm at each end (common practice).
    bindingJoinAllowance: mm(p.bindingJoinAllowance, byUnit(unit, 3 / 8, 10)),
  };
}
