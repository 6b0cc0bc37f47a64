import type { Role } from '@shared/schemas/auth';

/** The role as screens say it. */
export const ROLE_LABEL: Record<Role, string> = { owner: 'Owner', cutter: 'Cutter' };

/** What each role may do, in a sentence (product brief, "Who uses it"). */
export const ROLE_SUMMARY: Record<Role, string> = {
  owner:
    'You run the studio account: members and studio defaults, fittings and measurements, drafting and approving, and everything a cutter does.',
  cutter:
    'You cut and finish approved drafts: print patterns and tickets and record what was cut with which fabric. You can read client measurements; changing them, approving drafts and managing the team are for owners.',
};
