import { Router } from 'express';
import type { z } from 'zod';
import { attachmentParamsSchema, messageParamsSchema } from '../../shared/schemas/mail.js';
import type { AppDeps } from '../app.js';
import { mailerFor } from '../mail/transport.js';
import { requireRole } from '../middleware/require-role.js';
import { validate } from '../middleware/validate.js';
import { ctx } from '../services/context.js';
import * as sentMail from '../services/sent-mail.js';

type MessageParams = z.infer<typeof messageParamsSchema>;
type AttachmentParams = z.infer<typeof attachmentParamsSchema>;

/** Types an attachment may be served as; anything else downloads as plain bytes. */
const SERVED_TYPES = new Set(['application/pdf', 'text/plain', 'text/csv', 'image/png', 'image/jpeg']);

/** `/api/studio/mail`: the studio's messages as the local SMTP sink received them. Owners only. */
export function sentMailRouter(deps: AppDeps): Router {
  const router = Router();
  router.use(requireRole('owner'));

  router.get('/', async (req, res) => {
    res.json(await sentMail.mailList(ctx(req), mailerFor(deps.config)));
  });

  router.get('/:id', validate(messageParamsSchema, 'params'), async (req, res) => {
    const { id } = req.params as unknown as MessageParams;
    res.json(await sentMail.mailGet(ctx(req), id));
  });

  // Always a download (never shown inline on the app's origin), with nosniff from helmet.
  router.get('/:id/attachments/:attachmentId', validate(attachmentParamsSchema, 'params'), async (req, res) => {
    const { id, attachmentId } = req.params as unknown as AttachmentParams;
    const attachment = await sentMail.attachmentGet(ctx(req), id, attachmentId);
    const type = attachment.contentType.toLowerCase().split(';')[0]?.trim() ?? '';
    res.setHeader('Content-Type', SERVED_TYPES.has(type) ? type : 'application/octet-stream');
    res.attachment(attachment.filename);
    res.send(attachment.content);
  });

  return router;
}
