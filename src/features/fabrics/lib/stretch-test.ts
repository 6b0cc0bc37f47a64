/**
 * The stretch test as typed on the fabric screen: two lengths of the same mark (in any unit the
 * shared parser reads), checked with the shared stretch-test schema, then turned into percent.
 */
import { lengthParse, type LengthUnit } from '@shared/units';
import { stretchPercent, stretchTestSchema } from '@shared/schemas/fabric';

export type StretchTestResult =
  | { ok: true; percent: number; relaxedMm: number; stretchedMm: number }
  | { ok: false; errors: { relaxed?: string; stretched?: string } };

/**
 * Reads a stretch test; a blank length is reported only once the other one is typed.
 * @param unit the unit of a bare number (the unit on screen)
 */
export function stretchTestRead(relaxedText: string, stretchedText: string, unit: LengthUnit): StretchTestResult {
  const errors: { relaxed?: string; stretched?: string } = {};
  const relaxed = lengthParse(relaxedText, unit);
  const stretched = lengthParse(stretchedText, unit);
  if (!relaxed.ok) errors.relaxed = `Relaxed length: ${relaxed.reason}`;
  if (!stretched.ok) errors.stretched = `Stretched length: ${stretched.reason}`;
  if (!relaxed.ok || !stretched.ok) return { ok: false, errors };
  const checked = stretchTestSchema.safeParse({ relaxed: relaxed.mm, stretched: stretched.mm });
  if (!checked.success) {
    for (const issue of checked.error.issues) {
      const key = issue.path[0] === 'relaxed' ? 'relaxed' : 'stretched';
      errors[key] ??= issue.message;
    }
    return { ok: false, errors };
  }
  return { ok: true, percent: stretchPercent(checked.data.relaxed, checked.data.stretched), relaxedMm: relaxed.mm, stretchedMm: stretched.mm };
}

/** Stretch percent as shown and as stored: to 0.1 %, without a trailing ".0". */
export function percentFormat(percent: number): string {
  return String(Math.round(percent * 10) / 10);
}
