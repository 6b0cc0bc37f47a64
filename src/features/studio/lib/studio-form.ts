import { z } from 'zod';
import {
  BINDING_RATIO,
  HEM_ALLOWANCE_MM,
  PAPERS,
  SEAM_ALLOWANCE_MM,
  StudioUpdateSchema,
  UNITS,
  type PaperSize,
  type StudioUnit,
  type StudioView,
} from '@shared/schemas/auth';
import { lengthFormat, lengthParse } from '@shared/units';

/** Paper sizes as the owner reads them (ISO 216 and ANSI sizes; /work/shared/trade.md, "Units and paper"). */
export const PAPER_LABEL: Record<PaperSize, string> = {
  letter: 'Letter (8 1/2 × 11 in)',
  a4: 'A4 (210 × 297 mm)',
  legal: 'Legal (8 1/2 × 14 in)',
  a3: 'A3 (297 × 420 mm)',
  tabloid: 'Tabloid (11 × 17 in)',
};

export const UNIT_LABEL: Record<StudioUnit, string> = { in: 'Inches (in)', cm: 'Centimetres (cm)' };

/** What the owner types: lengths as text in the chosen unit ("1/4", "0.6", "6 mm"). */
export interface StudioFormValues {
  name: string;
  defaultUnit: StudioUnit;
  defaultPaper: PaperSize;
  seamAllowance: string;
  hemAllowance: string;
  bindingRatio: string;
}

/** The server's names for the form's typed lengths, to put its field errors in the right place. */
export const SERVER_FIELD_NAMES = { seamAllowanceMm: 'seamAllowance', hemAllowanceMm: 'hemAllowance' } as const;

/** A stored length shown in the studio's unit, without the unit (the field shows it). */
export function allowanceText(mm: number, unit: StudioUnit): string {
  return lengthFormat(mm, unit, { withUnit: false });
}

/** The form's starting values from the saved studio. */
export function studioFormValues(studio: StudioView): StudioFormValues {
  return {
    name: studio.name,
    defaultUnit: studio.defaultUnit,
    defaultPaper: studio.defaultPaper,
    seamAllowance: allowanceText(studio.seamAllowanceMm, studio.defaultUnit),
    hemAllowance: allowanceText(studio.hemAllowanceMm, studio.defaultUnit),
    bindingRatio: String(studio.bindingRatio),
  };
}

/** Re-writes a typed length in another unit; text that does not parse is left as typed. */
export function allowanceConvert(text: string, from: StudioUnit, to: StudioUnit): string {
  const parsed = lengthParse(text, from, { allowZero: true });
  return parsed.ok ? allowanceText(parsed.mm, to) : text;
}

function lengthInRange(
  text: string,
  label: string,
  unit: StudioUnit,
  range: { min: number; max: number },
  path: keyof StudioFormValues,
  ctx: z.RefinementCtx,
): number {
  const parsed = lengthParse(text, unit, { allowZero: true });
  if (!parsed.ok) {
    ctx.addIssue({ code: 'custom', path: [path], message: `${label}: ${parsed.reason}` });
    return Number.NaN;
  }
  if (parsed.mm < range.min || parsed.mm > range.max) {
    const bounds = `${lengthFormat(range.min, unit)} and ${lengthFormat(range.max, unit)}`;
    ctx.addIssue({ code: 'custom', path: [path], message: `${label} must be between ${bounds}` });
    return Number.NaN;
  }
  return parsed.mm;
}

/**
 * The studio form: typed lengths are read in the unit chosen on the form and checked against
 * the same limits as the route, with the limits said in that unit; the result then goes
 * through the route's own schema.
 */
export const StudioFormSchema = z
  .object({
    name: z.string(),
    defaultUnit: z.enum(UNITS),
    defaultPaper: z.enum(PAPERS),
    seamAllowance: z.string(),
    hemAllowance: z.string(),
    bindingRatio: z.string(),
  })
  .transform((v, ctx): z.input<typeof StudioUpdateSchema> => {
    const seamAllowanceMm = lengthInRange(v.seamAllowance, 'Seam allowance', v.defaultUnit, SEAM_ALLOWANCE_MM, 'seamAllowance', ctx);
    const hemAllowanceMm = lengthInRange(v.hemAllowance, 'Hem allowance', v.defaultUnit, HEM_ALLOWANCE_MM, 'hemAllowance', ctx);
    const ratioText = v.bindingRatio.trim().replace(',', '.');
    const bindingRatio = ratioText === '' ? Number.NaN : Number(ratioText);
    if (!Number.isFinite(bindingRatio)) {
      ctx.addIssue({ code: 'custom', path: ['bindingRatio'], message: 'Binding ratio must be a number such as 0.85' });
    } else if (bindingRatio < BINDING_RATIO.min || bindingRatio > BINDING_RATIO.max) {
      ctx.addIssue({
        code: 'custom',
        path: ['bindingRatio'],
        message: `Binding ratio must be between ${BINDING_RATIO.min} and ${BINDING_RATIO.max}`,
      });
    }
    return { name: v.name, defaultUnit: v.defaultUnit, defaultPaper: v.defaultPaper, seamAllowanceMm, hemAllowanceMm, bindingRatio };
  })
  .pipe(StudioUpdateSchema);
