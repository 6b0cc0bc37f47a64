/**
 * The tank top parameters the workspace shows, with the range the slider spans (the trade's
 * usual range) and a short note in the trade's words. The typed field accepts anything inside
 * the schema's wider limits (shared/schemas/draft-limits.ts), which the server checks again.
 */
import type { TankParams } from '@shared/schemas/draft-input';
import type { DraftFieldPath } from '@shared/schemas/draft-limits';

/** The numeric tank parameters (edge finish is a choice, not a number). */
export type NumericParamKey = Exclude<keyof TankParams, 'edgeFinish'>;

export type ParamKind = 'length' | 'percent' | 'ratio';

export interface ParamField {
  key: NumericParamKey;
  path: DraftFieldPath;
  label: string;
  kind: ParamKind;
  /** The slider's span: mm for lengths, percent or plain ratio otherwise. */
  min: number;
  max: number;
  /** Slider step for percent and ratio fields (lengths step 1/8 in or 1 mm). */
  step?: number;
  /** Absent means "none" (e.g. no racer back) rather than "the default". */
  optional?: boolean;
  note: string;
}

export interface ParamGroup {
  title: string;
  fields: ParamField[];
}

/** Grouped as a maker works down the piece: fit, necklines, straps and armholes, hem, edges. */
export const PARAM_GROUPS: ParamGroup[] = [
  {
    title: 'Fit',
    fields: [
      {
        key: 'bustEase',
        path: 'params.bustEase',
        label: 'Bust ease',
        kind: 'percent',
        min: -25,
        max: 10,
        step: 0.5,
        note: 'Negative for knits: about −8 to −10 % for a fitted tank, −12 % swim-tight.',
      },
      {
        key: 'hipEase',
        path: 'params.hipEase',
        label: 'Hip ease',
        kind: 'percent',
        min: -15,
        max: 15,
        step: 0.5,
        note: 'Often 0 % so the hem hangs loose.',
      },
      { key: 'length', path: 'params.length', label: 'Length', kind: 'length', min: 350, max: 1000, note: 'Finished, shoulder line to hem at the fold.' },
    ],
  },
  {
    title: 'Necklines',
    fields: [
      {
        key: 'frontNeckDepth',
        path: 'params.frontNeckDepth',
        label: 'Front neck depth',
        kind: 'length',
        min: 50,
        max: 250,
        note: 'Never less than 3 in; about 6–8 in for a scoop.',
      },
      { key: 'backNeckDepth', path: 'params.backNeckDepth', label: 'Back neck depth', kind: 'length', min: 10, max: 150, note: 'About 1 in at the fold.' },
    ],
  },
  {
    title: 'Straps and armholes',
    fields: [
      { key: 'strapInset', path: 'params.strapInset', label: 'Strap inset', kind: 'length', min: 40, max: 130, note: 'Fold to the strap’s inner edge, about 3 in.' },
      { key: 'strapWidth', path: 'params.strapWidth', label: 'Strap width', kind: 'length', min: 10, max: 75, note: 'About 1 in.' },
      { key: 'shoulderSlope', path: 'params.shoulderSlope', label: 'Shoulder slope', kind: 'length', min: 0, max: 40, note: 'Drop across the strap.' },
      {
        key: 'racerBackInset',
        path: 'params.racerBackInset',
        label: 'Racer back inset',
        kind: 'length',
        min: 30,
        max: 130,
        optional: true,
        note: 'Back armhole brought in to about 2–3 in from the fold.',
      },
    ],
  },
  {
    title: 'Hem and seams',
    fields: [
      { key: 'sideHemRise', path: 'params.sideHemRise', label: 'Side hem rise', kind: 'length', min: 0, max: 60, note: 'Hem raised about 1 in at the side seam.' },
      { key: 'hemAllowance', path: 'params.hemAllowance', label: 'Hem allowance', kind: 'length', min: 6, max: 40, note: '1/2 to 1 in, turned and stitched.' },
      { key: 'seamAllowance', path: 'params.seamAllowance', label: 'Seam allowance', kind: 'length', min: 3, max: 16, note: '1/4 in home overlocker, 3/8 in 4-thread.' },
    ],
  },
  {
    title: 'Edge finish',
    fields: [
      { key: 'bindingWidth', path: 'params.bindingWidth', label: 'Binding width', kind: 'length', min: 5, max: 40, note: 'Knit tape about 1/4 in finished.' },
      {
        key: 'bindingRatio',
        path: 'params.bindingRatio',
        label: 'Binding ratio',
        kind: 'ratio',
        min: 0.6,
        max: 1.1,
        step: 0.01,
        note: 'Strip ÷ opening: tape 1.0, self band about 0.85.',
      },
      {
        key: 'bindingJoinAllowance',
        path: 'params.bindingJoinAllowance',
        label: 'Join allowance',
        kind: 'length',
        min: 0,
        max: 25,
        note: 'At each end of a strip joined into a loop, about 1 cm.',
      },
    ],
  },
];

/** Every parameter field, flat. */
export const PARAM_FIELDS: ParamField[] = PARAM_GROUPS.flatMap((group) => group.fields);

/** The field with this key. */
export function paramFieldGet(key: NumericParamKey): ParamField {
  const field = PARAM_FIELDS.find((f) => f.key === key);
  if (!field) throw new Error(`Unknown parameter ${key}`);
  return field;
}
