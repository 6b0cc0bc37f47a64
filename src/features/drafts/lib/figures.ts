/** Figures for the numbers panel: signed lengths and percents with a true minus sign. */
import { lengthFormat, type LengthUnit } from '@shared/units';

/** A percent to 0.1, "−7.9 %", "+2 %", "0 %". */
export function percentText(value: number, signed = true): string {
  const rounded = (Math.sign(value) * Math.round(Math.abs(value) * 10)) / 10;
  const body = Math.abs(rounded).toFixed(1).replace(/\.0$/, '');
  if (rounded === 0) return '0 %';
  const sign = rounded < 0 ? '−' : signed ? '+' : '';
  return `${sign}${body} %`;
}

/** A length with its sign, "−3 in", "+1/2 in", "0 in". */
export function signedLength(mm: number, unit: LengthUnit): string {
  const text = lengthFormat(Math.abs(mm), unit);
  if (text.startsWith('0 ')) return text;
  return `${mm < 0 ? '−' : '+'}${text}`;
}

/** Fold kinds in the trade's words. */
export const FOLD_LABELS = {
  'four-layers': 'Folded in four',
  'two-layers': 'Folded in two',
  'does-not-fit': 'Does not fit the fabric width',
} as const;
