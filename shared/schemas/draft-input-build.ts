/**
 * Builds the engine's DraftInput for a saved draft from its parts: the block's measurement set
 * (mm) and fit corrections, the fabric, the style's defaults and the draft's own parameter
 * values (mm). The server stores what this returns with each revision; the workspace calls the
 * same function in the browser, so a slider drag draws exactly what a save will store.
 */
import { tankSpecResolve } from '../engine/drafting/tank-params';
import { lengthFromMm, type LengthUnit } from '../units';
import { CORRECTION_TARGETS, type BlockMeasurementsMm, type CorrectionTarget } from './block';
import type { DraftInput } from './draft-input';
import { PARAM_KEYS, paramIsLength, RACER_BACK_INSET_DEFAULT_MM, type Garment, type ParamsMm } from './style';

/** The fabric's figures the engine needs; width in mm. */
export interface FabricPart {
  stretch: number;
  stretchLengthwise: number | null;
  recovery: 'good' | 'fair' | 'poor';
  widthMm: number | null;
}

/** Everything but the draft's own parameter values. */
export interface DraftInputParts {
  /** The unit the input is written in (the studio's unit when the draft was started). */
  unit: LengthUnit;
  measurements: BlockMeasurementsMm;
  corrections: { target: CorrectionTarget; amount: number }[];
  fabric: FabricPart;
  style: { garment: Garment; racerBack: boolean; defaults: ParamsMm };
}

/** The draft's values over the style's defaults; the racer back follows the style. */
export function paramsEffective(style: DraftInputParts['style'], params: ParamsMm): ParamsMm {
  const merged: ParamsMm = { ...style.defaults, ...params };
  if (!style.racerBack) delete merged.racerBackInset;
  else merged.racerBackInset ??= RACER_BACK_INSET_DEFAULT_MM;
  return merged;
}

function correctionSum(parts: DraftInputParts, target: CorrectionTarget): number {
  return parts.corrections.filter((c) => c.target === target).reduce((sum, c) => sum + c.amount, 0);
}

/**
 * mm → the input's unit, rounded to 1e-9 of the unit so that 76.2 mm reads 3 in and not
 * 2.9999999999999996 in (far below any length a pattern can show).
 */
function unitFromMm(mm: number, unit: LengthUnit): number {
  return Math.round(lengthFromMm(mm, unit) * 1e9) / 1e9;
}

function paramsToUnit(params: ParamsMm, unit: LengthUnit): ParamsMm {
  const out: Record<string, unknown> = {};
  for (const key of PARAM_KEYS) {
    const value = params[key];
    if (value === undefined) continue;
    out[key] = typeof value === 'number' && paramIsLength(key) ? unitFromMm(value, unit) : value;
  }
  return out as ParamsMm;
}

/**
 * The DraftInput for `params` (mm) on `parts`. Measurement corrections are added to the body
 * measurement before ease; parameter corrections are added to the value in effect (the
 * draft's, else the style's, else the engine's default for this body and fabric).
 */
export function draftInputBuild(parts: DraftInputParts, params: ParamsMm): DraftInput {
  const { unit } = parts;
  const to = (mm: number): number => unitFromMm(mm, unit);
  const m = parts.measurements;
  const measurements: DraftInput['measurements'] = {
    bust: to(m.bust + correctionSum(parts, 'bust')),
    hip: to(m.hip + correctionSum(parts, 'hip')),
    armholeDepth: to(m.armholeDepth + correctionSum(parts, 'armholeDepth')),
  };
  if (m.waist !== undefined) measurements.waist = to(m.waist + correctionSum(parts, 'waist'));
  const fabric: DraftInput['fabric'] = { stretch: parts.fabric.stretch, recovery: parts.fabric.recovery };
  if (parts.fabric.stretchLengthwise !== null) fabric.stretchLengthwise = parts.fabric.stretchLengthwise;
  if (parts.fabric.widthMm !== null) fabric.width = to(parts.fabric.widthMm);

  const effective = paramsEffective(parts.style, params);
  const input: DraftInput = { unit, measurements, fabric, style: parts.style.garment, params: paramsToUnit(effective, unit) };

  const paramTargets = (Object.keys(CORRECTION_TARGETS) as CorrectionTarget[]).filter(
    (t) => CORRECTION_TARGETS[t].applies === 'params' && correctionSum(parts, t) !== 0,
  );
  if (paramTargets.length === 0) return input;
  // The engine's defaults depend on the body and fabric: resolve them once, then correct.
  const resolved = tankSpecResolve(input) as unknown as Record<string, number>;
  const corrected: Record<string, unknown> = { ...input.params };
  for (const target of paramTargets) {
    const key = target as keyof ParamsMm;
    const base = resolved[key];
    if (typeof base !== 'number') continue;
    const sum = correctionSum(parts, target);
    corrected[key] = paramIsLength(key) ? to(base + sum) : base + sum;
  }
  return { ...input, params: corrected as ParamsMm };
}
