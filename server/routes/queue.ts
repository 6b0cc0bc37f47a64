import { Router } from 'express';
import type { z } from 'zod';
import { queueQuerySchema } from '../../shared/schemas/draft.js';
import { requireAuth } from '../middleware/require-role.js';
import { validate } from '../middleware/validate.js';
import { ctx } from '../services/context.js';
import { queueList } from '../services/queue.js';

/** `/api/queue`: the cutter's work queue. Any member. */
export function queueRouter(): Router {
  const router = Router();
  router.use(requireAuth);
  router.get('/', validate(queueQuerySchema, 'query'), async (req, res) => {
    const { state } = req.query as unknown as z.infer<typeof queueQuerySchema>;
    res.json(await queueList(ctx(req), state));
  });
  return router;
}
