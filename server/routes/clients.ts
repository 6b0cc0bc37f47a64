import { Router } from 'express';
import { z } from 'zod';
import {
  clientCreateSchema,
  clientListQuerySchema,
  clientParamsSchema,
  clientUpdateSchema,
  type ClientCreate,
  type ClientListQuery,
  type ClientUpdate,
} from '../../shared/schemas/client.js';
import { requireAuth, requireRole } from '../middleware/require-role.js';
import { validate } from '../middleware/validate.js';
import * as clients from '../services/clients.js';
import { ctx } from '../services/context.js';

type ClientParams = z.output<typeof clientParamsSchema>;

/** Archive and restore take no fields. */
const noBody = z.strictObject({}, { error: (issue) => (issue.code === 'unrecognized_keys' ? `Unknown field: ${issue.keys.join(', ')}` : 'Send no body or {}') });

/**
 * `/api/clients`: every member reads (a cutter without e-mail or phone); owners create, change,
 * archive, restore and delete.
 */
export function clientsRouter(): Router {
  const router = Router();
  router.use(requireAuth);
  const owner = requireRole('owner');
  const params = validate(clientParamsSchema, 'params');
  const idOf = (req: { params: unknown }) => (req.params as ClientParams).id;

  router.get('/', validate(clientListQuerySchema, 'query'), async (req, res) => {
    res.json(await clients.clientList(ctx(req), req.query as unknown as ClientListQuery));
  });

  router.post('/', owner, validate(clientCreateSchema), async (req, res) => {
    res.status(201).json(await clients.clientCreate(ctx(req), req.body as ClientCreate));
  });

  router.get('/:id', params, async (req, res) => {
    res.json(await clients.clientGet(ctx(req), idOf(req)));
  });

  router.patch('/:id', owner, params, validate(clientUpdateSchema), async (req, res) => {
    res.json(await clients.clientUpdate(ctx(req), idOf(req), req.body as ClientUpdate));
  });

  router.post('/:id/archive', owner, params, validate(noBody), async (req, res) => {
    res.json(await clients.clientArchive(ctx(req), idOf(req), true));
  });

  router.post('/:id/restore', owner, params, validate(noBody), async (req, res) => {
    res.json(await clients.clientArchive(ctx(req), idOf(req), false));
  });

  router.delete('/:id', owner, params, async (req, res) => {
    await clients.clientDelete(ctx(req), idOf(req));
    res.status(204).end();
  });

  return router;
}
