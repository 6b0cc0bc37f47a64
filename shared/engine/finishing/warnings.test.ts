import { describe, expect, it } from 'vitest';
import { EXAMPLE_INPUT, draftOrThrow } from '../test-support/inputs';
import type { DraftInput } from '../types';

const withParams = (params: NonNullable<DraftInput['params']>, fabric?: Partial<DraftInput['fabric']>): DraftInput => ({
  ...EXAMPLE_INPUT,
  fabric: { ...EXAMPLE_INPUT.fabric, ...fabric },
  params: { ...EXAMPLE_INPUT.params, ...params },
});

describe('warnings', () => {
  it('gives none for the issue example', () => {
    expect(draftOrThrow(EXAMPLE_INPUT).warnings).toEqual([]);
  });

  it('warns when the garment must stretch more than the fabric gives (worn-stretch arithmetic)', () => {
    // −20 % ease: worn stretched by 1 / 0.8 − 1 = 25 %, more than a 20 % stable knit gives.
    const draft = draftOrThrow(withParams({ bustEase: -20 }, { stretch: 20 }));
    expect(draft.finished.stretchNeeded).toBeCloseTo(25, 9);
    expect(draft.warnings.map((w) => w.code)).toEqual(['stretch-insufficient']);
    expect(draft.warnings[0]!.field).toBe('params.bustEase');
    expect(draft.warnings[0]!.message).toContain('25 %');
  });

  it('does not warn when the stretch needed equals the fabric’s', () => {
    // A garment worn at 25 % stretch is cut at 0.8 × body (trade notes' example).
    const draft = draftOrThrow(withParams({ bustEase: -20 }, { stretch: 25.0001 }));
    expect(draft.warnings).toEqual([]);
  });

  it('warns about a front neckline under 3 in (common practice) in the input’s unit', () => {
    const draft = draftOrThrow(withParams({ frontNeckDepth: 2.5 }));
    expect(draft.warnings.map((w) => w.code)).toEqual(['neckline-shallow']);
    expect(draft.warnings[0]!.message).toContain('2 1/2 in');
    expect(draft.warnings[0]!.message).toContain('3 in');
  });

  it('warns when the fabric is too narrow even folded once', () => {
    const draft = draftOrThrow({ ...EXAMPLE_INPUT, fabric: { ...EXAMPLE_INPUT.fabric, width: 18 } });
    expect(draft.layout.fits).toBe(false);
    expect(draft.warnings.map((w) => w.code)).toEqual(['fabric-too-narrow']);
  });
});
