/**
 * Converting a parameter between the three places it lives: the draft's stored input (in the
 * input's unit), the engine's working value (mm for lengths, percent, ratio) and the screen (the
 * studio's unit, lengths to 1/8 in or 1 mm).
 */
import { inRange, rangeMessage } from '@shared/schemas/draft-input';
import { lengthFormat, lengthFromMm, lengthParse, lengthToMm, type LengthUnit } from '@shared/units';
import type { ParamField } from './param-fields';

/** Slider step of a length in the display unit: 1/8 in (tape measures, common practice) or 1 mm. */
export function lengthStep(unit: LengthUnit): number {
  if (unit === 'in') return 1 / 8;
  if (unit === 'cm') return 0.1;
  return 1;
}

/** The step the field's slider moves by, in the display unit. */
export function sliderStep(field: ParamField, displayUnit: LengthUnit): number {
  return field.kind === 'length' ? lengthStep(displayUnit) : (field.step ?? 1);
}

function snap(value: number, step: number): number {
  // Rounding to a step, then trimming float noise such as 0.30000000000000004.
  return Number((Math.round(value / step) * step).toFixed(6));
}

/** A working value (mm / % / ratio) as the slider's number in the display unit, on its step. */
export function sliderValue(field: ParamField, working: number, displayUnit: LengthUnit): number {
  const value = field.kind === 'length' ? lengthFromMm(working, displayUnit) : working;
  return snap(value, sliderStep(field, displayUnit));
}

/** The slider's number in the display unit back to a working value. */
export function workingFromSlider(field: ParamField, value: number, displayUnit: LengthUnit): number {
  return field.kind === 'length' ? lengthToMm(value, displayUnit) : value;
}

/** The slider's span in the display unit, snapped inwards to its step. */
export function sliderBounds(field: ParamField, displayUnit: LengthUnit): { min: number; max: number; step: number } {
  const step = sliderStep(field, displayUnit);
  const lo = field.kind === 'length' ? lengthFromMm(field.min, displayUnit) : field.min;
  const hi = field.kind === 'length' ? lengthFromMm(field.max, displayUnit) : field.max;
  return { min: Number((Math.ceil(lo / step - 1e-9) * step).toFixed(6)), max: Number((Math.floor(hi / step + 1e-9) * step).toFixed(6)), step };
}

/** A stored parameter (input unit) as a working value. */
export function workingFromStored(field: ParamField, stored: number, inputUnit: LengthUnit): number {
  return field.kind === 'length' ? lengthToMm(stored, inputUnit) : stored;
}

/** A working value as the number to store in the draft's input (its unit). */
export function storedFromWorking(field: ParamField, working: number, inputUnit: LengthUnit): number {
  return field.kind === 'length' ? lengthFromMm(working, inputUnit) : working;
}

function percentFormat(value: number): string {
  // Half away from zero, so −8.25 shows as −8.3 like 8.25 shows as 8.3.
  const rounded = (Math.sign(value) * Math.round(Math.abs(value) * 10)) / 10;
  const text = rounded.toFixed(1).replace(/\.0$/, '');
  return text === '-0' ? '0' : text.replace('-', '−');
}

/** A working value for the typed field, without its unit ("35 1/2", "−8", "0.85"). */
export function workingFormat(field: ParamField, working: number, displayUnit: LengthUnit): string {
  if (field.kind === 'length') return lengthFormat(working, displayUnit, { withUnit: false });
  if (field.kind === 'percent') return percentFormat(working);
  return String(Math.round(working * 100) / 100);
}

/** The unit word shown after the field. */
export function fieldUnit(field: ParamField, displayUnit: LengthUnit): string {
  if (field.kind === 'length') return displayUnit;
  return field.kind === 'percent' ? '%' : '×';
}

export type ParamParse = { ok: true; working: number } | { ok: false; message: string };

const SIGNED_NUMBER = /^([+\-−]?)\s*(\d+(?:[.,]\d*)?|[.,]\d+)\s*%?$/;

/**
 * Reads what was typed into a parameter field and checks it against the schema's range (the
 * same check the server makes). Lengths accept "3 1/2", "3½", "9 cm", "90 mm"; percents a
 * signed number ("−8", "-8 %"); ratios a plain number.
 */
export function paramParse(field: ParamField, text: string, displayUnit: LengthUnit, inputUnit: LengthUnit): ParamParse {
  let working: number;
  if (field.kind === 'length') {
    const read = lengthParse(text, displayUnit, { allowZero: true });
    if (!read.ok) return { ok: false, message: `${field.label}: ${read.reason}` };
    working = read.mm;
  } else {
    const match = SIGNED_NUMBER.exec(text.trim());
    if (!match || match[2] === undefined) {
      const example = field.kind === 'percent' ? 'like −8 or 5' : 'like 0.85';
      return { ok: false, message: `${field.label} must be a number, ${example}` };
    }
    const magnitude = Number(match[2].replace(',', '.'));
    working = match[1] === '-' || match[1] === '−' ? -magnitude : magnitude;
  }
  if (!inRange(field.path, storedFromWorking(field, working, inputUnit), inputUnit)) {
    return { ok: false, message: rangeMessage(field.path, displayUnit) };
  }
  return { ok: true, working };
}
