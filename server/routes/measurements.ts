import { Router } from 'express';
import type { z } from 'zod';
import {
  measurementParamsSchema,
  measurementSetCorrectSchema,
  measurementSetCreateSchema,
  type MeasurementSetCorrect,
  type MeasurementSetCreate,
} from '../../shared/schemas/measurement.js';
import { requireAuth, requireRole } from '../middleware/require-role.js';
import { validate } from '../middleware/validate.js';
import { ctx } from '../services/context.js';
import * as measurements from '../services/measurements.js';

type MeasurementParams = z.output<typeof measurementParamsSchema>;

/**
 * `/api/clients/:clientId/measurements`: every member reads sets and their versions; owners
 * record new sets and corrections. A set is never overwritten: a correction adds a version.
 */
export function measurementsRouter(): Router {
  const router = Router({ mergeParams: true });
  router.use(requireAuth);
  const owner = requireRole('owner');
  const params = validate(measurementParamsSchema, 'params');
  const p = (req: { params: unknown }) => req.params as MeasurementParams;

  router.get('/', params, async (req, res) => {
    res.json(await measurements.measurementSetList(ctx(req), p(req).clientId));
  });

  router.post('/', owner, params, validate(measurementSetCreateSchema), async (req, res) => {
    res.status(201).json(await measurements.measurementSetCreate(ctx(req), p(req).clientId, req.body as MeasurementSetCreate));
  });

  router.get('/:setId', params, async (req, res) => {
    const { clientId, setId } = p(req);
    res.json(await measurements.measurementSetGet(ctx(req), clientId, setId as number));
  });

  router.patch('/:setId', owner, params, validate(measurementSetCorrectSchema), async (req, res) => {
    const { clientId, setId } = p(req);
    res.json(await measurements.measurementSetCorrect(ctx(req), clientId, setId as number, req.body as MeasurementSetCorrect));
  });

  router.get('/:setId/versions/:version', params, async (req, res) => {
    const { clientId, setId, version } = p(req);
    res.json(await measurements.measurementVersionGet(ctx(req), clientId, setId as number, version as number));
  });

  return router;
}
