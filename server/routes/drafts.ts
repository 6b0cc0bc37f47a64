import { Router } from 'express';
import type { z } from 'zod';
import {
  draftCreateSchema,
  draftListQuerySchema,
  draftParamsSchema,
  draftStateSchema,
  draftUpdateSchema,
  revisionParamsSchema,
  revisionRestoreSchema,
  type DraftCreate,
  type DraftListQuery,
  type DraftStateChange,
  type DraftUpdate,
} from '../../shared/schemas/draft.js';
import { requireAuth, requireRole } from '../middleware/require-role.js';
import { validate } from '../middleware/validate.js';
import { ctx } from '../services/context.js';
import { draftMove } from '../services/draft-states.js';
import * as drafts from '../services/drafts.js';
import { validateInUnit } from './unit-validate.js';

type IdParams = z.infer<typeof draftParamsSchema>;
type RevisionParams = z.infer<typeof revisionParamsSchema>;

/**
 * `/api/drafts`: drafts, their revisions and their states. Members read and (cutters) mark cut,
 * sewn and delivered; owners start, save, restore, approve and reopen.
 */
export function draftsRouter(): Router {
  const router = Router();
  router.use(requireAuth);

  router.get('/', validate(draftListQuerySchema, 'query'), async (req, res) => {
    res.json(await drafts.draftList(ctx(req), req.query as unknown as DraftListQuery));
  });

  router.post('/', requireRole('owner'), validateInUnit(draftCreateSchema), async (req, res) => {
    res.status(201).json(await drafts.draftCreate(ctx(req), req.body as DraftCreate));
  });

  router.get('/:id', validate(draftParamsSchema, 'params'), async (req, res) => {
    const { id } = req.params as unknown as IdParams;
    res.json(await drafts.draftGet(ctx(req), id));
  });

  router.patch('/:id', requireRole('owner'), validate(draftParamsSchema, 'params'), validateInUnit(draftUpdateSchema), async (req, res) => {
    const { id } = req.params as unknown as IdParams;
    res.json(await drafts.draftUpdate(ctx(req), id, req.body as DraftUpdate));
  });

  router.get('/:id/revisions', validate(draftParamsSchema, 'params'), async (req, res) => {
    const { id } = req.params as unknown as IdParams;
    res.json(await drafts.revisionList(ctx(req), id));
  });

  router.get('/:id/revisions/:rev', validate(revisionParamsSchema, 'params'), async (req, res) => {
    const { id, rev } = req.params as unknown as RevisionParams;
    res.json(await drafts.revisionGet(ctx(req), id, rev));
  });

  router.post(
    '/:id/revisions/:rev/restore',
    requireRole('owner'),
    validate(revisionParamsSchema, 'params'),
    validate(revisionRestoreSchema),
    async (req, res) => {
      const { id, rev } = req.params as unknown as RevisionParams;
      const { version } = req.body as z.infer<typeof revisionRestoreSchema>;
      res.json(await drafts.revisionRestore(ctx(req), id, rev, version));
    },
  );

  // Role rules differ by move (approve/reopen: owner; cut, sewn, delivered: any member): the service decides.
  router.post('/:id/state', validate(draftParamsSchema, 'params'), validate(draftStateSchema), async (req, res) => {
    const { id } = req.params as unknown as IdParams;
    res.json(await draftMove(ctx(req), id, req.body as DraftStateChange));
  });

  return router;
}
