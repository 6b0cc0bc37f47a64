/**
 * Sessions: fixation, timeouts, ending a member's sessions, and the cookie's attributes.
 * OWASP ASVS 5.0 section numbers are quoted from memory of the 5.0 release; cheat sheets by name.
 */
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { appCreate } from '../../server/app.js';
import type { KnitwrightSessionStore } from '../../server/auth/session-store.js';
import { configLoad } from '../../server/config.js';
import { loggerCreate } from '../../server/lib/logger.js';
import { Session } from '../../server/models/index.js';
import { csrfHeaders, memberAdd, sessionCookieOf, studioSignUp, TEST_PASSWORD } from '../helpers/auth.js';
import { testAppCreate } from '../helpers/test-app.js';

const { app, sequelize, close } = testAppCreate();
afterAll(close);

const store = app.locals.sessionStore as KnitwrightSessionStore;
const HOUR_MS = 3_600_000;

async function sessionRows(userId: number): Promise<Session[]> {
  return Session.findAll({ where: { userId } });
}

describe('session id', () => {
  // ASVS 5.0 §7.2.4 (new session token on authentication); OWASP Session Management Cheat
  // Sheet, "Renew the Session ID After Any Privilege Level Change".
  it('is replaced on sign-in: the cookie held before signing in stops working', async () => {
    const a = await studioSignUp(app);
    const b = await studioSignUp(app);
    // b's browser, still holding a's session cookie, signs in as b.
    const res = await request(app).post('/api/auth/signin').set(csrfHeaders).set('Cookie', a.cookie).send({ email: b.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    const fresh = sessionCookieOf(res.headers['set-cookie']);
    expect(fresh).toBeDefined();
    expect(fresh).not.toBe(a.cookie);
    expect((await request(app).get('/api/auth/me').set('Cookie', a.cookie)).status).toBe(401);
    expect((await request(app).get('/api/auth/me').set('Cookie', fresh!)).body.user.id).toBe(b.owner.id);
  });

  it('is never taken from the client: an invented cookie is not adopted at sign-in', async () => {
    const a = await studioSignUp(app);
    const planted = 'knitwright.sid=s%3Aattacker-chosen-id.bad-signature';
    const res = await request(app).post('/api/auth/signin').set(csrfHeaders).set('Cookie', planted).send({ email: a.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(sessionCookieOf(res.headers['set-cookie'])).not.toContain('attacker-chosen-id');
    expect(await Session.count({ where: { sid: 'attacker-chosen-id' } })).toBe(0);
  });

  it('records the member on the session row so all of a member’s sessions can be found', async () => {
    const a = await studioSignUp(app);
    const rows = await sessionRows(a.owner.id);
    expect(rows).toHaveLength(1);
    expect(rows[0]!.data).not.toContain(TEST_PASSWORD);
    expect(JSON.parse(rows[0]!.data!)).toMatchObject({ passport: { user: a.owner.id }, signedInAt: expect.any(Number) });
  });
});

describe('timeouts', () => {
  // ASVS 5.0 §7.3.1 (inactivity timeout) — enforced by the server, not only by the cookie's expiry.
  it('refuses a session idle past its expiry even before the purge has run', async () => {
    const a = await studioSignUp(app);
    await Session.update({ expires: new Date(Date.now() - 1000) }, { where: { userId: a.owner.id } });
    expect((await a.agent.get('/api/auth/me')).status).toBe(401);
  });

  it('moves the idle expiry on with each request (rolling) by SESSION_IDLE_HOURS', async () => {
    const a = await studioSignUp(app);
    await Session.update({ expires: new Date(Date.now() + HOUR_MS) }, { where: { userId: a.owner.id } });
    const res = await a.agent.get('/api/auth/me');
    expect(res.status).toBe(200);
    const [row] = await sessionRows(a.owner.id);
    const idleMs = 12 * HOUR_MS;
    expect(Math.abs(row!.expires!.getTime() - (Date.now() + idleMs))).toBeLessThan(60_000);
    const cookie = String(res.headers['set-cookie']);
    const expires = Date.parse(/Expires=([^;]+)/.exec(cookie)![1]!);
    expect(Math.abs(expires - (Date.now() + idleMs))).toBeLessThan(60_000);
  });

  // ASVS 5.0 §7.3.2 (absolute maximum session lifetime); OWASP Session Management Cheat Sheet, "Absolute Timeout".
  it('ends a session signed in longer ago than SESSION_ABSOLUTE_DAYS, however active', async () => {
    const a = await studioSignUp(app);
    const [row] = await sessionRows(a.owner.id);
    const data = JSON.parse(row!.data!) as { signedInAt: number };
    data.signedInAt = Date.now() - 7 * 24 * HOUR_MS - 60_000;
    await Session.update({ data: JSON.stringify(data) }, { where: { sid: row!.sid } });
    expect((await a.agent.get('/api/auth/me')).status).toBe(401);
    expect(await Session.count({ where: { sid: row!.sid } })).toBe(0);
  });

  it('purges expired session rows from the database', async () => {
    const a = await studioSignUp(app);
    await Session.update({ expires: new Date(Date.now() - 1000) }, { where: { userId: a.owner.id } });
    const removed = await store.clearExpiredSessions();
    expect(removed).toBeGreaterThanOrEqual(1);
    expect(await sessionRows(a.owner.id)).toHaveLength(0);
  });
});

describe('role and disabled flag read on every request', () => {
  // ASVS 5.0 §7.4.2 (disabling an account ends its sessions).
  it('ends every session of a member the owner disables; their old cookie gets 401', async () => {
    const owner = await studioSignUp(app);
    const cutter = await memberAdd(app, owner.studio.id, 'cutter');
    const again = await request.agent(app).post('/api/auth/signin').set(csrfHeaders).send({ email: cutter.email, password: TEST_PASSWORD });
    expect(again.status).toBe(200);
    expect(await sessionRows(cutter.member.id)).toHaveLength(2);

    const res = await owner.agent.patch(`/api/studio/members/${cutter.member.id}`).set(csrfHeaders).send({ disabled: true });
    expect(res.status).toBe(200);
    expect(await sessionRows(cutter.member.id)).toHaveLength(0);
    expect((await cutter.agent.get('/api/auth/me')).status).toBe(401);
    expect((await request(app).get('/api/auth/me').set('Cookie', sessionCookieOf(again.headers['set-cookie'])!)).status).toBe(401);
  });

  // ASVS 5.0 §8.3.1 (authorization decided on the server from current data).
  it('applies a role change on the member’s very next request', async () => {
    const owner = await studioSignUp(app);
    const cutter = await memberAdd(app, owner.studio.id, 'cutter');
    expect((await cutter.agent.get('/api/studio')).status).toBe(403);
    await owner.agent.patch(`/api/studio/members/${cutter.member.id}`).set(csrfHeaders).send({ role: 'owner' });
    expect((await cutter.agent.get('/api/studio')).status).toBe(200);
    await owner.agent.patch(`/api/studio/members/${cutter.member.id}`).set(csrfHeaders).send({ role: 'cutter' });
    expect((await cutter.agent.get('/api/studio')).status).toBe(403);
  });
});

describe('cookie attributes', () => {
  function appWith(env: Record<string, string>) {
    const config = configLoad({ ...process.env, DB_NAME: process.env.DB_NAME ?? 'knitwright_test', KW_LOCAL_PRODUCTION: '1', ...env });
    return appCreate({ config, sequelize, logger: loggerCreate({ ...config, LOG_LEVEL: 'silent' }) });
  }

  // ASVS 5.0 §3.3.1 (Secure), §3.3.2 (SameSite), §3.3.3 (__Host- prefix), §3.3.4 (HttpOnly);
  // OWASP Session Management Cheat Sheet, "Cookies"; OWASP HTTP Headers Cheat Sheet (HSTS).
  it('in production: __Host- prefix, Secure, HttpOnly, SameSite=Lax, Path=/, no Domain; HSTS sent', async () => {
    const prod = appWith({ NODE_ENV: 'production', SECURE_COOKIES: '1' });
    const a = await studioSignUp(app);
    const res = await request(prod)
      .post('/api/auth/signin')
      .set(csrfHeaders)
      .set('X-Forwarded-Proto', 'https')
      .send({ email: a.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    const cookie = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('__Host-knitwright.sid='));
    expect(cookie).toBeDefined();
    const attrs = cookie!.split(/;\s*/).slice(1).map((s) => s.split('=')[0]!.toLowerCase());
    expect(attrs).toEqual(expect.arrayContaining(['path', 'expires', 'httponly', 'secure', 'samesite']));
    expect(attrs).not.toContain('domain');
    expect(cookie).toMatch(/; Path=\/;/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(res.headers['strict-transport-security']).toMatch(/max-age=\d+/);
  });

  it('in production with SECURE_COOKIES=0 (npm start on plain http): no Secure, no prefix, still HttpOnly and SameSite=Lax', async () => {
    const local = appWith({ NODE_ENV: 'production', SECURE_COOKIES: '0' });
    const a = await studioSignUp(app);
    const res = await request(local).post('/api/auth/signin').set(csrfHeaders).send({ email: a.email, password: TEST_PASSWORD });
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/^knitwright\.sid=.*; HttpOnly; SameSite=Lax$/);
    expect(cookie).not.toMatch(/Secure/);
  });

  it('outside production the cookie is HttpOnly and SameSite=Lax', async () => {
    const a = await studioSignUp(app);
    const res = await request(app).post('/api/auth/signin').set(csrfHeaders).send({ email: a.email, password: TEST_PASSWORD });
    expect(String(res.headers['set-cookie'])).toMatch(/^knitwright\.sid=[^;]+; Path=\/; Expires=[^;]+; HttpOnly; SameSite=Lax$/);
  });
});
