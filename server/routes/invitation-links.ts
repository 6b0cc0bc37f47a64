import { Router, type Request } from 'express';
import type { z } from 'zod';
import { InvitationAcceptSchema, tokenParamsSchema, type InvitationAcceptInput } from '../../shared/schemas/mail.js';
import type { AppDeps } from '../app.js';
import { meGet, sessionUserLoad } from '../services/accounts.js';
import type { SessionUser } from '../services/context.js';
import { validate } from '../middleware/validate.js';
import * as invitations from '../services/invitations.js';

type TokenParams = z.infer<typeof tokenParamsSchema>;

/** As sign-in does: passport's logIn regenerates the session id, then the sign-in time is kept. */
function logIn(req: Request, user: SessionUser): Promise<void> {
  return new Promise((resolve, reject) =>
    req.logIn(user, (err) => {
      if (err) return reject(err as Error);
      req.session.signedInAt = Date.now();
      resolve();
    }),
  );
}

/**
 * `/api/invitations/:token`: the link in an invitation. Anyone holding it may see what it offers
 * and accept it; accepting creates the member and signs them in.
 */
export function invitationLinksRouter(deps: AppDeps): Router {
  const router = Router();
  const params = validate(tokenParamsSchema, 'params');

  router.get('/:token', params, async (req, res) => {
    const { token } = req.params as unknown as TokenParams;
    res.json(await invitations.invitationPublicGet(token));
  });

  router.post('/:token/accept', params, validate(InvitationAcceptSchema), async (req, res) => {
    const { token } = req.params as unknown as TokenParams;
    const userId = await invitations.invitationAccept(deps.sequelize, token, req.body as InvitationAcceptInput);
    const user = await sessionUserLoad(userId);
    if (!user) throw new Error(`member ${userId} not found right after it was created`);
    await logIn(req, user);
    res.status(201).json(await meGet({ userId: user.id, studioId: user.studioId, role: user.role, unit: user.unit }));
  });

  return router;
}
