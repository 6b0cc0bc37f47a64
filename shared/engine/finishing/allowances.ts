/**
 * Allowances added outside each edge's stitching line, mm. Neck and armhole edges bound with
 * knit tape are overlocked and carry none; with self-fabric bands they carry a seam allowance;
 * the fold carries none (trade notes, common practice).
 */
import type { TankSpec } from '../drafting/tank-params';
import type { EdgeName } from '../types';

/** Allowance per edge of a tank top piece, mm. */
export function allowancesFor(spec: TankSpec): Record<EdgeName, number> {
  const opening = spec.edgeFinish === 'band' ? spec.seamAllowance : 0;
  return {
    fold: 0,
    shoulder: spec.seamAllowance,
    neck: opening,
    armhole: opening,
    side: spec.seamAllowance,
    hem: spec.hemAllowance,
  };
}
