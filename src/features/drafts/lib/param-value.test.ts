import { describe, expect, it } from 'vitest';
import { paramFieldGet } from './param-fields';
import { paramParse, sliderBounds, sliderValue, workingFormat, workingFromSlider } from './param-value';

const neck = paramFieldGet('frontNeckDepth');
const ease = paramFieldGet('bustEase');

describe('parameter values on screen', () => {
  it('reads a typed inch fraction as millimetres (1 in = 25.4 mm, NIST SP 811)', () => {
    expect(paramParse(neck, '6 1/2', 'in', 'mm')).toEqual({ ok: true, working: 165.1 });
    expect(paramParse(neck, '6½', 'in', 'in')).toEqual({ ok: true, working: 165.1 });
    expect(paramParse(neck, '16 cm', 'in', 'in')).toEqual({ ok: true, working: 160 });
  });

  it('refuses a neckline outside the schema range and names the field', () => {
    const result = paramParse(neck, '20 in', 'in', 'mm');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toMatch(/^Front neck depth must be between/);
  });

  it('reads a negative ease typed with a minus sign or a hyphen', () => {
    expect(paramParse(ease, '−9', 'in', 'in')).toEqual({ ok: true, working: -9 });
    expect(paramParse(ease, '-9 %', 'in', 'in')).toEqual({ ok: true, working: -9 });
    const bad = paramParse(ease, 'tight', 'in', 'in');
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.message).toMatch(/Bust ease must be a number/);
  });

  it('moves a length slider in 1/8 in steps (tape measure convention, common practice)', () => {
    const bounds = sliderBounds(neck, 'in');
    expect(bounds.step).toBe(0.125);
    // 50 mm = 1.9685 in, so the slider starts at the next eighth: 2 in.
    expect(bounds.min).toBe(2);
    expect(sliderValue(neck, 152.4, 'in')).toBe(6);
    expect(workingFromSlider(neck, 6, 'in')).toBeCloseTo(152.4, 9);
  });

  it('shows a length in centimetres to the millimetre', () => {
    expect(workingFormat(neck, 152.4, 'cm')).toBe('15.2');
    expect(workingFormat(ease, -8.25, 'cm')).toBe('−8.3');
  });
});
