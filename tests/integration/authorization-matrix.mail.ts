/**
 * Authorization matrix entries of the e-mail routes (invitations, invitation links, password
 * reset, sent mail, sending measurements and drafts), spread into MATRIX_ENTRIES. Records are
 * made straight in the database for studio A; a route that uses one up gets a fresh one per call.
 *
 * The routes send real mail: this module starts a local SMTP sink on a free port and puts it in
 * SMTP_SINK_PORT before the matrix builds its app (imports are evaluated before the test body).
 */
import { pino } from 'pino';
import { afterAll } from 'vitest';
import { mailSinkStart } from '../../server/mail/sink.js';
import { tokenCreate } from '../../server/mail/token.js';
import { Client, Invitation, PasswordReset, SentMessage, SentMessageAttachment } from '../../server/models/index.js';
import { testIp } from '../helpers/auth.js';
import type { MatrixEntry, MatrixFixture, Who } from './authorization-matrix.entries.js';
import { clientWithSet, draftMake, draftWorld } from './drafts-fixtures.js';

const sink = await mailSinkStart({ database: process.env.DB_NAME ?? 'knitwright_test', port: 0, logger: pino({ level: 'silent' }) });
process.env.SMTP_SINK_PORT = String(sink.port);
afterAll(() => sink.close());

const everyone = (status: number): Record<Who, number> => ({ anonymous: status, cutter: status, owner: status, otherOwner: status });
const ownerOnly = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: 403, owner: status, otherOwner: status });
const ownerRecord = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: 403, owner: status, otherOwner: 404 });
const memberRecord = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: status, owner: status, otherOwner: 404 });

const HOUR_MS = 3600_000;

/** An open invitation to studio A; returns its id and the link's token. */
async function invitationMake(fx: MatrixFixture): Promise<{ id: number; token: string }> {
  const { token, hash } = tokenCreate();
  const inv = await Invitation.create({
    studioId: fx.studioId,
    email: fx.email('matrix-invitee'),
    role: 'cutter',
    tokenHash: hash,
    invitedBy: fx.ownerId,
    expiresAt: new Date(Date.now() + 72 * HOUR_MS),
    lastSentAt: new Date(),
  });
  return { id: inv.id, token };
}

/** A reset link for a fresh member of studio A. */
async function resetMake(fx: MatrixFixture): Promise<string> {
  const member = await fx.memberCreate('cutter');
  const { token, hash } = tokenCreate();
  await PasswordReset.create({ userId: member.id, tokenHash: hash, expiresAt: new Date(Date.now() + HOUR_MS) });
  return token;
}

const messages = new WeakMap<MatrixFixture, Promise<{ messageId: number; attachmentId: number }>>();
/** One message of studio A as the sink keeps them, with one attachment. */
function messageOf(fx: MatrixFixture) {
  let m = messages.get(fx);
  if (!m) {
    m = (async () => {
      const message = await SentMessage.create({
        studioId: fx.studioId,
        messageId: null,
        fromAddress: 'no-reply@knitwright.localhost',
        fromName: 'Matrix Studio A',
        toAddresses: 'shop@copyshop.example',
        subject: 'Matrix message',
        sentAt: new Date(),
        receivedAt: new Date(),
        html: '<p>Matrix</p>',
        text: 'Matrix',
        size: 100,
      });
      const attachment = await SentMessageAttachment.create({ sentMessageId: message.id, filename: 'ticket.pdf', contentType: 'application/pdf', size: 5, content: Buffer.from('%PDF-') });
      return { messageId: message.id, attachmentId: attachment.id };
    })();
    messages.set(fx, m);
  }
  return m;
}

const clients = new WeakMap<MatrixFixture, Promise<number>>();
/** A client of studio A with an e-mail address and a measurement set. */
function clientOf(fx: MatrixFixture) {
  let c = clients.get(fx);
  if (!c) {
    c = (async () => {
      const { clientId } = await clientWithSet(fx.studioId);
      await Client.update({ email: fx.email('matrix-client') }, { where: { id: clientId } });
      return clientId;
    })();
    clients.set(fx, c);
  }
  return c;
}

const drafts = new WeakMap<MatrixFixture, Promise<number>>();
function draftOf(fx: MatrixFixture) {
  let d = drafts.get(fx);
  if (!d) {
    d = (async () => (await draftMake(fx.agent('owner'), await draftWorld(fx.agent('owner'), fx.studioId))).id)();
    drafts.set(fx, d);
  }
  return d;
}

export const MAIL_MATRIX_ENTRIES: MatrixEntry[] = [
  {
    method: 'POST',
    route: '/api/auth/password-reset',
    expect: everyone(202),
    // A fresh client address per call, so the per-address limit never refuses the matrix.
    request: async (fx, who) => ({ agent: (await fx.agentFresh(who)).set('X-Forwarded-For', testIp()), body: { email: fx.email('matrix-reset') } }),
  },
  { method: 'GET', route: '/api/auth/password-reset/:token', expect: everyone(200), request: async (fx) => ({ path: `/api/auth/password-reset/${await resetMake(fx)}` }) },
  {
    method: 'POST',
    route: '/api/auth/password-reset/:token',
    expect: everyone(204),
    request: async (fx) => ({ path: `/api/auth/password-reset/${await resetMake(fx)}`, body: { password: 'matrix-new-seam-allowance' } }),
  },

  { method: 'GET', route: '/api/studio/invitations', expect: ownerOnly(200) },
  { method: 'POST', route: '/api/studio/invitations', expect: ownerOnly(201), request: (fx) => ({ body: { email: fx.email('matrix-invite'), role: 'cutter' } }) },
  {
    method: 'POST',
    route: '/api/studio/invitations/:id/resend',
    expect: ownerRecord(200),
    request: async (fx) => ({ path: `/api/studio/invitations/${(await invitationMake(fx)).id}/resend`, body: {} }),
  },
  {
    method: 'POST',
    route: '/api/studio/invitations/:id/revoke',
    expect: ownerRecord(200),
    request: async (fx) => ({ path: `/api/studio/invitations/${(await invitationMake(fx)).id}/revoke`, body: {} }),
  },
  { method: 'GET', route: '/api/invitations/:token', expect: everyone(200), request: async (fx) => ({ path: `/api/invitations/${(await invitationMake(fx)).token}` }) },
  {
    method: 'POST',
    route: '/api/invitations/:token/accept',
    expect: everyone(201),
    // Accepting signs the new member in: a fresh agent keeps the caller's shared session.
    request: async (fx, who) => ({
      agent: await fx.agentFresh(who),
      path: `/api/invitations/${(await invitationMake(fx)).token}/accept`,
      body: { name: 'Matrix Invitee', password: fx.password },
    }),
  },

  { method: 'GET', route: '/api/studio/mail', expect: ownerOnly(200) },
  { method: 'GET', route: '/api/studio/mail/:id', expect: ownerRecord(200), request: async (fx) => ({ path: `/api/studio/mail/${(await messageOf(fx)).messageId}` }) },
  {
    method: 'GET',
    route: '/api/studio/mail/:id/attachments/:attachmentId',
    expect: ownerRecord(200),
    request: async (fx) => {
      const { messageId, attachmentId } = await messageOf(fx);
      return { path: `/api/studio/mail/${messageId}/attachments/${attachmentId}` };
    },
  },

  {
    method: 'POST',
    route: '/api/clients/:clientId/send-measurements',
    expect: ownerRecord(201),
    request: async (fx) => ({ path: `/api/clients/${await clientOf(fx)}/send-measurements`, body: {} }),
  },
  { method: 'GET', route: '/api/clients/:clientId/deliveries', expect: ownerRecord(200), request: async (fx) => ({ path: `/api/clients/${await clientOf(fx)}/deliveries` }) },
  {
    method: 'POST',
    route: '/api/drafts/:draftId/send',
    expect: memberRecord(201),
    request: async (fx) => ({ path: `/api/drafts/${await draftOf(fx)}/send`, body: { kind: 'ticket', to: fx.email('matrix-copyshop') } }),
  },
  { method: 'GET', route: '/api/drafts/:draftId/deliveries', expect: ownerRecord(200), request: async (fx) => ({ path: `/api/drafts/${await draftOf(fx)}/deliveries` }) },
];
