/**
 * The accepted range of every length and percent in a draft input, in mm (lengths) or percent,
 * with the words used to name each field in messages. Ranges are generous: they refuse what
 * no body or fabric has (a negative girth, a 500 % stretch), not what is unusual.
 */

/** How a numeric field is measured. */
export type FieldKind = 'length' | 'percent' | 'ratio';

/** Range and label of one numeric input field. */
export interface FieldLimit {
  label: string;
  kind: FieldKind;
  min: number;
  max: number;
}

/** Limits keyed by dotted field path. Lengths in mm. */
export const DRAFT_FIELD_LIMITS = {
  'measurements.bust': { label: 'Bust girth', kind: 'length', min: 500, max: 2000 },
  'measurements.hip': { label: 'Hip girth', kind: 'length', min: 500, max: 2200 },
  'measurements.waist': { label: 'Waist girth', kind: 'length', min: 400, max: 2000 },
  'measurements.armholeDepth': { label: 'Armhole depth', kind: 'length', min: 100, max: 400 },
  'fabric.stretch': { label: 'Crosswise stretch', kind: 'percent', min: 0, max: 150 },
  'fabric.stretchLengthwise': { label: 'Lengthwise stretch', kind: 'percent', min: 0, max: 150 },
  'fabric.width': { label: 'Fabric width', kind: 'length', min: 300, max: 3500 },
  'params.length': { label: 'Length', kind: 'length', min: 250, max: 1500 },
  'params.bustEase': { label: 'Bust ease', kind: 'percent', min: -40, max: 30 },
  'params.hipEase': { label: 'Hip ease', kind: 'percent', min: -40, max: 40 },
  'params.frontNeckDepth': { label: 'Front neck depth', kind: 'length', min: 10, max: 400 },
  'params.backNeckDepth': { label: 'Back neck depth', kind: 'length', min: 10, max: 400 },
  'params.strapInset': { label: 'Strap inset', kind: 'length', min: 20, max: 250 },
  'params.strapWidth': { label: 'Strap width', kind: 'length', min: 10, max: 150 },
  'params.shoulderSlope': { label: 'Shoulder slope', kind: 'length', min: 0, max: 60 },
  'params.racerBackInset': { label: 'Racer back inset', kind: 'length', min: 15, max: 250 },
  'params.sideHemRise': { label: 'Side hem rise', kind: 'length', min: 0, max: 150 },
  'params.hemAllowance': { label: 'Hem allowance', kind: 'length', min: 0, max: 60 },
  'params.seamAllowance': { label: 'Seam allowance', kind: 'length', min: 0, max: 30 },
  'params.bindingWidth': { label: 'Binding width', kind: 'length', min: 3, max: 80 },
  'params.bindingRatio': { label: 'Binding ratio', kind: 'ratio', min: 0.5, max: 1.2 },
  'params.bindingJoinAllowance': { label: 'Binding join allowance', kind: 'length', min: 0, max: 50 },
} as const satisfies Record<string, FieldLimit>;

/** A dotted path of a numeric draft input field. */
export type DraftFieldPath = keyof typeof DRAFT_FIELD_LIMITS;
