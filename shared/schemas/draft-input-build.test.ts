import { describe, expect, it } from 'vitest';
import { DEFAULT_LENGTH_PER_ARMHOLE_DEPTH } from '../engine/drafting/tank-params';
import { draftInputBuild, type DraftInputParts } from './draft-input-build';

/** 1 in = 25.4 mm exactly (NIST SP 811, appendix B). */
const IN = 25.4;
/** Lengths through mm ⇄ in conversions (rounded at 1e-9 in) agree to a millionth of a millimetre. */
const SAME_MM = 1e-6;

const parts = (over: Partial<DraftInputParts> = {}): DraftInputParts => ({
  unit: 'in',
  // The engine's worked example body (issue 4, common practice): bust 38 in, hip 43 in, armhole 8 1/2 in.
  measurements: { bust: 38 * IN, hip: 43 * IN, armholeDepth: 8.5 * IN },
  corrections: [],
  fabric: { stretch: 40, stretchLengthwise: null, recovery: 'good', widthMm: 60 * IN },
  style: { garment: 'tank', racerBack: false, defaults: { bustEase: -8 } },
  ...over,
});

describe('draftInputBuild', () => {
  it('writes the input in the draft’s unit, lengths converted from mm', () => {
    const input = draftInputBuild(parts({ unit: 'cm' }), { frontNeckDepth: 150 });
    expect(input.unit).toBe('cm');
    expect(input.measurements.bust).toBeCloseTo(96.52, 9);
    expect(input.fabric.width).toBeCloseTo(152.4, 9);
    expect(input.params).toEqual({ bustEase: -8, frontNeckDepth: 15 });
  });

  it('reads 76.2 mm as exactly 3 in', () => {
    const input = draftInputBuild(parts(), { frontNeckDepth: 3 * IN });
    expect(input.params?.frontNeckDepth).toBe(3);
  });

  it('lets the draft’s values override the style’s defaults', () => {
    const input = draftInputBuild(parts(), { bustEase: -10 });
    expect(input.params?.bustEase).toBe(-10);
  });

  it('adds measurement corrections to the body before ease', () => {
    const input = draftInputBuild(parts({ corrections: [{ target: 'hip', amount: 10 }, { target: 'hip', amount: 5 }, { target: 'armholeDepth', amount: -5 }] }), {});
    expect(Math.abs(input.measurements.hip * IN - (43 * IN + 15))).toBeLessThan(SAME_MM);
    expect(Math.abs(input.measurements.armholeDepth * IN - (8.5 * IN - 5))).toBeLessThan(SAME_MM);
  });

  it('adds parameter corrections to the value in effect, the engine’s default when none is set', () => {
    const corrected = parts({ corrections: [{ target: 'bustEase', amount: -2 }, { target: 'length', amount: -20 }, { target: 'armholeDepth', amount: -5 }] });
    const input = draftInputBuild(corrected, {});
    expect(input.params?.bustEase).toBe(-10);
    // No length given: the engine's default length from the corrected armhole depth, less 2 cm.
    const expected = DEFAULT_LENGTH_PER_ARMHOLE_DEPTH * (8.5 * IN - 5) - 20;
    expect(Math.abs((input.params?.length ?? 0) * IN - expected)).toBeLessThan(SAME_MM);
  });

  it('gives a racer-back style its inset, 2 1/2 in by default, and drops an inset from any other style', () => {
    const racer = draftInputBuild(parts({ style: { garment: 'tank', racerBack: true, defaults: {} } }), {});
    expect(racer.params?.racerBackInset).toBe(2.5);
    const plain = draftInputBuild(parts(), { racerBackInset: 60 });
    expect(plain.params?.racerBackInset).toBeUndefined();
  });
});
