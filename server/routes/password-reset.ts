import { Router } from 'express';
import type { z } from 'zod';
import { ResetConfirmSchema, ResetRequestSchema, tokenParamsSchema, type ResetConfirmInput, type ResetRequestInput } from '../../shared/schemas/mail.js';
import type { AppDeps } from '../app.js';
import { linkOrigin } from '../mail/links.js';
import { mailerFor } from '../mail/transport.js';
import { validate } from '../middleware/validate.js';
import * as resets from '../services/password-resets.js';

type TokenParams = z.infer<typeof tokenParamsSchema>;

/**
 * `/api/auth/password-reset`: ask for a reset link by e-mail (the same answer for any address),
 * check a link, and set a new password through it (which ends every session of the member).
 */
export function passwordResetRouter(deps: AppDeps): Router {
  const router = Router();
  const params = validate(tokenParamsSchema, 'params');

  router.post('/', validate(ResetRequestSchema), async (req, res) => {
    const { email } = req.body as ResetRequestInput;
    const env = { sequelize: deps.sequelize, mailer: mailerFor(deps.config), origin: linkOrigin(deps.config, req) };
    res.status(202).json(await resets.resetRequest(env, req.log ?? deps.logger, email, req.ip ?? 'unknown'));
  });

  router.get('/:token', params, async (req, res) => {
    const { token } = req.params as unknown as TokenParams;
    res.json(await resets.resetCheck(token));
  });

  router.post('/:token', params, validate(ResetConfirmSchema), async (req, res) => {
    const { token } = req.params as unknown as TokenParams;
    await resets.resetConfirm(deps.sequelize, token, (req.body as ResetConfirmInput).password);
    res.status(204).end();
  });

  return router;
}
