import { Router } from 'express';
import {
  MemberIdParamsSchema,
  MemberUpdateSchema,
  StudioUpdateSchema,
  type MemberUpdateInput,
  type StudioUpdateInput,
} from '../../shared/schemas/auth.js';
import type { z } from 'zod';
import type { AppDeps } from '../app.js';
import { requireRole } from '../middleware/require-role.js';
import { validate } from '../middleware/validate.js';
import { ctx } from '../services/context.js';
import * as studio from '../services/studio.js';

type MemberIdParams = z.infer<typeof MemberIdParamsSchema>;

/** `/api/studio`: the studio's defaults and its members. Owners only. */
export function studioRouter(deps: AppDeps): Router {
  const router = Router();
  router.use(requireRole('owner'));

  router.get('/', async (req, res) => {
    res.json(await studio.studioGet(ctx(req)));
  });

  router.patch('/', validate(StudioUpdateSchema), async (req, res) => {
    res.json(await studio.studioUpdate(ctx(req), req.body as StudioUpdateInput));
  });

  router.get('/members', async (req, res) => {
    res.json(await studio.membersList(ctx(req)));
  });

  router.patch('/members/:id', validate(MemberIdParamsSchema, 'params'), validate(MemberUpdateSchema), async (req, res) => {
    const { id } = req.params as unknown as MemberIdParams;
    res.json(await studio.memberUpdate(deps.sequelize, ctx(req), id, req.body as MemberUpdateInput));
  });

  router.delete('/members/:id', validate(MemberIdParamsSchema, 'params'), async (req, res) => {
    const { id } = req.params as unknown as MemberIdParams;
    await studio.memberRemove(deps.sequelize, ctx(req), id);
    res.status(204).end();
  });

  return router;
}
