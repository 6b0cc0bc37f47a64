/**
 * Finished garment figures: girths after ease, ease as a length and a percent of the body,
 * and the stretch the fabric must give when worn: a garment cut at body ÷ (1 + e) is worn
 * stretched by e (worn-stretch arithmetic, trade notes). Lengths in mm.
 */
import type { TankFrame } from '../drafting/tank-frame';
import type { TankSpec } from '../drafting/tank-params';
import type { Ease, Finished } from '../types';

/** Ease of a finished girth over a body girth: mm and percent of the body. */
export function easeOf(finished: number, body: number): Ease {
  return { mm: finished - body, percent: ((finished - body) / body) * 100 };
}

/** Stretch (percent) a garment of girth `finished` must give to go round `body`; 0 if none. */
export function stretchNeededFor(finished: number, body: number): number {
  return finished >= body ? 0 : (body / finished - 1) * 100;
}

/** The finished figures of a tank top. */
export function finishedCompute(spec: TankSpec, frame: TankFrame): Finished {
  const bust = 4 * frame.quarterBust;
  const hip = 4 * frame.quarterHip;
  const waist = frame.quarterWaist === null ? null : 4 * frame.quarterWaist;
  return {
    bust,
    hip,
    waist,
    length: spec.length,
    bustEase: easeOf(bust, spec.bust),
    hipEase: easeOf(hip, spec.hip),
    waistEase: waist === null || spec.waist === null ? null : easeOf(waist, spec.waist),
    stretchNeeded: stretchNeededFor(bust, spec.bust),
    hipStretchNeeded: stretchNeededFor(hip, spec.hip),
    fabricStretch: spec.stretch,
  };
}
