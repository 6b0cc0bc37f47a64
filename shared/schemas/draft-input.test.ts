import { describe, expect, it } from 'vitest';
import { parseDraftInput } from '../engine/drafting/draft-input-parse';
import { draft } from '../engine/index';
import type { FieldError } from '../engine/types';
import { draftInputRangedSchema, draftInputSchema } from './draft-input';
import { EXAMPLE_INPUT } from '../engine/test-support/inputs';

const valid = EXAMPLE_INPUT;

function withChange(path: string, value: unknown): unknown {
  const copy = structuredClone(valid) as unknown as Record<string, Record<string, unknown>>;
  const [group, key] = path.split('.') as [string, string | undefined];
  if (key === undefined) (copy as Record<string, unknown>)[group] = value;
  else copy[group] = { ...(copy[group] ?? {}), [key]: value };
  return copy;
}

function errorsOf(raw: unknown): FieldError[] {
  const result = parseDraftInput(raw);
  return result.ok ? [] : result.errors;
}

describe('DraftInput validation', () => {
  it('accepts the issue example', () => {
    expect(parseDraftInput(valid).ok).toBe(true);
    expect(draftInputSchema.safeParse(valid).success).toBe(true);
  });

  it('names a missing measurement', () => {
    const raw = structuredClone(valid) as { measurements: Record<string, unknown> };
    delete raw.measurements.bust;
    expect(errorsOf(raw)).toEqual([{ path: 'measurements.bust', message: 'Bust girth is required' }]);
  });

  it('names a measurement that is not a number', () => {
    expect(errorsOf(withChange('measurements.hip', 'forty'))).toEqual([
      { path: 'measurements.hip', message: 'Hip girth must be a number' },
    ]);
  });

  it('refuses a negative girth with its range in inches, rounded inwards to 1/8 in', () => {
    // 500 mm = 19.69 in rounds up to 19 3/4; 2000 mm = 78.74 in rounds down to 78 5/8 (1 in = 25.4 mm).
    expect(errorsOf(withChange('measurements.bust', -36))).toEqual([
      { path: 'measurements.bust', message: 'Bust girth must be between 19 3/4 in and 78 5/8 in' },
    ]);
    expect(draftInputRangedSchema.safeParse(withChange('measurements.bust', 19.75)).success).toBe(true);
    expect(draftInputRangedSchema.safeParse(withChange('measurements.bust', 19.625)).success).toBe(false);
  });

  it('states the range in centimetres for a metric input', () => {
    const raw = { ...valid, unit: 'cm', measurements: { bust: 400, hip: 100, armholeDepth: 21 }, params: {} };
    expect(errorsOf(raw)).toEqual([{ path: 'measurements.bust', message: 'Bust girth must be between 50 cm and 200 cm' }]);
  });

  it('refuses a stretch of 500 %', () => {
    expect(errorsOf(withChange('fabric.stretch', 500))).toEqual([
      { path: 'fabric.stretch', message: 'Crosswise stretch must be between 0 % and 150 %' },
    ]);
  });

  it('refuses an unknown unit, recovery, style and edge finish', () => {
    expect(errorsOf(withChange('unit', 'yd'))[0]?.path).toBe('unit');
    expect(errorsOf(withChange('fabric.recovery', 'great'))[0]?.path).toBe('fabric.recovery');
    expect(errorsOf(withChange('style', 'gown'))[0]?.path).toBe('style');
    expect(errorsOf(withChange('params.edgeFinish', 'lace'))[0]).toEqual({
      path: 'params.edgeFinish',
      message: 'Edge finish must be "tape" or "band"',
    });
  });

  it('names a misspelt parameter', () => {
    const errors = errorsOf(withChange('params.bustEas', -8));
    expect(errors[0]?.path).toBe('params');
    expect(errors[0]?.message).toContain('bustEas');
  });

  it('refuses a front neckline deeper than the armhole allows', () => {
    const errors = errorsOf(withChange('params.frontNeckDepth', 9));
    expect(errors).toEqual([
      { path: 'params.frontNeckDepth', message: 'Front neck depth (9 in) must not be deeper than the armhole depth (8 1/2 in)' },
    ]);
  });

  it('refuses a strap inset wider than the shoulder allows', () => {
    const errors = errorsOf(withChange('params.strapInset', 7.5));
    expect(errors.map((e) => e.path)).toEqual(['params.strapInset']);
    expect(errors[0]?.message).toContain('8 1/4 in from the fold');
  });

  it('refuses a length that leaves no side seam', () => {
    expect(errorsOf(withChange('params.length', 10)).map((e) => e.path)).toEqual(['params.length']);
  });

  it('refuses a racer back inset outside the strap and a back neck too deep for it', () => {
    expect(errorsOf(withChange('params.racerBackInset', 4.5)).map((e) => e.path)).toEqual(['params.racerBackInset']);
    const raw = withChange('params.racerBackInset', 2.5) as { params: Record<string, unknown> };
    raw.params.backNeckDepth = 4;
    expect(errorsOf(raw).map((e) => e.path)).toEqual(['params.backNeckDepth']);
  });

  it('refuses a shoulder slope steeper than the strap is wide', () => {
    expect(errorsOf(withChange('params.shoulderSlope', 1.5)).map((e) => e.path)).toEqual(['params.shoulderSlope']);
  });

  it('lists every bad field at once, malformed and out of range', () => {
    const raw = { unit: 'in', measurements: { bust: -1, hip: 'x' }, fabric: { stretch: 500, recovery: 'good' }, style: 'tank' };
    expect(errorsOf(raw).map((e) => e.path).sort()).toEqual([
      'fabric.stretch',
      'measurements.armholeDepth',
      'measurements.bust',
      'measurements.hip',
    ]);
  });

  it('refuses input that is not an object', () => {
    expect(errorsOf(null)).toEqual([{ path: '', message: 'A draft input must be an object' }]);
  });

  it('returns the same errors from draft() when given an unchecked input', () => {
    const result = draft(withChange('measurements.armholeDepth', Number.NaN) as never);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors[0]?.path).toBe('measurements.armholeDepth');
  });
});
