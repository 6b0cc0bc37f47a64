/**
 * Plausibility checks for a measurement set: warnings shown at the fitting, never a refusal
 * (bodies vary; the owner decides). Pure: values in mm in, warnings out.
 */
import { lengthFormat, type LengthUnit } from '../units';
import { MEASUREMENT_FIELDS, type MeasurementKey } from './measurement-fields';

/** What a warning is about. */
export type MeasurementWarningCode =
  | 'outside-usual-range'
  | 'hip-below-waist'
  | 'underbust-above-bust'
  | 'high-bust-far-from-bust'
  | 'armhole-depth-for-bust';

/** One warning, attached to the field the owner should re-measure. */
export interface MeasurementWarning {
  field: MeasurementKey;
  code: MeasurementWarningCode;
  message: string;
}

/** Values in mm as taken so far (fitting mode checks a set while it is being filled in). */
export type MeasurementValuesPartialMm = Partial<Record<MeasurementKey, number>>;

/**
 * Hip girth is normally at least the waist girth; a hip more than 10 % below the waist
 * usually means the tape missed the fullest part of the seat (common practice).
 */
export const HIP_BELOW_WAIST_RATIO = 0.9;

/**
 * High bust (chest) girth lies a little below the bust for a full bust and about level with it
 * for a small one; outside 80–108 % of the bust the tape has probably slipped (common practice,
 * bounds chosen generously from memory).
 */
export const HIGH_BUST_RATIO = { min: 0.8, max: 1.08 } as const;

/**
 * Armhole depth expected for a bust girth by the textbook rule of thumb bust/10 + 10.5 cm
 * (memory; see trade.md "Body measurements"). For the EN 13402-3 example bust of 88 cm it gives
 * 19.3 cm, near the 8–9 in (20–23 cm) usual for a fitted tank top (common practice).
 */
export function armholeDepthExpectedMm(bustMm: number): number {
  return bustMm / 10 + 105;
}

/** How far armhole depth may stray from the rule of thumb before a warning: about 2 in. */
export const ARMHOLE_DEPTH_TOLERANCE_MM = 50;

/**
 * Warnings for a measurement set.
 * @param valuesMm measurements in mm (missing ones are skipped)
 * @param unit the unit lengths are quoted in within messages
 */
export function measurementWarnings(valuesMm: MeasurementValuesPartialMm, unit: LengthUnit = 'cm'): MeasurementWarning[] {
  const warnings: MeasurementWarning[] = [];
  const fmt = (mm: number) => lengthFormat(mm, unit);

  for (const field of MEASUREMENT_FIELDS) {
    const value = valuesMm[field.key];
    if (value === undefined) continue;
    const { min, max } = field.plausibleMm;
    if (value < min || value > max) {
      warnings.push({
        field: field.key,
        code: 'outside-usual-range',
        message: `${field.label} ${fmt(value)} is outside the usual adult range (${fmt(min)} to ${fmt(max)}). Check the tape.`,
      });
    }
  }

  const { bust, hip, waist, underbust, highBust, armholeDepth } = valuesMm;
  if (hip !== undefined && waist !== undefined && hip < waist * HIP_BELOW_WAIST_RATIO) {
    warnings.push({
      field: 'hip',
      code: 'hip-below-waist',
      message: `Hip girth ${fmt(hip)} is far smaller than waist girth ${fmt(waist)}. Measure the hip round the fullest part of the seat.`,
    });
  }
  if (bust !== undefined && underbust !== undefined && underbust >= bust) {
    warnings.push({
      field: 'underbust',
      code: 'underbust-above-bust',
      message: `Underbust girth ${fmt(underbust)} is not smaller than bust girth ${fmt(bust)}. Measure the underbust just below the breasts.`,
    });
  }
  if (bust !== undefined && highBust !== undefined && (highBust < bust * HIGH_BUST_RATIO.min || highBust > bust * HIGH_BUST_RATIO.max)) {
    warnings.push({
      field: 'highBust',
      code: 'high-bust-far-from-bust',
      message: `High bust girth ${fmt(highBust)} is far from bust girth ${fmt(bust)}. Keep the tape high under the arms and level.`,
    });
  }
  if (bust !== undefined && armholeDepth !== undefined) {
    const expected = armholeDepthExpectedMm(bust);
    if (Math.abs(armholeDepth - expected) > ARMHOLE_DEPTH_TOLERANCE_MM) {
      warnings.push({
        field: 'armholeDepth',
        code: 'armhole-depth-for-bust',
        message: `Armhole depth ${fmt(armholeDepth)} is unusual for a bust girth of ${fmt(bust)} (about ${fmt(expected)} expected). Measure from the shoulder line down to the underarm.`,
      });
    }
  }
  return warnings;
}
