import { Op, Transaction, UniqueConstraintError, type Sequelize } from 'sequelize';
import {
  INVITATION_HOURS,
  type InvitationAcceptInput,
  type InvitationCreateInput,
  type InvitationPublicView,
  type InvitationStatus,
  type InvitationView,
  type InvitationsResponse,
} from '../../shared/schemas/mail.js';
import { passwordProblem } from '../auth/common-passwords.js';
import { AppError, Invalid, NotFound, TooManyRequests } from '../lib/errors.js';
import { passwordHash } from '../lib/password.js';
import { Invitation, Studio, User } from '../models/index.js';
import { invitationMessage } from '../mail/messages.js';
import { mailSend, type MailEnv } from '../mail/send.js';
import { mailThrottleHit } from '../mail/throttle.js';
import { tokenCreate, tokenHash } from '../mail/token.js';
import type { ServiceContext } from './context.js';

const HOUR_MS = 60 * 60 * 1000;

/** Now, to the whole second the DATETIME columns keep, so an answer shows what was stored. */
function nowSeconds(): Date {
  return new Date(Math.floor(Date.now() / 1000) * 1000);
}


export function invitationStatus(inv: Invitation, now = new Date()): InvitationStatus {
  if (inv.acceptedAt) return 'accepted';
  if (inv.revokedAt) return 'revoked';
  return inv.expiresAt.getTime() <= now.getTime() ? 'expired' : 'open';
}

function invitationView(inv: Invitation, names: Map<number, string>): InvitationView {
  return {
    id: inv.id,
    email: inv.email,
    role: inv.role,
    status: invitationStatus(inv),
    invitedBy: inv.invitedBy === null ? null : (names.get(inv.invitedBy) ?? null),
    createdAt: inv.createdAt.toISOString(),
    lastSentAt: inv.lastSentAt.toISOString(),
    sentCount: inv.sentCount,
    expiresAt: inv.expiresAt.toISOString(),
    acceptedAt: inv.acceptedAt?.toISOString() ?? null,
    revokedAt: inv.revokedAt?.toISOString() ?? null,
  };
}

async function memberNames(ids: (number | null)[]): Promise<Map<number, string>> {
  const unique = [...new Set(ids.filter((id): id is number => id !== null))];
  if (unique.length === 0) return new Map();
  const users = await User.findAll({ where: { id: unique }, attributes: ['id', 'name'] });
  return new Map(users.map((u) => [u.id, u.name]));
}

async function studioName(studioId: number): Promise<string> {
  const studio = await Studio.findByPk(studioId, { attributes: ['name'] });
  if (!studio) throw new NotFound('studio');
  return studio.name;
}

/** Every invitation of the studio, newest first. */
export async function invitationsList(c: ServiceContext): Promise<InvitationsResponse> {
  const rows = await Invitation.findAll({ where: { studioId: c.studioId }, order: [['createdAt', 'DESC'], ['id', 'DESC']] });
  const names = await memberNames(rows.map((r) => r.invitedBy));
  return { invitations: rows.map((r) => invitationView(r, names)) };
}

async function throttleStudio(env: MailEnv, studioId: number): Promise<void> {
  if (!(await mailThrottleHit(env.sequelize, 'invitationsPerStudio', String(studioId)))) {
    throw new TooManyRequests('This studio has sent many invitations in the last hour. Wait a while before sending more.');
  }
}

/** Sends the invitation's message with a fresh link; the delivery is recorded. */
async function invitationMail(c: ServiceContext, env: MailEnv, inv: Invitation, token: string): Promise<void> {
  const [name, names] = await Promise.all([studioName(c.studioId), memberNames([c.userId])]);
  const message = invitationMessage({
    studioName: name,
    inviter: names.get(c.userId) ?? null,
    role: inv.role,
    url: `${env.origin}/invitations/${token}`,
    expiresAt: inv.expiresAt,
  });
  await mailSend(env.mailer, {
    studioId: c.studioId,
    studioName: name,
    kind: 'invitation',
    to: inv.email,
    invitationId: inv.id,
    sentBy: c.userId,
    ...message,
  });
}

function refused(code: string, message: string): AppError {
  return new AppError(409, code, message, { email: message });
}

/**
 * Invites a person by e-mail with a role. Refused when the address already has an account (in
 * this studio or another: an address belongs to one account) or an open invitation here.
 */
export async function invitationCreate(c: ServiceContext, env: MailEnv, input: InvitationCreateInput): Promise<InvitationView> {
  const existing = await User.findOne({ where: { email: input.email }, attributes: ['studioId', 'name'] });
  if (existing?.studioId === c.studioId) throw refused('already_member', `${existing.name} (${input.email}) is already a member of this studio.`);
  if (existing) throw refused('email_taken', 'This address already has a Knitwright account with another studio: invite another address.');
  const open = await Invitation.findOne({
    where: { studioId: c.studioId, email: input.email, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() } },
  });
  if (open) throw refused('already_invited', 'An invitation to this address is still open: resend it from the list instead.');
  await throttleStudio(env, c.studioId);
  const { token, hash } = tokenCreate();
  const now = nowSeconds();
  const inv = await Invitation.create({
    studioId: c.studioId,
    email: input.email,
    role: input.role,
    tokenHash: hash,
    invitedBy: c.userId,
    expiresAt: new Date(now.getTime() + INVITATION_HOURS * HOUR_MS),
    lastSentAt: now,
  });
  await invitationMail(c, env, inv, token);
  return invitationView(inv, await memberNames([inv.invitedBy]));
}

async function invitationFind(c: ServiceContext, id: number, transaction?: Transaction): Promise<Invitation> {
  const inv = await Invitation.findOne({ where: { id, studioId: c.studioId }, transaction, lock: transaction ? Transaction.LOCK.UPDATE : undefined });
  if (!inv) throw new NotFound('invitation');
  return inv;
}

/**
 * Sends an open or expired invitation again with a new link, good for another 72 hours; the
 * earlier link stops working.
 */
export async function invitationResend(c: ServiceContext, env: MailEnv, id: number): Promise<InvitationView> {
  const { token, hash } = tokenCreate();
  const inv = await env.sequelize.transaction(async (transaction) => {
    const row = await invitationFind(c, id, transaction);
    const status = invitationStatus(row);
    if (status === 'accepted') throw new AppError(409, 'invitation_accepted', 'This invitation was accepted: the person is a member now.');
    if (status === 'revoked') throw new AppError(409, 'invitation_revoked', 'This invitation was revoked: invite the address again instead.');
    await throttleStudio(env, c.studioId);
    const now = nowSeconds();
    row.set({ tokenHash: hash, expiresAt: new Date(now.getTime() + INVITATION_HOURS * HOUR_MS), lastSentAt: now, sentCount: row.sentCount + 1 });
    await row.save({ transaction });
    return row;
  });
  await invitationMail(c, env, inv, token);
  return invitationView(inv, await memberNames([inv.invitedBy]));
}

/** Revokes an invitation: its link stops working at once. Revoking twice changes nothing. */
export async function invitationRevoke(c: ServiceContext, sequelize: Sequelize, id: number): Promise<InvitationView> {
  const inv = await sequelize.transaction(async (transaction) => {
    const row = await invitationFind(c, id, transaction);
    if (row.acceptedAt) throw new AppError(409, 'invitation_accepted', 'This invitation was already accepted: remove or disable the member instead.');
    if (!row.revokedAt) {
      row.revokedAt = new Date();
      await row.save({ transaction });
    }
    return row;
  });
  return invitationView(inv, await memberNames([inv.invitedBy]));
}

/** Why a link cannot be used, in words the invited person can act on; 410 Gone. */
function linkGone(inv: Invitation): AppError | null {
  const status = invitationStatus(inv);
  if (status === 'accepted') return new AppError(410, 'invitation_used', 'This invitation has already been accepted. Sign in with the e-mail and password you chose.');
  if (status === 'revoked') return new AppError(410, 'invitation_revoked', 'This invitation was withdrawn by the studio. Ask the studio owner for a new one.');
  if (status === 'expired') return new AppError(410, 'invitation_expired', 'This invitation has expired. Ask the studio owner to send it again.');
  return null;
}

const NOT_VALID = 'This invitation link is not valid. Open it from the e-mail again, or ask the studio owner for a new invitation.';

async function byToken(token: string, transaction?: Transaction): Promise<Invitation> {
  const inv = await Invitation.findOne({ where: { tokenHash: tokenHash(token) }, transaction, lock: transaction ? Transaction.LOCK.UPDATE : undefined });
  if (!inv) throw new AppError(404, 'invitation_not_found', NOT_VALID);
  return inv;
}

/** What an invitation link offers: studio, role and address. Anyone holding the link may ask. */
export async function invitationPublicGet(token: string): Promise<InvitationPublicView> {
  const inv = await byToken(token);
  const gone = linkGone(inv);
  if (gone) throw gone;
  const [name, names] = await Promise.all([studioName(inv.studioId), memberNames([inv.invitedBy])]);
  return { studioName: name, role: inv.role, email: inv.email, invitedBy: inv.invitedBy === null ? null : (names.get(inv.invitedBy) ?? null), expiresAt: inv.expiresAt.toISOString() };
}

/**
 * Accepts an invitation: creates the member with the invited role and the chosen name and
 * password, and uses up the link, in one transaction holding the invitation's row, so two
 * clicks on the same link make one member. Returns the new member's id.
 */
export async function invitationAccept(sequelize: Sequelize, token: string, input: InvitationAcceptInput): Promise<number> {
  const peek = await byToken(token);
  const studio = await studioName(peek.studioId);
  const problem = passwordProblem(input.password, { email: peek.email, studioName: studio });
  if (problem) throw new Invalid('Some fields need attention.', { password: problem });
  const hash = await passwordHash(input.password);
  try {
    return await sequelize.transaction(async (transaction) => {
      const inv = await byToken(token, transaction);
      const gone = linkGone(inv);
      if (gone) throw gone;
      const user = await User.create({ studioId: inv.studioId, email: inv.email, name: input.name, role: inv.role, passwordHash: hash }, { transaction });
      inv.set({ acceptedAt: new Date(), acceptedUserId: user.id });
      await inv.save({ transaction });
      return user.id;
    });
  } catch (err) {
    if (err instanceof UniqueConstraintError) {
      throw new AppError(409, 'email_taken', 'An account with this e-mail address already exists: sign in instead.');
    }
    throw err;
  }
}
