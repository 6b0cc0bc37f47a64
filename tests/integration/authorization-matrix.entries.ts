/**
 * The authorization matrix: one entry per route registered on the app (OWASP ASVS 5.0 §8.2.1
 * function-level and §8.2.2 data-specific access; OWASP Authorization Cheat Sheet, "Deny by
 * default"). authorization-matrix.test.ts fails when a route has no entry here, or an entry no
 * route. To add a route: append one entry to MATRIX_ENTRIES with
 *   - `method` and `route` exactly as Express registers them ('/api/clients/:id'),
 *   - the status expected for each caller: `anonymous`, `cutter` and `owner` of studio A, and
 *     `otherOwner`, the owner of studio B. A record of another studio is answered 404, never 403:
 *     when the route takes an id, build it from a record of studio A,
 *   - `request` (optional) to build the concrete path and body for one caller, e.g. create a
 *     fresh record per call for a destructive route. Use `fx.agentFresh(who)` when the call would
 *     end or replace the caller's shared session.
 * State-changing requests carry the CSRF header; the body defaults to `{}` for POST/PATCH/PUT.
 */
import type { Agent } from '../helpers/auth.js';
import { RECORDS_MATRIX_ENTRIES } from './authorization-matrix.records.js';
import { DRAFTS_MATRIX_ENTRIES } from './authorization-matrix.drafts.js';
import { MAIL_MATRIX_ENTRIES } from './authorization-matrix.mail.js';
import { UPLOADS_MATRIX_ENTRIES } from './authorization-matrix.uploads.js';
import { PRINT_MATRIX_ENTRIES } from './authorization-matrix.print.js';

export type Who = 'anonymous' | 'cutter' | 'owner' | 'otherOwner';
export const WHO: Who[] = ['anonymous', 'cutter', 'owner', 'otherOwner'];

export interface MatrixFixture {
  /** Studio A (the cutter's and owner's) and studio B (the other owner's). */
  studioId: number;
  otherStudioId: number;
  ownerId: number;
  cutterId: number;
  /** The shared agent of each caller (anonymous has no cookie). */
  agent: (who: Who) => Agent;
  /** A new agent signed in as that caller (anonymous: a new cookie-less agent). */
  agentFresh: (who: Who) => Promise<Agent>;
  /** A new member of studio A (default cutter), for routes that change or delete one. */
  memberCreate: (role?: 'owner' | 'cutter') => Promise<{ id: number; email: string; password: string }>;
  /** A unique e-mail address. */
  email: (label: string) => string;
  password: string;
}

export interface MatrixRequest {
  path?: string;
  body?: unknown;
  agent?: Agent;
}

export interface MatrixEntry {
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  route: string;
  expect: Record<Who, number>;
  request?: (fx: MatrixFixture, who: Who) => MatrixRequest | Promise<MatrixRequest>;
}

const everyone = (status: number): Record<Who, number> => ({ anonymous: status, cutter: status, owner: status, otherOwner: status });
const signedIn = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: status, owner: status, otherOwner: status });
/** Owner-only, not tied to a record: each owner acts on their own studio. */
const ownerOnly = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: 403, owner: status, otherOwner: status });
/** Owner-only on a record of studio A: studio B's owner must not learn it exists. */
const ownerRecord = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: 403, owner: status, otherOwner: 404 });

export const MATRIX_ENTRIES: MatrixEntry[] = [
  { method: 'GET', route: '/api/health', expect: everyone(200) },

  // Accounts (issue 3).
  {
    method: 'POST',
    route: '/api/auth/signup',
    expect: everyone(201),
    request: async (fx, who) => ({
      agent: await fx.agentFresh(who),
      body: { studioName: 'Matrix Knits', name: 'Matrix Owner', email: fx.email('matrix-signup'), password: fx.password },
    }),
  },
  {
    method: 'POST',
    route: '/api/auth/signin',
    expect: everyone(200),
    request: async (fx, who) => {
      const member = await fx.memberCreate('cutter');
      return { agent: await fx.agentFresh(who), body: { email: member.email, password: member.password } };
    },
  },
  { method: 'POST', route: '/api/auth/signout', expect: everyone(204), request: async (fx, who) => ({ agent: await fx.agentFresh(who) }) },
  { method: 'GET', route: '/api/auth/me', expect: signedIn(200) },
  { method: 'PATCH', route: '/api/auth/me', expect: signedIn(200), request: () => ({ body: { name: 'Renamed In Matrix' } }) },
  { method: 'GET', route: '/api/studio', expect: ownerOnly(200) },
  { method: 'PATCH', route: '/api/studio', expect: ownerOnly(200), request: () => ({ body: { defaultPaper: 'a4' } }) },
  { method: 'GET', route: '/api/studio/members', expect: ownerOnly(200) },
  {
    method: 'PATCH',
    route: '/api/studio/members/:id',
    expect: ownerRecord(200),
    request: async (fx) => ({ path: `/api/studio/members/${(await fx.memberCreate()).id}`, body: { role: 'owner' } }),
  },
  {
    method: 'DELETE',
    route: '/api/studio/members/:id',
    expect: ownerRecord(204),
    request: async (fx) => ({ path: `/api/studio/members/${(await fx.memberCreate()).id}` }),
  },

  // Records: clients, measurement sets, fabrics (issue 5).
  ...RECORDS_MATRIX_ENTRIES,

  // Drafting: styles, blocks, drafts, revisions, states, the work queue (issue 6).
  ...DRAFTS_MATRIX_ENTRIES,

  // E-mail: invitations, password reset, sent mail, sending work (issue 8).
  ...MAIL_MATRIX_ENTRIES,

  // Uploads: fitting photos and fabric swatches (issue 8).
  ...UPLOADS_MATRIX_ENTRIES,

  // Printing: a draft's PDF (issue 7).
  ...PRINT_MATRIX_ENTRIES,
];
