/**
 * Accounts for integration tests: a fresh studio with its signed-in owner, members of any role,
 * and the header every state-changing request must carry.
 *
 *   const { agent, studio } = await studioSignUp(app);
 *   const cutter = await memberAdd(app, studio.id, 'cutter');
 *   await agent.post('/api/clients').set(csrfHeaders).send({ ... });
 */
import type { Express } from 'express';
import request from 'supertest';
import { passwordHash } from '../../server/lib/password.js';
import { User } from '../../server/models/index.js';
import type { MeResponse, MeUser, Role, SignUpInput, StudioView } from '../../shared/schemas/auth.js';

/** The custom header of the CSRF defence (OWASP CSRF Prevention Cheat Sheet): send it on POST/PATCH/PUT/DELETE. */
export const csrfHeaders = { 'X-Requested-With': 'XMLHttpRequest' } as const;

/** A supertest agent that keeps the session cookie between requests. */
export type Agent = ReturnType<typeof request.agent>;

/** A password that passes every rule (length, not a common password). */
export const TEST_PASSWORD = 'plum-selvage-ribbing-42';

let sequence = 0;

/** A unique, valid e-mail address for this test process. */
export function uniqueEmail(label = 'member'): string {
  sequence += 1;
  return `${label}-${process.pid}-${Date.now().toString(36)}-${sequence}@studio.example`;
}

/**
 * A fresh client address for requests that make sign-in failures: send it as X-Forwarded-For
 * (the app trusts loopback proxies) so the per-address throttle of one test never blocks another.
 */
export function testIp(): string {
  sequence += 1;
  return `10.${process.pid % 250}.${Math.floor(sequence / 250) % 250}.${(sequence % 250) + 1}`;
}

/** The session cookie from a response's Set-Cookie header (`name=value` only), or undefined. */
export function sessionCookieOf(setCookie: string[] | string | undefined): string | undefined {
  const list = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  return list.find((c) => /^(__Host-)?knitwright\.sid=/.test(c))?.split(';')[0];
}

export interface SignedUpStudio {
  /** Signed in as the studio's owner. */
  agent: Agent;
  owner: MeUser;
  studio: StudioView;
  email: string;
  password: string;
  /** The session cookie as `name=value`, for replaying it outside the agent. */
  cookie: string;
}

/** Signs up a new studio through `POST /api/auth/signup`; the agent is signed in as its owner. */
export async function studioSignUp(app: Express, overrides: Partial<SignUpInput> = {}): Promise<SignedUpStudio> {
  const body: SignUpInput = {
    studioName: 'Fernhill Knit Studio',
    name: 'Maren Holt',
    email: uniqueEmail('owner'),
    password: TEST_PASSWORD,
    ...overrides,
  };
  const agent = request.agent(app);
  const res = await agent.post('/api/auth/signup').set(csrfHeaders).send(body);
  if (res.status !== 201) throw new Error(`studioSignUp: expected 201, got ${res.status} ${JSON.stringify(res.body)}`);
  const me = res.body as MeResponse;
  const cookie = sessionCookieOf(res.headers['set-cookie']);
  if (!cookie) throw new Error('studioSignUp: no session cookie in the answer');
  return { agent, owner: me.user, studio: me.studio, email: body.email, password: body.password, cookie };
}

export interface AddedMember {
  /** Signed in as the new member (not signed in when the member was created disabled). */
  agent: Agent;
  member: MeUser;
  email: string;
  password: string;
}

let testHash: Promise<string> | undefined;

/**
 * Adds a member to a studio straight in the database (as an accepted invitation would), then
 * signs them in through `POST /api/auth/signin`.
 */
export async function memberAdd(
  app: Express,
  studioId: number,
  role: Role = 'cutter',
  overrides: { name?: string; email?: string; disabled?: boolean } = {},
): Promise<AddedMember> {
  testHash ??= passwordHash(TEST_PASSWORD);
  const email = overrides.email ?? uniqueEmail(role);
  const user = await User.create({
    studioId,
    email,
    name: overrides.name ?? (role === 'owner' ? 'Idris Penrose' : 'Suki Lang'),
    role,
    passwordHash: await testHash,
    disabled: overrides.disabled ?? false,
  });
  const agent = overrides.disabled ? request.agent(app) : await signIn(app, email, TEST_PASSWORD);
  return { agent, member: { id: user.id, email, name: user.name, role }, email, password: TEST_PASSWORD };
}

/** Signs in through `POST /api/auth/signin` and returns the agent holding the session cookie. */
export async function signIn(app: Express, email: string, password: string): Promise<Agent> {
  const agent = request.agent(app);
  const res = await agent.post('/api/auth/signin').set(csrfHeaders).send({ email, password });
  if (res.status !== 200) throw new Error(`signIn: expected 200, got ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}
