import type { Router } from 'express';
import type { AppDeps } from '../app.js';
import { authRouter } from './auth.js';
import { blocksRouter } from './blocks.js';
import { draftsRouter } from './drafts.js';
import { draftPdfRouter } from './draft-pdf.js';
import { queueRouter } from './queue.js';
import { stylesRouter } from './styles.js';
import { healthRouter } from './health.js';
import { clientsRouter } from './clients.js';
import { measurementsRouter } from './measurements.js';
import { fabricsRouter } from './fabrics.js';
import { studioRouter } from './studio.js';
import { uploadsRouter } from './uploads.js';
import { invitationLinksRouter } from './invitation-links.js';
import { invitationsRouter } from './invitations.js';
import { passwordResetRouter } from './password-reset.js';
import { sentMailRouter } from './sent-mail.js';
import { clientMailRouter, draftMailRouter } from './work-mail.js';

/**
 * Every API router is mounted here, under /api. Each new route must also get its entry in the
 * authorization matrix (tests/integration/authorization-matrix.entries.ts).
 */
export function apiRoutesMount(api: Router, deps: AppDeps): void {
  api.use('/health', healthRouter(deps.sequelize));
  api.use('/auth', authRouter(deps));
  api.use('/studio', studioRouter(deps));
  api.use('/clients/:clientId/measurements', measurementsRouter());
  api.use('/clients', clientsRouter());
  api.use('/fabrics', fabricsRouter());
  api.use('/styles', stylesRouter());
  api.use('/clients/:clientId/blocks', blocksRouter());
  api.use('/drafts', draftsRouter());
  api.use('/drafts', draftPdfRouter());
  api.use('/queue', queueRouter());
  api.use(uploadsRouter(deps));
  api.use('/auth/password-reset', passwordResetRouter(deps));
  api.use('/studio/invitations', invitationsRouter(deps));
  api.use('/studio/mail', sentMailRouter(deps));
  api.use('/invitations', invitationLinksRouter(deps));
  api.use('/clients/:clientId', clientMailRouter(deps));
  api.use('/drafts/:draftId', draftMailRouter(deps));
}
