import type { RequestHandler } from 'express';
import type { z } from 'zod';
import type { LengthUnit } from '../../shared/units/index.js';
import { validate } from '../middleware/validate.js';
import type { SessionUser } from '../services/context.js';

type Part = 'body' | 'query' | 'params';

/**
 * `validate` with a schema whose range messages quote lengths in the studio's unit: one schema
 * per unit, built once. Must run after requireAuth / requireRole.
 */
export function validateInUnit<S extends z.ZodType>(make: (unit: LengthUnit) => S, part: Part = 'body'): RequestHandler {
  const byUnit = new Map<LengthUnit, RequestHandler>();
  return (req, res, next) => {
    const unit = (req.user as SessionUser | undefined)?.unit ?? 'mm';
    let handler = byUnit.get(unit);
    if (!handler) {
      handler = validate(make(unit), part);
      byUnit.set(unit, handler);
    }
    handler(req, res, next);
  };
}
