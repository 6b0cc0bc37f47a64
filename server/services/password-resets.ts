import { Op, Transaction, type Sequelize } from 'sequelize';
import type { Logger } from 'pino';
import { RESET_MINUTES, type ResetRequestResponse } from '../../shared/schemas/mail.js';
import { passwordProblem } from '../auth/common-passwords.js';
import { signInFailuresClear } from '../auth/throttle.js';
import { AppError, Invalid, TooManyRequests } from '../lib/errors.js';
import { passwordHash } from '../lib/password.js';
import { PasswordReset, Session, Studio, User } from '../models/index.js';
import { passwordResetMessage } from '../mail/messages.js';
import { mailSendLater, type MailEnv } from '../mail/send.js';
import { mailThrottleHit } from '../mail/throttle.js';
import { tokenCreate, tokenHash } from '../mail/token.js';

/** The one answer to every reset request (OWASP Forgot Password Cheat Sheet: same response for existing and non-existing accounts). */
export const RESET_REQUESTED_MESSAGE =
  'If this address belongs to a Knitwright account, a message with a link to choose a new password is on its way. The link works once, within an hour.';

const MINUTE_MS = 60 * 1000;

/** Makes the link (replacing any earlier unused one) and mails it. */
async function resetIssue(env: MailEnv, logger: Logger, user: User): Promise<void> {
  const { token, hash } = tokenCreate();
  const expiresAt = new Date(Math.floor(Date.now() / 1000) * 1000 + RESET_MINUTES * MINUTE_MS);
  await env.sequelize.transaction(async (transaction) => {
    await PasswordReset.update({ usedAt: new Date() }, { where: { userId: user.id, usedAt: null }, transaction });
    await PasswordReset.create({ userId: user.id, tokenHash: hash, expiresAt }, { transaction });
  });
  const studio = (user as User & { studio?: Studio }).studio;
  const studioName = studio?.name ?? 'Knitwright';
  const message = passwordResetMessage({ studioName, name: user.name, url: `${env.origin}/reset-password/${token}`, expiresAt });
  mailSendLater(env.mailer, { studioId: user.studioId, studioName, kind: 'password_reset', to: user.email, ...message }, logger);
}

/**
 * Asks for a reset link. The answer, and the work done before it, are the same whether or not
 * the address has an account: the link is made and mailed after the answer, and the
 * per-address limit counts unknown addresses too. Too many requests from one client address
 * answer 429.
 */
export async function resetRequest(env: MailEnv, logger: Logger, email: string, ip: string): Promise<ResetRequestResponse> {
  if (!(await mailThrottleHit(env.sequelize, 'resetPerIp', ip))) {
    throw new TooManyRequests('Too many password-reset requests from this network. Wait an hour and try again.');
  }
  const withinLimit = await mailThrottleHit(env.sequelize, 'resetPerAddress', email);
  const user = await User.findOne({ where: { email }, include: [{ model: Studio, as: 'studio' }] });
  if (withinLimit && user && !user.disabled) {
    resetIssue(env, logger, user).catch((err: unknown) => logger.error({ err }, 'password-reset link not issued'));
  }
  return { message: RESET_REQUESTED_MESSAGE };
}

function linkGone(reset: PasswordReset | null): AppError | null {
  if (!reset) return new AppError(404, 'reset_not_found', 'This password-reset link is not valid. Ask for a new one from the sign-in page.');
  if (reset.usedAt) return new AppError(410, 'reset_used', 'This password-reset link has already been used, or a newer one was sent. Ask for a new one if you still need it.');
  if (reset.expiresAt.getTime() <= Date.now()) return new AppError(410, 'reset_expired', 'This password-reset link has expired (links work for an hour). Ask for a new one from the sign-in page.');
  return null;
}

/** Whether a reset link can still be used (for the page that asks for the new password). */
export async function resetCheck(token: string): Promise<{ email: string }> {
  const reset = await PasswordReset.findOne({ where: { tokenHash: tokenHash(token) } });
  const gone = linkGone(reset);
  if (gone) throw gone;
  const user = await User.findByPk(reset!.userId, { attributes: ['email', 'disabled'] });
  if (!user || user.disabled) throw linkGone(null)!;
  return { email: user.email };
}

/**
 * Sets a new password through a reset link: the link is used up, the member's sign-in
 * failures are forgotten and every session of theirs ends, on every app server (ASVS 5.0
 * §7.4.3). The member then signs in with the new password.
 */
export async function resetConfirm(sequelize: Sequelize, token: string, password: string): Promise<void> {
  const hash = tokenHash(token);
  const peek = await PasswordReset.findOne({ where: { tokenHash: hash } });
  const early = linkGone(peek);
  if (early) throw early;
  const user = await User.findByPk(peek!.userId, { include: [{ model: Studio, as: 'studio' }] });
  if (!user || user.disabled) throw linkGone(null)!;
  const studio = (user as User & { studio?: Studio }).studio;
  const problem = passwordProblem(password, { email: user.email, studioName: studio?.name });
  if (problem) throw new Invalid('Some fields need attention.', { password: problem });
  const newHash = await passwordHash(password);
  await sequelize.transaction(async (transaction) => {
    const reset = await PasswordReset.findOne({ where: { tokenHash: hash }, transaction, lock: Transaction.LOCK.UPDATE });
    const gone = linkGone(reset);
    if (gone) throw gone;
    reset!.usedAt = new Date();
    await reset!.save({ transaction });
    const member = await User.findByPk(user.id, { transaction, lock: Transaction.LOCK.UPDATE });
    if (!member) throw linkGone(null)!;
    member.passwordHash = newHash;
    await member.save({ transaction });
    await PasswordReset.update({ usedAt: new Date() }, { where: { userId: user.id, usedAt: null, id: { [Op.ne]: reset!.id } }, transaction });
    await Session.destroy({ where: { userId: user.id }, transaction });
  });
  await signInFailuresClear(sequelize, user.email);
}
