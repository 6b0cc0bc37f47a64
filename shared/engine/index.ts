/**
 * Knitwright's drafting engine: body measurements, a fabric's stretch and a style's
 * parameters in; pattern pieces, binding strips, finished figures, a fold layout and warnings
 * out. Pure functions, plain data, every length in mm. No DOM, no I/O, no clock.
 */
import type { DraftInput } from '../schemas/draft-input';
import { STYLES } from './drafting/styles';
import type { DraftResult, StyleId } from './types';

export type * from './types';
export { ENGINE_VERSION } from './version';
export { draftTank } from './drafting/tank';
export { STYLES, styleFind, type StyleDefinition } from './drafting/styles';
export { parseDraftInput, fieldErrorsFromIssues, type DraftInputParseResult } from './drafting/draft-input-parse';
export { draftToSvg, type SvgOptions } from './export/svg';
export { pathDataFromSegments, pathDataFromPolyline } from './export/path-data';
export { pathDataLength, edgePointAt } from './finishing/edge-length';
export { segmentsFlatten, segmentPointAt } from './geometry/bezier';
export { pointsBounds, polygonSignedArea, polygonIsSimple } from './geometry/polygon';
export { SEAM_MATCH_MM, MIN_FRONT_NECK_MM } from './finishing/warnings';
export { draftInputSchema, draftInputRangedSchema } from '../schemas/draft-input';

/** Drafts any registered style, dispatching on `input.style`. Lengths in mm. */
export function draft(input: DraftInput): DraftResult {
  const style = (STYLES as Partial<Record<string, (typeof STYLES)[StyleId]>>)[String(input.style)];
  if (!style) return { ok: false, errors: [{ path: 'style', message: `Unknown style: ${String(input.style)}` }] };
  return style.draft(input);
}
