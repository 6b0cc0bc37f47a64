import type { Role } from '../../shared/schemas/auth.js';
import { dateTimeWords, mailCompose } from './compose.js';

/** What a role does, in the words of the invitation. */
const ROLE_WORDS: Record<Role, string> = {
  owner: 'As an owner you run the studio account: clients, fittings, drafts, the team and the studio defaults.',
  cutter: 'As a cutter you see the approved drafts in the work queue, print patterns and tickets, and record what was cut and with which fabric.',
};

export function invitationMessage(v: { studioName: string; inviter: string | null; role: Role; url: string; expiresAt: Date }) {
  const who = v.inviter ? `${v.inviter} has invited you` : 'You are invited';
  return {
    subject: `Join ${v.studioName} on Knitwright`,
    ...mailCompose({
      greeting: 'Hello,',
      paragraphs: [`${who} to join ${v.studioName} on Knitwright as ${v.role === 'owner' ? 'an owner' : 'a cutter'}.`, ROLE_WORDS[v.role]],
      action: { label: 'Accept the invitation', url: v.url },
      after: [
        `The link works once, until ${dateTimeWords(v.expiresAt)}. Accepting it sets your name and password and signs you in.`,
        'If you were not expecting this invitation, ignore this message: nothing happens until the link is opened and accepted.',
      ],
      signature: v.studioName,
    }),
  };
}

export function passwordResetMessage(v: { studioName: string; name: string; url: string; expiresAt: Date }) {
  return {
    subject: 'Reset your Knitwright password',
    ...mailCompose({
      greeting: `Hello ${v.name},`,
      paragraphs: ['Someone, probably you, asked to reset the password of your Knitwright account.'],
      action: { label: 'Choose a new password', url: v.url },
      after: [
        `The link works once, until ${dateTimeWords(v.expiresAt)}. Choosing a new password signs you out on every device.`,
        'If you did not ask for this, ignore this message: your password stays as it is.',
      ],
      signature: v.studioName,
    }),
  };
}
