import { Op, UniqueConstraintError, type Sequelize } from 'sequelize';
import type { MeResponse, ProfileUpdateInput, SignUpInput, StudioView } from '../../shared/schemas/auth.js';
import { passwordProblem } from '../auth/common-passwords.js';
import { signInBlocked, signInFailureRecord, signInFailuresClear } from '../auth/throttle.js';
import { AppError, Invalid, NotFound, TooManyRequests } from '../lib/errors.js';
import { passwordHash, passwordVerify, PASSWORD_HASH_OPTIONS } from '../lib/password.js';
import { Session, Studio, User } from '../models/index.js';
import type { ServiceContext, SessionUser } from './context.js';

/** The one answer for an unknown e-mail and a wrong password alike (ASVS 5.0 §6.3.8). */
export const SIGN_IN_FAILED_MESSAGE = 'The e-mail or the password is not right.';

export function studioView(studio: Studio): StudioView {
  return {
    id: studio.id,
    name: studio.name,
    defaultUnit: studio.defaultUnit,
    defaultPaper: studio.defaultPaper as StudioView['defaultPaper'],
    seamAllowanceMm: studio.seamAllowanceMm,
    hemAllowanceMm: studio.hemAllowanceMm,
    bindingRatio: studio.bindingRatio,
  };
}

function meView(user: User, studio: Studio): MeResponse {
  return { user: { id: user.id, email: user.email, name: user.name, role: user.role }, studio: studioView(studio) };
}

function sessionUser(user: User, studio: Studio): SessionUser {
  return { id: user.id, studioId: user.studioId, role: user.role, email: user.email, name: user.name, unit: studio.defaultUnit };
}

function emailTaken(): AppError {
  const message = 'An account with this e-mail already exists: sign in instead';
  return new AppError(409, 'email_taken', message, { email: message });
}

/** Creates a studio and its first owner in one transaction. */
export async function signUp(sequelize: Sequelize, input: SignUpInput): Promise<{ user: SessionUser; me: MeResponse }> {
  const problem = passwordProblem(input.password, { email: input.email, studioName: input.studioName });
  if (problem) throw new Invalid('Some fields need attention.', { password: problem });
  const hash = await passwordHash(input.password);
  try {
    return await sequelize.transaction(async (transaction) => {
      if (await User.findOne({ where: { email: input.email }, attributes: ['id'], transaction })) throw emailTaken();
      const studio = await Studio.create({ name: input.studioName }, { transaction });
      const user = await User.create(
        { studioId: studio.id, email: input.email, name: input.name, role: 'owner', passwordHash: hash },
        { transaction },
      );
      return { user: sessionUser(user, studio), me: meView(user, studio) };
    });
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw emailTaken();
    throw err;
  }
}

let dummyHash: Promise<string> | undefined;

/** Computes the dummy hash ahead of the first sign-in, so that one is not slower either. */
export function signInPrepare(): Promise<string> {
  dummyHash ??= passwordHash(`no such member ${PASSWORD_HASH_OPTIONS.memoryCost}`);
  return dummyHash;
}

/**
 * Checks an e-mail and password. An unknown e-mail is verified against a dummy hash with the
 * same parameters, so both failures cost the same time (OWASP Authentication Cheat Sheet,
 * "Authentication and error messages"). Throttled per account and per address.
 */
export async function credentialsCheck(
  sequelize: Sequelize,
  email: string,
  password: string,
  ip: string,
): Promise<SessionUser | false> {
  if (await signInBlocked(sequelize, email, ip)) throw new TooManyRequests();
  const dummy = signInPrepare();
  const user = await User.findOne({ where: { email }, include: [{ model: Studio, as: 'studio' }] });
  const ok = await passwordVerify(user?.passwordHash ?? (await dummy), password);
  if (!user || !ok) {
    await signInFailureRecord(sequelize, email, ip);
    return false;
  }
  await signInFailuresClear(sequelize, email);
  if (user.disabled) throw new AppError(403, 'account_disabled', 'This account has been disabled by the studio owner.');
  return sessionUser(user, studioOf(user));
}

function studioOf(user: User): Studio {
  const studio = (user as User & { studio?: Studio }).studio;
  if (!studio) throw new Error(`user ${user.id} has no studio loaded`);
  return studio;
}

/** The member behind a session, read fresh on every request; null when gone or disabled. */
export async function sessionUserLoad(id: unknown): Promise<SessionUser | null> {
  if (typeof id !== 'number' || !Number.isSafeInteger(id)) return null;
  const user = await User.findByPk(id, { include: [{ model: Studio, as: 'studio' }] });
  if (!user || user.disabled) return null;
  return sessionUser(user, studioOf(user));
}

async function memberLoad(c: ServiceContext): Promise<User> {
  const user = await User.findOne({
    where: { id: c.userId, studioId: c.studioId },
    include: [{ model: Studio, as: 'studio' }],
    transaction: c.transaction,
  });
  if (!user) throw new NotFound('member');
  return user;
}

export async function meGet(c: ServiceContext): Promise<MeResponse> {
  const user = await memberLoad(c);
  return meView(user, studioOf(user));
}

/**
 * Changes the member's name and/or password. A new password needs the current one (ASVS 5.0
 * §6.2.3) and ends the member's other sessions (ASVS 5.0 §7.4.3); `keepSid` is the session
 * making the change.
 */
export async function profileUpdate(
  sequelize: Sequelize,
  c: ServiceContext,
  input: ProfileUpdateInput,
  origin: { ip: string; keepSid: string },
): Promise<MeResponse> {
  const user = await memberLoad(c);
  const studio = studioOf(user);
  if (input.newPassword !== undefined && input.currentPassword !== undefined) {
    if (await signInBlocked(sequelize, user.email, origin.ip)) throw new TooManyRequests();
    if (!(await passwordVerify(user.passwordHash, input.currentPassword))) {
      await signInFailureRecord(sequelize, user.email, origin.ip);
      throw new Invalid('Some fields need attention.', { currentPassword: 'Current password is not right' });
    }
    const problem = passwordProblem(input.newPassword, { email: user.email, studioName: studio.name });
    if (problem) throw new Invalid('Some fields need attention.', { newPassword: problem });
    user.passwordHash = await passwordHash(input.newPassword);
  }
  if (input.name !== undefined) user.name = input.name;
  if (user.changed()) {
    await user.save();
    if (input.newPassword !== undefined) await Session.destroy({ where: { userId: user.id, sid: { [Op.ne]: origin.keepSid } } });
  }
  return meView(user, studio);
}

/** Ends every session of one member, on every app server (sessions live in the database). */
export async function memberSessionsEnd(userId: number): Promise<number> {
  return Session.destroy({ where: { userId } });
}
