/**
 * The stretch test and the negative ease that suits a knit's stretch. Pure functions: lengths
 * in any one unit for the test, girths in mm, stretch and ease in percent.
 *
 * Stretch test: stretch % = (stretched − relaxed) / relaxed × 100 (thesewingdirectory.co.uk,
 * "What is stretch?"; blog.fabric.com, "How to measure stretch of knit fabric").
 * Worn stretch: a garment worn stretched by a fraction e is cut at body ÷ (1 + e), a negative
 * ease of e ÷ (1 + e) of the body girth (arithmetic).
 */

/** How well a knit returns to its length after the stretch test. */
export type Recovery = 'good' | 'fair' | 'poor';

/** Every recovery grade, best first. */
export const RECOVERIES: readonly Recovery[] = ['good', 'fair', 'poor'];

/**
 * Below this crosswise stretch a knit is treated as stable and takes the positive ease of a
 * woven (common practice; typical stable knits stretch 18–25 %).
 */
export const STABLE_KNIT_MAX_STRETCH_PCT = 20;

/**
 * Share of the tested stretch a fitted garment is worn at, by recovery: Knitwright's default.
 * A fifth for good recovery puts a 50 % jersey at about 9 % negative ease, inside the 8–10 %
 * usual for a fitted knit tank top (common practice); poorer recovery asks less of the knit,
 * which would otherwise grow with wear and not spring back.
 */
export const WORN_SHARE_BY_RECOVERY: Readonly<Record<Recovery, number>> = { good: 1 / 5, fair: 1 / 6, poor: 1 / 8 };

/**
 * The most negative ease recommended for a tank top: 12 % of the body girth, the reduction of
 * a swimwear-tight block (patternschool.online, "The principle stretch direction").
 */
export const NEGATIVE_EASE_MAX_PCT = 12;

/**
 * Stretch percent from a stretch test.
 * @param relaxed the marked length at rest (any unit)
 * @param stretched the same mark pulled gently to the point of resistance (same unit)
 * @returns (stretched − relaxed) / relaxed × 100
 */
export function stretchPercent(relaxed: number, stretched: number): number {
  if (!Number.isFinite(relaxed) || relaxed <= 0) throw new RangeError('The relaxed length must be greater than zero');
  if (!Number.isFinite(stretched) || stretched < relaxed) {
    throw new RangeError('The stretched length cannot be shorter than the relaxed length');
  }
  return ((stretched - relaxed) / relaxed) * 100;
}

/**
 * Pattern girth for a body girth worn at a stretch: body ÷ (1 + e).
 * @param bodyMm body girth in mm
 * @param wornStretchPct how far the garment is stretched when worn, percent
 */
export function patternGirthForStretch(bodyMm: number, wornStretchPct: number): number {
  return bodyMm / (1 + wornStretchPct / 100);
}

/**
 * Negative ease, percent of the body girth, of a garment worn at a stretch: e ÷ (1 + e).
 * @param wornStretchPct percent
 */
export function negativeEaseForStretch(wornStretchPct: number): number {
  const e = wornStretchPct / 100;
  return (e / (1 + e)) * 100;
}

/**
 * The worn stretch that gives a negative ease: n ÷ (1 − n), the inverse of
 * {@link negativeEaseForStretch}.
 * @param negativeEasePct percent of the body girth (0 to under 100)
 */
export function stretchForNegativeEase(negativeEasePct: number): number {
  const n = negativeEasePct / 100;
  return (n / (1 - n)) * 100;
}

/** A recommended negative ease for a knit, with the reasoning shown to the owner. */
export interface EaseRecommendation {
  /** The fabric's tested crosswise stretch, percent. */
  fabricStretchPct: number;
  recovery: Recovery;
  /** True for a stable knit: no negative ease, draft with a woven's ease. */
  stable: boolean;
  /** How far the garment is stretched when worn, percent. */
  wornStretchPct: number;
  /** Pattern girth ÷ body girth: 1 ÷ (1 + e). */
  patternGirthFactor: number;
  /** Negative ease, percent of the body girth (positive number = smaller than the body). */
  negativeEasePct: number;
  /** Each step of the reasoning, in order, in plain words. */
  reasoning: string[];
}

function pct(value: number): string {
  return `${Number(value.toFixed(1))} %`;
}

/**
 * The negative ease that suits a knit's crosswise stretch and recovery for a fitted top.
 * @param stretchPct tested crosswise stretch, percent (0 to 150)
 * @param recovery how well the knit springs back
 */
export function negativeEaseRecommend(stretchPct: number, recovery: Recovery): EaseRecommendation {
  if (!Number.isFinite(stretchPct) || stretchPct < 0) throw new RangeError('Stretch must be zero or more percent');
  if (stretchPct < STABLE_KNIT_MAX_STRETCH_PCT) {
    return {
      fabricStretchPct: stretchPct,
      recovery,
      stable: true,
      wornStretchPct: 0,
      patternGirthFactor: 1,
      negativeEasePct: 0,
      reasoning: [
        `A crosswise stretch of ${pct(stretchPct)} is under ${STABLE_KNIT_MAX_STRETCH_PCT} %: a stable knit.`,
        'Stable knits take the same positive ease as wovens, so no negative ease is recommended.',
      ],
    };
  }
  const share = WORN_SHARE_BY_RECOVERY[recovery];
  const shareWords = { good: 'a fifth', fair: 'a sixth', poor: 'an eighth' }[recovery];
  const reasoning = [
    `With ${recovery} recovery the garment is worn at ${shareWords} of the tested stretch: ${pct(stretchPct)} × ${share.toFixed(3)} = ${pct(stretchPct * share)}.`,
  ];
  let worn = stretchPct * share;
  const wornMax = stretchForNegativeEase(NEGATIVE_EASE_MAX_PCT);
  if (worn > wornMax) {
    worn = wornMax;
    reasoning.push(
      `That is tighter than a swimwear block; the worn stretch is held at ${pct(worn)}, a ${NEGATIVE_EASE_MAX_PCT} % reduction.`,
    );
  }
  const factor = 1 / (1 + worn / 100);
  const ease = negativeEaseForStretch(worn);
  reasoning.push(
    `Worn at ${pct(worn)} stretch, the pattern girth is body ÷ (1 + ${(worn / 100).toFixed(3)}) = ${factor.toFixed(3)} × body.`,
    `That is a negative ease of ${pct(ease)} of the body girth.`,
  );
  return { fabricStretchPct: stretchPct, recovery, stable: false, wornStretchPct: worn, patternGirthFactor: factor, negativeEasePct: ease, reasoning };
}
