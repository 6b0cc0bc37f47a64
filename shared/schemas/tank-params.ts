/**
 * Parameters of the tank top style. Every one is optional: the engine fills trade defaults.
 * Lengths are in the input's unit; eases are percent of the body girth.
 */
import { z } from 'zod';
import { numberField } from './fields';

/** Tank top parameters (lengths in the input's unit; eases in percent). */
export const tankParamsSchema = z.strictObject(
  {
    length: numberField('Length').optional(),
    bustEase: numberField('Bust ease').optional(),
    hipEase: numberField('Hip ease').optional(),
    frontNeckDepth: numberField('Front neck depth').optional(),
    backNeckDepth: numberField('Back neck depth').optional(),
    strapInset: numberField('Strap inset').optional(),
    strapWidth: numberField('Strap width').optional(),
    shoulderSlope: numberField('Shoulder slope').optional(),
    racerBackInset: numberField('Racer back inset').optional(),
    sideHemRise: numberField('Side hem rise').optional(),
    hemAllowance: numberField('Hem allowance').optional(),
    seamAllowance: numberField('Seam allowance').optional(),
    edgeFinish: z.enum(['tape', 'band'], { error: 'Edge finish must be "tape" or "band"' }).optional(),
    bindingWidth: numberField('Binding width').optional(),
    bindingRatio: numberField('Binding ratio').optional(),
    bindingJoinAllowance: numberField('Binding join allowance').optional(),
  },
  {
    error: (issue) =>
      issue.code === 'unrecognized_keys' ? `Unknown tank parameter: ${issue.keys.join(', ')}` : 'Params must be an object',
  },
);

/** Tank top parameters as given (lengths in the input's unit). */
export type TankParams = z.infer<typeof tankParamsSchema>;
