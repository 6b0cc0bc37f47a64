/**
 * Every route registered on the app, called as each kind of caller, answers the status its entry
 * in authorization-matrix.entries.ts states (OWASP ASVS 5.0 §8.2.1, §8.2.2, §8.3.1: checked on the
 * server for every function and record; OWASP Authorization Cheat Sheet, "Deny by default").
 */
import type { Express } from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { passwordHash } from '../../server/lib/password.js';
import { User } from '../../server/models/index.js';
import { csrfHeaders, memberAdd, signIn, studioSignUp, TEST_PASSWORD, uniqueEmail, type Agent } from '../helpers/auth.js';
import { testAppCreate } from '../helpers/test-app.js';
import { MATRIX_ENTRIES, WHO, type MatrixFixture, type Who } from './authorization-matrix.entries.js';

interface Layer {
  route?: { path: unknown; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
  rawPath?: unknown;
}

function pathJoin(prefix: string, path: unknown): string {
  const p = Array.isArray(path) ? path.join('|') : String(path);
  if (p === '/' || p === '') return prefix || '/';
  return `${prefix}${p}`;
}

/** Walks Express 5's router stack (nested routers included) and lists `METHOD /path` pairs. */
export function routesRegistered(app: Express): { method: string; route: string }[] {
  const out: { method: string; route: string }[] = [];
  const walk = (stack: Layer[], prefix: string): void => {
    for (const layer of stack) {
      if (layer.route) {
        for (const [method, on] of Object.entries(layer.route.methods)) {
          if (on) out.push({ method: method === '_all' ? 'ALL' : method.toUpperCase(), route: pathJoin(prefix, layer.route.path) });
        }
      } else if (Array.isArray(layer.handle?.stack)) {
        if (layer.rawPath === undefined) throw new Error('router layer without rawPath: cannot tell its mount path');
        walk(layer.handle.stack, pathJoin(prefix, layer.rawPath));
      }
    }
  };
  const router = (app as unknown as { router?: { stack: Layer[] } }).router;
  if (!router) throw new Error('app.router is missing: is this Express 5?');
  walk(router.stack, '');
  return out;
}

const key = (r: { method: string; route: string }) => `${r.method} ${r.route}`;

const { app, close } = testAppCreate();
afterAll(close);

let fx: MatrixFixture;

beforeAll(async () => {
  const a = await studioSignUp(app, { studioName: 'Matrix Studio A' });
  const cutter = await memberAdd(app, a.studio.id, 'cutter');
  const b = await studioSignUp(app, { studioName: 'Matrix Studio B' });
  const agents: Record<Who, Agent> = { anonymous: request.agent(app), cutter: cutter.agent, owner: a.agent, otherOwner: b.agent };
  const emails: Record<Exclude<Who, 'anonymous'>, string> = { cutter: cutter.email, owner: a.email, otherOwner: b.email };
  const hash = passwordHash(TEST_PASSWORD);
  fx = {
    studioId: a.studio.id,
    otherStudioId: b.studio.id,
    ownerId: a.owner.id,
    cutterId: cutter.member.id,
    agent: (who) => agents[who],
    agentFresh: async (who) => (who === 'anonymous' ? request.agent(app) : signIn(app, emails[who], TEST_PASSWORD)),
    memberCreate: async (role = 'cutter') => {
      const email = uniqueEmail('matrix-member');
      const user = await User.create({ studioId: a.studio.id, email, name: 'Matrix Member', role, passwordHash: await hash });
      return { id: user.id, email, password: TEST_PASSWORD };
    },
    email: uniqueEmail,
    password: TEST_PASSWORD,
  };
});

describe('authorization matrix', () => {
  it('has exactly one entry for every registered route', () => {
    const registered = routesRegistered(app).filter((r) => r.route.startsWith('/api'));
    const entries = MATRIX_ENTRIES.map(key);
    const missing = registered.map(key).filter((k) => !entries.includes(k));
    const stale = entries.filter((k) => !registered.map(key).includes(k));
    const duplicated = entries.filter((k, i) => entries.indexOf(k) !== i);
    expect({ missing, stale, duplicated }).toEqual({ missing: [], stale: [], duplicated: [] });
    // The walk itself must see the nested routers, or the check above proves nothing.
    expect(registered.map(key)).toEqual(expect.arrayContaining(['GET /api/health', 'PATCH /api/studio/members/:id']));
  });

  const cases = MATRIX_ENTRIES.flatMap((entry) => WHO.map((who) => ({ entry, who, status: entry.expect[who] })));
  it.each(cases)('$entry.method $entry.route as $who → $status', async ({ entry, who, status }) => {
    const built = (await entry.request?.(fx, who)) ?? {};
    const agent = built.agent ?? fx.agent(who);
    const path = built.path ?? entry.route;
    expect(path, 'a route with parameters needs a request() building a concrete path').not.toMatch(/[:*]/);
    const method = entry.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
    let req = agent[method](path);
    if (entry.method !== 'GET') req = req.set(csrfHeaders);
    const body = built.body ?? (['POST', 'PATCH', 'PUT'].includes(entry.method) ? {} : undefined);
    const res = body === undefined ? await req : await req.send(body as object);
    expect(res.status, JSON.stringify(res.body)).toBe(status);
    if (status >= 400) expect(res.body).toEqual({ error: expect.objectContaining({ code: expect.any(String), message: expect.any(String) }) });
  });
});
