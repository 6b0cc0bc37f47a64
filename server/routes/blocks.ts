import { Router } from 'express';
import type { z } from 'zod';
import {
  blockCreateSchema,
  blockParamsSchema,
  blockUpdateSchema,
  clientParamsSchema,
  correctionParamsSchema,
  correctionSchema,
  type BlockCreate,
  type BlockUpdate,
  type CorrectionCreate,
} from '../../shared/schemas/block.js';
import { requireAuth, requireRole } from '../middleware/require-role.js';
import { validate } from '../middleware/validate.js';
import * as blocks from '../services/blocks.js';
import { ctx } from '../services/context.js';
import { validateInUnit } from './unit-validate.js';

type ClientParams = z.infer<typeof clientParamsSchema>;
type BlockParams = z.infer<typeof blockParamsSchema>;
type CorrectionParams = z.infer<typeof correctionParamsSchema>;

/** `/api/clients/:clientId/blocks`: a client's blocks and their fit corrections. Members read; owners change. */
export function blocksRouter(): Router {
  const router = Router({ mergeParams: true });
  router.use(requireAuth);

  router.get('/', validate(clientParamsSchema, 'params'), async (req, res) => {
    const { clientId } = req.params as unknown as ClientParams;
    res.json(await blocks.blockList(ctx(req), clientId));
  });

  router.get('/to-use', validate(clientParamsSchema, 'params'), async (req, res) => {
    const { clientId } = req.params as unknown as ClientParams;
    res.json(await blocks.blockToUse(ctx(req), clientId));
  });

  router.post('/', requireRole('owner'), validate(clientParamsSchema, 'params'), validateInUnit(blockCreateSchema), async (req, res) => {
    const { clientId } = req.params as unknown as ClientParams;
    res.status(201).json(await blocks.blockCreate(ctx(req), clientId, req.body as BlockCreate));
  });

  router.get('/:blockId', validate(blockParamsSchema, 'params'), async (req, res) => {
    const { clientId, blockId } = req.params as unknown as BlockParams;
    res.json(await blocks.blockGet(ctx(req), clientId, blockId));
  });

  router.patch('/:blockId', requireRole('owner'), validate(blockParamsSchema, 'params'), validate(blockUpdateSchema), async (req, res) => {
    const { clientId, blockId } = req.params as unknown as BlockParams;
    res.json(await blocks.blockUpdate(ctx(req), clientId, blockId, req.body as BlockUpdate));
  });

  router.post(
    '/:blockId/corrections',
    requireRole('owner'),
    validate(blockParamsSchema, 'params'),
    validateInUnit(correctionSchema),
    async (req, res) => {
      const { clientId, blockId } = req.params as unknown as BlockParams;
      res.status(201).json(await blocks.correctionAdd(ctx(req), clientId, blockId, req.body as CorrectionCreate));
    },
  );

  router.delete('/:blockId/corrections/:correctionId', requireRole('owner'), validate(correctionParamsSchema, 'params'), async (req, res) => {
    const { clientId, blockId, correctionId } = req.params as unknown as CorrectionParams;
    res.json(await blocks.correctionRemove(ctx(req), clientId, blockId, correctionId));
  });

  return router;
}
