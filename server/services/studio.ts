import { Transaction, ForeignKeyConstraintError, type Sequelize } from 'sequelize';
import type { MemberUpdateInput, MemberView, MembersResponse, StudioUpdateInput, StudioView } from '../../shared/schemas/auth.js';
import { AppError, NotFound } from '../lib/errors.js';
import { Session, Studio, User } from '../models/index.js';
import { studioView } from './accounts.js';
import type { ServiceContext } from './context.js';

function memberView(user: User): MemberView {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    disabled: user.disabled,
    createdAt: user.createdAt.toISOString(),
  };
}

function lastOwner(): AppError {
  return new AppError(409, 'last_owner', 'The studio needs at least one active owner: make another member an owner first.');
}

async function studioLoad(c: ServiceContext, transaction?: Transaction): Promise<Studio> {
  const studio = await Studio.findByPk(c.studioId, { transaction: transaction ?? c.transaction });
  if (!studio) throw new NotFound('studio');
  return studio;
}

export async function studioGet(c: ServiceContext): Promise<StudioView> {
  return studioView(await studioLoad(c));
}

/** Changes the studio's name and defaults; every field is optional. */
export async function studioUpdate(c: ServiceContext, input: StudioUpdateInput): Promise<StudioView> {
  const studio = await studioLoad(c);
  studio.set(input);
  if (studio.changed()) await studio.save({ transaction: c.transaction });
  return studioView(studio);
}

export async function membersList(c: ServiceContext): Promise<MembersResponse> {
  const users = await User.findAll({ where: { studioId: c.studioId }, order: [['name', 'ASC'], ['id', 'ASC']], transaction: c.transaction });
  return { members: users.map(memberView) };
}

/**
 * Loads a member of the caller's studio, locking the studio's owner rows so two owners cannot
 * demote each other at the same moment and leave none. Another studio's member is not found.
 */
async function memberLockedLoad(c: ServiceContext, id: number, transaction: Transaction): Promise<{ member: User; activeOwners: number }> {
  const owners = await User.findAll({
    where: { studioId: c.studioId, role: 'owner' },
    lock: Transaction.LOCK.UPDATE,
    transaction,
  });
  const member = await User.findOne({ where: { id, studioId: c.studioId }, transaction });
  if (!member) throw new NotFound('member');
  return { member, activeOwners: owners.filter((o) => !o.disabled).length };
}

function losesOwnership(member: User, next: { role: User['role']; disabled: boolean }): boolean {
  const isActiveOwner = member.role === 'owner' && !member.disabled;
  return isActiveOwner && (next.role !== 'owner' || next.disabled);
}

/**
 * Changes a member's role or disabled flag. Both take effect on the member's next request (the
 * member is re-read every time); disabling also ends all their sessions at once.
 */
export async function memberUpdate(sequelize: Sequelize, c: ServiceContext, id: number, input: MemberUpdateInput): Promise<MemberView> {
  return sequelize.transaction(async (transaction) => {
    const { member, activeOwners } = await memberLockedLoad(c, id, transaction);
    const next = { role: input.role ?? member.role, disabled: input.disabled ?? member.disabled };
    if (losesOwnership(member, next) && activeOwners <= 1) throw lastOwner();
    member.set(next);
    if (member.changed()) await member.save({ transaction });
    if (next.disabled) await Session.destroy({ where: { userId: member.id }, transaction });
    return memberView(member);
  });
}

/** Removes a member and their sessions. A member whose name is on studio records is refused: disable them instead. */
export async function memberRemove(sequelize: Sequelize, c: ServiceContext, id: number): Promise<void> {
  try {
    await sequelize.transaction(async (transaction) => {
      const { member, activeOwners } = await memberLockedLoad(c, id, transaction);
      if (losesOwnership(member, { role: 'cutter', disabled: true }) && activeOwners <= 1) throw lastOwner();
      await Session.destroy({ where: { userId: member.id }, transaction });
      await member.destroy({ transaction });
    });
  } catch (err) {
    if (err instanceof ForeignKeyConstraintError) {
      throw new AppError(409, 'member_has_records', 'This member is named on studio records and cannot be removed: disable the account instead.');
    }
    throw err;
  }
}
