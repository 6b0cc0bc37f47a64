/** Inputs shared by the engine's tests: an invented client of an invented studio. */
import type { Draft, DraftInput } from '../types';
import { draft } from '../index';

/** The example input, in inches. */
export const EXAMPLE_INPUT: DraftInput = {
  unit: 'in',
  measurements: { bust: 36, hip: 40, armholeDepth: 8.5 },
  fabric: { stretch: 40, recovery: 'good' },
  style: 'tank',
  params: { length: 25, bustEase: -8, frontNeckDepth: 6 },
};

/** A metric client with a waist, a racer back and self-fabric bands. */
export const METRIC_INPUT: DraftInput = {
  unit: 'cm',
  measurements: { bust: 92, hip: 100, waist: 76, armholeDepth: 21 },
  fabric: { stretch: 50, recovery: 'good', width: 150 },
  style: 'tank',
  params: { racerBackInset: 6, edgeFinish: 'band' },
};

/** Drafts and fails the test with the field messages when the input is refused. */
export function draftOrThrow(input: DraftInput): Draft {
  const result = draft(input);
  if (!result.ok) throw new Error(result.errors.map((e) => `${e.path}: ${e.message}`).join('\n'));
  return result.draft;
}
