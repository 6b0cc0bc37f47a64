import { Router } from 'express';
import type { z } from 'zod';
import {
  idParamsSchema,
  styleCreateSchema,
  styleListQuerySchema,
  styleUpdateSchema,
  type StyleCreate,
  type StyleUpdate,
} from '../../shared/schemas/style.js';
import { requireAuth, requireRole } from '../middleware/require-role.js';
import { validate } from '../middleware/validate.js';
import { ctx } from '../services/context.js';
import * as styles from '../services/styles.js';
import { validateInUnit } from './unit-validate.js';

const styleIdParams = idParamsSchema('Style');
type IdParams = z.infer<typeof styleIdParams>;

/** `/api/styles`: the studio's saved styles. Members read; owners create and change. */
export function stylesRouter(): Router {
  const router = Router();
  router.use(requireAuth);

  router.get('/', validate(styleListQuerySchema, 'query'), async (req, res) => {
    const query = req.query as unknown as z.infer<typeof styleListQuerySchema>;
    res.json(await styles.styleList(ctx(req), query.archived));
  });

  router.post('/', requireRole('owner'), validateInUnit(styleCreateSchema), async (req, res) => {
    res.status(201).json(await styles.styleCreate(ctx(req), req.body as StyleCreate));
  });

  router.get('/:id', validate(styleIdParams, 'params'), async (req, res) => {
    const { id } = req.params as unknown as IdParams;
    res.json(await styles.styleGet(ctx(req), id));
  });

  router.patch('/:id', requireRole('owner'), validate(styleIdParams, 'params'), validateInUnit(styleUpdateSchema), async (req, res) => {
    const { id } = req.params as unknown as IdParams;
    res.json(await styles.styleUpdate(ctx(req), id, req.body as StyleUpdate));
  });

  return router;
}
