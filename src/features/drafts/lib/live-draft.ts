/**
 * Drafting in the browser: the same input the server builds on save (draftInputBuild) run
 * through the same engine, so what the slider shows is what a save stores.
 */
import { draft as engineDraft, type DraftInput, type DraftResult } from '@shared/engine';
import { tankSpecResolve } from '@shared/engine/drafting/tank-params';
import { BINDING_RATIOS } from '@shared/engine/finishing/bindings';
import { draftInputBuild, type DraftInputParts } from '@shared/schemas/draft-input-build';
import type { ParamsMm } from '@shared/schemas/style';
import { lengthToMm } from '@shared/units';
import { PARAM_FIELDS, type NumericParamKey } from './param-fields';

export interface LiveDraft {
  input: DraftInput;
  result: DraftResult;
}

/** Builds the engine input for `params` (mm) on the draft's parts and drafts it. */
export function liveDraftRun(parts: DraftInputParts, params: ParamsMm): LiveDraft {
  const input = draftInputBuild(parts, params);
  return { input, result: engineDraft(input) };
}

/** Every numeric parameter's value in effect, before the block's corrections: mm, percent or ratio; null for "none". */
export type WorkingValues = Record<NumericParamKey, number | null>;

/**
 * What each parameter is worth now: the draft's own value, else the style's default, else the
 * engine's default for this body and fabric. Corrections are left out on purpose: the sliders
 * show the draft's values and the block's corrections are listed beside them.
 */
export function workingValues(parts: DraftInputParts, params: ParamsMm): WorkingValues {
  const input = draftInputBuild({ ...parts, corrections: [] }, params);
  const spec = tankSpecResolve(input);
  const out = {} as WorkingValues;
  for (const field of PARAM_FIELDS) {
    if (field.key === 'bindingRatio') {
      out.bindingRatio = spec.bindingRatio ?? BINDING_RATIOS[spec.edgeFinish].neck;
      continue;
    }
    const value = spec[field.key];
    out[field.key] = value === null ? null : value;
  }
  return out;
}

/** The block's corrections that touch a parameter, summed: mm or percentage points. */
export function correctionFor(parts: DraftInputParts, key: NumericParamKey): number {
  return parts.corrections.filter((c) => c.target === key).reduce((sum, c) => sum + c.amount, 0);
}

/** The edge finish in effect. */
export function edgeFinishOf(parts: DraftInputParts, params: ParamsMm): 'tape' | 'band' {
  return params.edgeFinish ?? parts.style.defaults.edgeFinish ?? 'tape';
}

/** The body measurements the engine drafts from, mm (corrections included). */
export function inputMeasurementsMm(input: DraftInput): { bust: number; hip: number; armholeDepth: number; waist: number | null } {
  const m = input.measurements;
  return {
    bust: lengthToMm(m.bust, input.unit),
    hip: lengthToMm(m.hip, input.unit),
    armholeDepth: lengthToMm(m.armholeDepth, input.unit),
    waist: m.waist === undefined ? null : lengthToMm(m.waist, input.unit),
  };
}
