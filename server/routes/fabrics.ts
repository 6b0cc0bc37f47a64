import { Router } from 'express';
import type { z } from 'zod';
import {
  fabricCreateSchema,
  fabricListQuerySchema,
  fabricParamsSchema,
  fabricUpdateSchema,
  type FabricCreate,
  type FabricListQuery,
  type FabricUpdate,
} from '../../shared/schemas/fabric.js';
import { requireAuth, requireRole } from '../middleware/require-role.js';
import { validate } from '../middleware/validate.js';
import { ctx } from '../services/context.js';
import * as fabrics from '../services/fabrics.js';

type FabricParams = z.output<typeof fabricParamsSchema>;

/** `/api/fabrics`: every member reads; owners add, change and delete. */
export function fabricsRouter(): Router {
  const router = Router();
  router.use(requireAuth);
  const owner = requireRole('owner');
  const params = validate(fabricParamsSchema, 'params');
  const idOf = (req: { params: unknown }) => (req.params as FabricParams).id;

  router.get('/', validate(fabricListQuerySchema, 'query'), async (req, res) => {
    res.json(await fabrics.fabricList(ctx(req), req.query as unknown as FabricListQuery));
  });

  router.post('/', owner, validate(fabricCreateSchema), async (req, res) => {
    res.status(201).json(await fabrics.fabricCreate(ctx(req), req.body as FabricCreate));
  });

  router.get('/:id', params, async (req, res) => {
    res.json(await fabrics.fabricGet(ctx(req), idOf(req)));
  });

  router.patch('/:id', owner, params, validate(fabricUpdateSchema), async (req, res) => {
    res.json(await fabrics.fabricUpdate(ctx(req), idOf(req), req.body as FabricUpdate));
  });

  router.delete('/:id', owner, params, async (req, res) => {
    await fabrics.fabricDelete(ctx(req), idOf(req));
    res.status(204).end();
  });

  return router;
}
