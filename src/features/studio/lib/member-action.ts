import type { MemberUpdateInput, MemberView, Role } from '@shared/schemas/auth';

/** One change an owner can make to a member, asked about before it is made. */
export type MemberAction =
  | { kind: 'role'; member: MemberView; role: Role }
  | { kind: 'disable'; member: MemberView }
  | { kind: 'enable'; member: MemberView }
  | { kind: 'remove'; member: MemberView };

export interface MemberActionText {
  title: string;
  description: string;
  confirmLabel: string;
  tone: 'primary' | 'danger';
  /** Said once the server has made the change. */
  done: string;
}

/** The words of the confirmation for `action`; `self` when the owner acts on their own account. */
export function memberActionText(action: MemberAction, self: boolean): MemberActionText {
  const name = action.member.name;
  switch (action.kind) {
    case 'role':
      return action.role === 'owner'
        ? {
            title: `Make ${name} an owner?`,
            description: `Owners manage members and the studio's defaults, change measurements and approve drafts. ${name} gets that access at once.`,
            confirmLabel: 'Make owner',
            tone: 'primary',
            done: `${name} is now an owner.`,
          }
        : {
            title: self ? 'Make yourself a cutter?' : `Make ${name} a cutter?`,
            description: self
              ? 'You will no longer manage the team or the studio defaults, and this screen closes to you. Another owner can make you an owner again.'
              : `Cutters cut and finish approved drafts; they cannot change measurements, approve drafts or manage the team. The change takes effect at once.`,
            confirmLabel: 'Make cutter',
            tone: self ? 'danger' : 'primary',
            done: `${name} is now a cutter.`,
          };
    case 'disable':
      return {
        title: `Disable ${name}'s account?`,
        description: `${name} is signed out on every device at once and cannot sign in until an owner enables the account again.`,
        confirmLabel: 'Disable account',
        tone: 'danger',
        done: `${name}'s account is disabled.`,
      };
    case 'enable':
      return {
        title: `Enable ${name}'s account?`,
        description: `${name} can sign in again with their e-mail and password.`,
        confirmLabel: 'Enable account',
        tone: 'primary',
        done: `${name}'s account is enabled.`,
      };
    case 'remove':
      return {
        title: `Remove ${name} from the studio?`,
        description: `${name} loses access to the studio at once. This cannot be undone from here.`,
        confirmLabel: `Remove ${name}`,
        tone: 'danger',
        done: `${name} was removed from the studio.`,
      };
  }
}

/** The request body for a change (removal has none). */
export function memberActionChanges(action: Exclude<MemberAction, { kind: 'remove' }>): MemberUpdateInput {
  if (action.kind === 'role') return { role: action.role };
  return { disabled: action.kind === 'disable' };
}
