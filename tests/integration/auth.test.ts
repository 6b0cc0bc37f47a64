/**
 * Sign-up, sign-in, sign-out and the member's profile.
 * Requirements are sourced beside each check: OWASP ASVS 5.0 section numbers are quoted from
 * memory of the 5.0 release (requirement text paraphrased); cheat sheets by their names.
 */
import argon2 from 'argon2';
import request from 'supertest';
import { afterAll, describe, expect, it, vi } from 'vitest';
import { User } from '../../server/models/index.js';
import { csrfHeaders, memberAdd, sessionCookieOf, studioSignUp, TEST_PASSWORD, testIp, uniqueEmail } from '../helpers/auth.js';
import { testAppCreate } from '../helpers/test-app.js';

const { app, close } = testAppCreate();
afterAll(close);

describe('sign-up', () => {
  it('creates a studio and its owner, signs the owner in and answers MeResponse', async () => {
    const email = uniqueEmail('signup');
    const agent = request.agent(app);
    const res = await agent
      .post('/api/auth/signup')
      .set(csrfHeaders)
      .send({ studioName: 'Saltmarsh Knits', name: 'Odile Brand', email: email.toUpperCase(), password: TEST_PASSWORD });
    expect(res.status).toBe(201);
    expect(res.body).toEqual({
      user: { id: expect.any(Number), email, name: 'Odile Brand', role: 'owner' },
      studio: {
        id: expect.any(Number),
        name: 'Saltmarsh Knits',
        defaultUnit: 'in',
        defaultPaper: 'letter',
        seamAllowanceMm: 6.35,
        hemAllowanceMm: 12.7,
        bindingRatio: 1,
      },
    });
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body).toEqual(res.body);
  });

  it('refuses an e-mail that already has an account, naming the field', async () => {
    const { email } = await studioSignUp(app);
    const res = await request(app)
      .post('/api/auth/signup')
      .set(csrfHeaders)
      .send({ studioName: 'Second', name: 'Someone', email, password: TEST_PASSWORD });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'email_taken', fields: { email: expect.any(String) } });
  });

  // ASVS 5.0 §6.2.4 (refuse the most common passwords); NIST SP 800-63B §3.1.1.2.
  it.each(['password123', 'iloveyou', 'Qwerty123', 'baseball1', '1q2w3e4r5t'])('refuses the common password %s and writes nothing', async (password) => {
    const email = uniqueEmail('common');
    const res = await request(app).post('/api/auth/signup').set(csrfHeaders).send({ studioName: 'Nettle & Co', name: 'Pia', email, password });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ password: expect.stringMatching(/common/) });
    expect(await User.count({ where: { email } })).toBe(0);
  });

  // ASVS 5.0 §6.2.11 (context-specific words).
  it('refuses the e-mail address as a password', async () => {
    const email = uniqueEmail('same');
    const res = await request(app).post('/api/auth/signup').set(csrfHeaders).send({ studioName: 'Mossway', name: 'Lin', email, password: email });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.password).toMatch(/e-mail/);
  });

  // ASVS 5.0 §6.2.5 (no composition rules), §6.2.9 (64+ characters allowed), §6.2.8 (kept as typed).
  it('accepts a long passphrase without composition rules, with spaces and non-ASCII letters', async () => {
    const password = 'the ribbing on ma tante’s cardigan never curls ' + 'ü'.repeat(60);
    const { email, agent } = await studioSignUp(app, { password });
    await agent.post('/api/auth/signout').set(csrfHeaders);
    const ok = await request(app).post('/api/auth/signin').set(csrfHeaders).send({ email, password });
    expect(ok.status).toBe(200);
    const trimmed = await request(app).post('/api/auth/signin').set(csrfHeaders).set('X-Forwarded-For', testIp()).send({ email, password: password.slice(0, 72) });
    expect(trimmed.status).toBe(401);
  });
});

describe('password storage', () => {
  // OWASP Password Storage Cheat Sheet, "Argon2id": m >= 19 MiB, t >= 2, p = 1; ASVS 5.0 §11.4.2.
  it('stores an argon2id hash with at least the OWASP minimum parameters and a per-user salt', async () => {
    const a = await studioSignUp(app);
    const b = await studioSignUp(app);
    const hashes = await Promise.all([a.owner.id, b.owner.id].map(async (id) => (await User.findByPk(id))!.passwordHash));
    for (const hash of hashes) {
      // PHC string format: $argon2id$v=19$<params>$<salt>$<hash>, params in any order.
      const m = /^\$argon2id\$v=19\$([a-z=0-9,]+)\$([A-Za-z0-9+/]{22,})\$([A-Za-z0-9+/]{43,})$/.exec(hash);
      expect(m, hash).not.toBeNull();
      const params = Object.fromEntries(m![1]!.split(',').map((kv) => kv.split('=') as [string, string]));
      expect(Number(params.m)).toBeGreaterThanOrEqual(19_456);
      expect(Number(params.t)).toBeGreaterThanOrEqual(2);
      expect(Number(params.p)).toBe(1);
      expect(hash).not.toContain(TEST_PASSWORD);
    }
    // Same password, different salts: different hashes.
    expect(hashes[0]).not.toBe(hashes[1]);
  });
});

describe('sign-in and sign-out', () => {
  it('signs a member in with any letter case in the e-mail and answers MeResponse', async () => {
    const { email, studio } = await studioSignUp(app);
    const res = await request(app).post('/api/auth/signin').set(csrfHeaders).send({ email: `  ${email.toUpperCase()} `, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email, role: 'owner' });
    expect(res.body.studio.id).toBe(studio.id);
  });

  // ASVS 5.0 §6.3.8 (no account enumeration); OWASP Authentication Cheat Sheet, "Authentication and Error Messages".
  it('answers an unknown e-mail exactly like a wrong password', async () => {
    const { email } = await studioSignUp(app);
    const wrong = await request(app).post('/api/auth/signin').set(csrfHeaders).set('X-Forwarded-For', testIp()).send({ email, password: 'not-the-password-1' });
    const unknown = await request(app)
      .post('/api/auth/signin')
      .set(csrfHeaders)
      .set('X-Forwarded-For', testIp())
      .send({ email: uniqueEmail('nobody'), password: 'not-the-password-1' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(wrong.status);
    expect(unknown.body).toEqual(wrong.body);
    expect(wrong.body).toEqual({ error: { code: 'invalid_credentials', message: expect.any(String) } });
    expect(sessionCookieOf(wrong.headers['set-cookie'])).toBeUndefined();
  });

  it('checks an unknown e-mail against a dummy hash of the same cost, so both failures take as long', async () => {
    const { email, owner } = await studioSignUp(app);
    const spy = vi.spyOn(argon2, 'verify');
    try {
      await request(app).post('/api/auth/signin').set(csrfHeaders).set('X-Forwarded-For', testIp()).send({ email, password: 'not-the-password-2' });
      await request(app).post('/api/auth/signin').set(csrfHeaders).set('X-Forwarded-For', testIp()).send({ email: uniqueEmail('nobody'), password: 'x-y-z-w' });
      expect(spy).toHaveBeenCalledTimes(2);
      const params = (hash: string) => hash.split('$').slice(1, 4).join('$');
      const real = (await User.findByPk(owner.id))!.passwordHash;
      expect(spy.mock.calls[0]![0]).toBe(real);
      expect(spy.mock.calls[1]![0]).not.toBe(real);
      expect(params(spy.mock.calls[1]![0])).toBe(params(real));
    } finally {
      spy.mockRestore();
    }
  });

  it('tells a disabled member, once the password is right, that the account is disabled', async () => {
    const { studio } = await studioSignUp(app);
    const { email } = await memberAdd(app, studio.id, 'cutter', { disabled: true });
    const res = await request(app).post('/api/auth/signin').set(csrfHeaders).send({ email, password: TEST_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('account_disabled');
    expect(sessionCookieOf(res.headers['set-cookie'])).toBeUndefined();
  });

  // ASVS 5.0 §7.4.1 (sign-out invalidates the session on the server).
  it('signs out: the old cookie is refused afterwards and the browser is told to drop it', async () => {
    const { agent, cookie } = await studioSignUp(app);
    const out = await agent.post('/api/auth/signout').set(csrfHeaders);
    expect(out.status).toBe(204);
    expect(String(out.headers['set-cookie'])).toMatch(/knitwright\.sid=;.*Expires=Thu, 01 Jan 1970/);
    const replay = await request(app).get('/api/auth/me').set('Cookie', cookie);
    expect(replay.status).toBe(401);
  });

  it('answers 401 with the one error shape when nobody is signed in', async () => {
    const res = await request(app).get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: { code: 'unauthorized', message: expect.any(String) } });
  });
});

describe('profile', () => {
  it('renames the member', async () => {
    const { agent } = await studioSignUp(app);
    const res = await agent.patch('/api/auth/me').set(csrfHeaders).send({ name: '  Maren Holt-Ibsen ' });
    expect(res.status).toBe(200);
    expect(res.body.user.name).toBe('Maren Holt-Ibsen');
  });

  // ASVS 5.0 §6.2.2, §6.2.3 (change needs the current password), §7.4.3 (other sessions end).
  it('changes the password with the current one and ends the member’s other sessions', async () => {
    const { agent, email } = await studioSignUp(app);
    const other = request.agent(app);
    expect((await other.post('/api/auth/signin').set(csrfHeaders).send({ email, password: TEST_PASSWORD })).status).toBe(200);

    const bad = await agent
      .patch('/api/auth/me')
      .set(csrfHeaders)
      .set('X-Forwarded-For', testIp())
      .send({ currentPassword: 'wrong-current-pw', newPassword: 'cabled-yoke-in-merino' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ currentPassword: expect.any(String) });

    const common = await agent.patch('/api/auth/me').set(csrfHeaders).send({ currentPassword: TEST_PASSWORD, newPassword: 'password1234' });
    expect(common.status).toBe(400);
    expect(common.body.error.fields).toEqual({ newPassword: expect.stringMatching(/common/) });

    const ok = await agent.patch('/api/auth/me').set(csrfHeaders).send({ currentPassword: TEST_PASSWORD, newPassword: 'cabled-yoke-in-merino' });
    expect(ok.status).toBe(200);
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    expect((await other.get('/api/auth/me')).status).toBe(401);

    const oldPw = await request(app).post('/api/auth/signin').set(csrfHeaders).set('X-Forwarded-For', testIp()).send({ email, password: TEST_PASSWORD });
    expect(oldPw.status).toBe(401);
    const newPw = await request(app).post('/api/auth/signin').set(csrfHeaders).send({ email, password: 'cabled-yoke-in-merino' });
    expect(newPw.status).toBe(200);
  });

  it('needs the current password to set a new one', async () => {
    const { agent } = await studioSignUp(app);
    const res = await agent.patch('/api/auth/me').set(csrfHeaders).send({ newPassword: 'cabled-yoke-in-merino' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ currentPassword: expect.any(String) });
  });
});
