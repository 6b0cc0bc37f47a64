import { describe, expect, it } from 'vitest';
import { lengthToMm } from '../units';
import {
  NEGATIVE_EASE_MAX_PCT,
  negativeEaseForStretch,
  negativeEaseRecommend,
  patternGirthForStretch,
  stretchForNegativeEase,
  stretchPercent,
} from './stretch';

/** Percent results agree to a hundredth of a percent: far finer than a tape can show. */
const PERCENT_TOLERANCE_DIGITS = 2;

describe('stretchPercent', () => {
  it('gives 50 % for a 10 cm mark pulled to 15 cm', () => {
    // Worked example, trade.md "Stretch test" (thesewingdirectory.co.uk "What is stretch?";
    // blog.fabric.com "How to measure stretch of knit fabric"): 10 → 15 cm = 50 %.
    expect(stretchPercent(10, 15)).toBeCloseTo(50, PERCENT_TOLERANCE_DIGITS);
  });

  it('gives 25 % for a 4 in mark pulled to 5 in, in inches or in mm', () => {
    // Worked example, same sources as above: 4 → 5 in = 25 %.
    expect(stretchPercent(4, 5)).toBeCloseTo(25, PERCENT_TOLERANCE_DIGITS);
    expect(stretchPercent(lengthToMm(4, 'in'), lengthToMm(5, 'in'))).toBeCloseTo(25, PERCENT_TOLERANCE_DIGITS);
  });

  it('gives 0 % for a knit that does not stretch', () => {
    expect(stretchPercent(10, 10)).toBe(0);
  });

  it('refuses a zero relaxed length and a stretched length shorter than the relaxed one', () => {
    expect(() => stretchPercent(0, 5)).toThrow(/relaxed length/);
    expect(() => stretchPercent(10, 9)).toThrow(/stretched length/);
    expect(() => stretchPercent(Number.NaN, 9)).toThrow(RangeError);
  });
});

describe('worn stretch arithmetic', () => {
  it('cuts a garment worn at 25 % stretch at 0.8 × the body girth, 20 % negative ease', () => {
    // trade.md "Worn stretch": 25 % worn stretch → 0.8 × body (arithmetic: 1 / 1.25).
    const bodyMm = 880; // EN 13402-3 example bust girth, 88 cm
    expect(patternGirthForStretch(bodyMm, 25)).toBeCloseTo(0.8 * bodyMm, 6);
    expect(negativeEaseForStretch(25)).toBeCloseTo(20, PERCENT_TOLERANCE_DIGITS);
  });

  it('inverts negative ease back to the worn stretch', () => {
    expect(stretchForNegativeEase(20)).toBeCloseTo(25, PERCENT_TOLERANCE_DIGITS);
    for (const worn of [0, 5, 12.5, 40]) {
      expect(stretchForNegativeEase(negativeEaseForStretch(worn))).toBeCloseTo(worn, 9);
    }
  });
});

describe('negativeEaseRecommend', () => {
  it('puts a 50 % jersey with good recovery inside the 8–10 % of a fitted tank top', () => {
    // trade.md "Fitted knit tank tops": bust reduced by about 8–10 % (common practice).
    const r = negativeEaseRecommend(50, 'good');
    expect(r.stable).toBe(false);
    expect(r.wornStretchPct).toBeCloseTo(10, PERCENT_TOLERANCE_DIGITS);
    expect(r.negativeEasePct).toBeGreaterThanOrEqual(8);
    expect(r.negativeEasePct).toBeLessThanOrEqual(10);
    expect(r.patternGirthFactor).toBeCloseTo(1 / 1.1, 9);
    expect(r.reasoning.join(' ')).toMatch(/body ÷ \(1 \+ 0\.100\) = 0\.909 × body/);
  });

  it('recommends no negative ease for a stable knit', () => {
    // trade.md: stable knits stretch 18–25 % and take a woven's positive ease (common practice).
    const r = negativeEaseRecommend(18, 'good');
    expect(r).toMatchObject({ stable: true, wornStretchPct: 0, negativeEasePct: 0, patternGirthFactor: 1 });
    expect(r.reasoning.join(' ')).toMatch(/stable knit/);
  });

  it('asks less of a knit with poorer recovery', () => {
    const good = negativeEaseRecommend(50, 'good').negativeEasePct;
    const fair = negativeEaseRecommend(50, 'fair').negativeEasePct;
    const poor = negativeEaseRecommend(50, 'poor').negativeEasePct;
    expect(good).toBeGreaterThan(fair);
    expect(fair).toBeGreaterThan(poor);
  });

  it('never goes tighter than a swimwear block, even for a 100 % swim knit', () => {
    // patternschool.online "The principle stretch direction": swimwear-tight blocks reduce girth by about 12 %.
    const r = negativeEaseRecommend(100, 'good');
    expect(r.negativeEasePct).toBeCloseTo(NEGATIVE_EASE_MAX_PCT, 9);
    expect(r.reasoning.join(' ')).toMatch(/swimwear/);
  });

  it('refuses a negative stretch', () => {
    expect(() => negativeEaseRecommend(-5, 'good')).toThrow(RangeError);
  });
});
