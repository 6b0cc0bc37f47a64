import { Router } from 'express';
import type { z } from 'zod';
import {
  clientMailParamsSchema,
  draftMailParamsSchema,
  DraftSendSchema,
  MeasurementsSendSchema,
  type DraftSendInput,
  type MeasurementsSendInput,
} from '../../shared/schemas/mail.js';
import type { AppDeps } from '../app.js';
import { mailerFor } from '../mail/transport.js';
import { requireAuth, requireRole } from '../middleware/require-role.js';
import { validate } from '../middleware/validate.js';
import { ctx } from '../services/context.js';
import { deliveriesList } from '../services/sent-mail.js';
import { draftSend, measurementsSend } from '../services/work-send.js';

type ClientParams = z.infer<typeof clientMailParamsSchema>;
type DraftParams = z.infer<typeof draftMailParamsSchema>;

/** `/api/clients/:clientId`: e-mail the client their measurements; the sends recorded on the client. Owners only. */
export function clientMailRouter(deps: AppDeps): Router {
  const router = Router({ mergeParams: true });
  router.use(requireRole('owner'));
  const params = validate(clientMailParamsSchema, 'params');

  router.post('/send-measurements', params, validate(MeasurementsSendSchema), async (req, res) => {
    const { clientId } = req.params as unknown as ClientParams;
    res.status(201).json(await measurementsSend(ctx(req), mailerFor(deps.config), clientId, req.body as MeasurementsSendInput));
  });

  router.get('/deliveries', params, async (req, res) => {
    const { clientId } = req.params as unknown as ClientParams;
    res.json(await deliveriesList(ctx(req), { clientId }));
  });

  return router;
}

/**
 * `/api/drafts/:draftId`: e-mail the tiled pattern, the wide sheet or the ticket as a PDF.
 * Any member may send to an address they type (a cutter sending the sheet to the copy shop);
 * sending to the client's own address, and the list of sends, are for owners.
 */
export function draftMailRouter(deps: AppDeps): Router {
  const router = Router({ mergeParams: true });
  router.use(requireAuth);
  const params = validate(draftMailParamsSchema, 'params');

  router.post('/send', params, validate(DraftSendSchema), async (req, res) => {
    const { draftId } = req.params as unknown as DraftParams;
    const today = new Date().toISOString().slice(0, 10);
    res.status(201).json(await draftSend(ctx(req), mailerFor(deps.config), draftId, req.body as DraftSendInput, today));
  });

  router.get('/deliveries', requireRole('owner'), params, async (req, res) => {
    const { draftId } = req.params as unknown as DraftParams;
    res.json(await deliveriesList(ctx(req), { draftId }));
  });

  return router;
}
