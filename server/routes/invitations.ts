import { Router } from 'express';
import type { z } from 'zod';
import { InvitationCreateSchema, invitationParamsSchema, type InvitationCreateInput } from '../../shared/schemas/mail.js';
import type { AppDeps } from '../app.js';
import { linkOrigin } from '../mail/links.js';
import { mailerFor } from '../mail/transport.js';
import { requireRole } from '../middleware/require-role.js';
import { validate } from '../middleware/validate.js';
import { ctx } from '../services/context.js';
import * as invitations from '../services/invitations.js';

type IdParams = z.infer<typeof invitationParamsSchema>;

/** `/api/studio/invitations`: the owner invites people by e-mail, resends and revokes. */
export function invitationsRouter(deps: AppDeps): Router {
  const router = Router();
  router.use(requireRole('owner'));
  const params = validate(invitationParamsSchema, 'params');
  const env = (req: Parameters<typeof linkOrigin>[1]) => ({ sequelize: deps.sequelize, mailer: mailerFor(deps.config), origin: linkOrigin(deps.config, req) });

  router.get('/', async (req, res) => {
    res.json(await invitations.invitationsList(ctx(req)));
  });

  router.post('/', validate(InvitationCreateSchema), async (req, res) => {
    res.status(201).json(await invitations.invitationCreate(ctx(req), env(req), req.body as InvitationCreateInput));
  });

  router.post('/:id/resend', params, async (req, res) => {
    const { id } = req.params as unknown as IdParams;
    res.json(await invitations.invitationResend(ctx(req), env(req), id));
  });

  router.post('/:id/revoke', params, async (req, res) => {
    const { id } = req.params as unknown as IdParams;
    res.json(await invitations.invitationRevoke(ctx(req), deps.sequelize, id));
  });

  return router;
}
