/**
 * Password reset through the real local SMTP sink, checked against the OWASP Forgot Password
 * Cheat Sheet: the same answer for an address with or without an account; a random, single-use,
 * expiring token stored hashed; every session ended once the password changes (also ASVS 5.0
 * §7.4.3); requests rate-limited.
 */
import { createHash } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mailThrottleHit, MAIL_LIMITS } from '../../server/mail/throttle.js';
import { PasswordReset, User } from '../../server/models/index.js';
import { csrfHeaders, memberAdd, signIn, studioSignUp, testIp, uniqueEmail, type SignedUpStudio } from '../helpers/auth.js';
import { linkToken, mailTestAppCreate, messagesTo, messageTo, type MailTestApp } from './mail-fixtures.js';

const NEW_PASSWORD = 'overlocked-hem-and-binding-7';

let t: MailTestApp;
let a: SignedUpStudio;

beforeAll(async () => {
  t = await mailTestAppCreate();
  a = await studioSignUp(t.app, { studioName: 'Selvedge Row Knitwear' });
});
afterAll(() => t.close());

function resetAsk(email: string, ip = testIp()) {
  return request(t.app).post('/api/auth/password-reset').set(csrfHeaders).set('X-Forwarded-For', ip).send({ email });
}

async function resetLink(email: string, since: Date): Promise<string> {
  return linkToken((await messageTo(email, since)).message.text, 'reset-password').token;
}

describe('password reset through the local SMTP sink', () => {
  it('answers the same for an address with an account and one without, and mails only the member', async () => {
    const member = await memberAdd(t.app, a.studio.id, 'cutter');
    const stranger = uniqueEmail('nobody');
    const since = new Date(Date.now() - 1000);
    const known = await resetAsk(member.email);
    const unknown = await resetAsk(stranger);
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
    expect(unknown.headers['set-cookie']).toEqual(known.headers['set-cookie']);

    const { message } = await messageTo(member.email, since);
    expect(message.subject).toBe('Reset your Knitwright password');
    expect(message.fromName).toBe('Selvedge Row Knitwear');
    expect(message.html).not.toMatch(/<img|src=/i);
    expect(await messagesTo(stranger, { count: 1, timeoutMs: 300 })).toEqual([]);
  });

  it('sets a new password through a link that works once, ending every session of the member', async () => {
    const member = await memberAdd(t.app, a.studio.id, 'cutter');
    const laptop = member.agent;
    const tablet = await signIn(t.app, member.email, member.password);
    const since = new Date(Date.now() - 1000);
    await resetAsk(member.email);
    const token = await resetLink(member.email, since);

    const row = await PasswordReset.findOne({ where: { tokenHash: createHash('sha256').update(token).digest('hex') }, raw: true });
    expect(row).not.toBeNull();
    expect(JSON.stringify(row)).not.toContain(token);
    // One hour, within the seconds the request took.
    expect(row!.expiresAt.getTime() - Date.now()).toBeLessThanOrEqual(3600_000);
    expect(row!.expiresAt.getTime() - Date.now()).toBeGreaterThan(3600_000 - 60_000);

    expect((await request(t.app).get(`/api/auth/password-reset/${token}`)).body).toEqual({ email: member.email });
    const done = await request(t.app).post(`/api/auth/password-reset/${token}`).set(csrfHeaders).send({ password: NEW_PASSWORD });
    expect(done.status).toBe(204);

    expect((await laptop.get('/api/auth/me')).status).toBe(401);
    expect((await tablet.get('/api/auth/me')).status).toBe(401);
    const old = await request(t.app).post('/api/auth/signin').set(csrfHeaders).set('X-Forwarded-For', testIp()).send({ email: member.email, password: member.password });
    expect(old.status).toBe(401);
    expect((await signIn(t.app, member.email, NEW_PASSWORD).then((ag) => ag.get('/api/auth/me'))).body.user.email).toBe(member.email);

    const reused = await request(t.app).post(`/api/auth/password-reset/${token}`).set(csrfHeaders).send({ password: 'another-fine-seam-99' });
    expect(reused.status).toBe(410);
    expect(reused.body.error.message).toMatch(/already been used/);
    expect((await request(t.app).get(`/api/auth/password-reset/${token}`)).status).toBe(410);
  });

  it('refuses an expired link and leaves the password alone', async () => {
    const member = await memberAdd(t.app, a.studio.id, 'cutter');
    const since = new Date(Date.now() - 1000);
    await resetAsk(member.email);
    const token = await resetLink(member.email, since);
    const hash = createHash('sha256').update(token).digest('hex');
    await PasswordReset.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { tokenHash: hash } });
    const before = (await User.findByPk(member.member.id))!.passwordHash;
    const res = await request(t.app).post(`/api/auth/password-reset/${token}`).set(csrfHeaders).send({ password: NEW_PASSWORD });
    expect(res.status).toBe(410);
    expect(res.body.error.message).toMatch(/expired/);
    expect((await User.findByPk(member.member.id))!.passwordHash).toBe(before);
    expect((await member.agent.get('/api/auth/me')).status).toBe(200);
  });

  it('makes an earlier link useless once a newer one is sent', async () => {
    const member = await memberAdd(t.app, a.studio.id, 'cutter');
    const first = new Date(Date.now() - 1000);
    await resetAsk(member.email);
    // Waits for the first message, so the second request is surely the newer one.
    const older = await resetLink(member.email, first);
    await resetAsk(member.email);
    const [, newest] = await messagesTo(member.email, { count: 2, since: first });
    const newer = linkToken(newest!.message.text, 'reset-password').token;
    expect(newer).not.toBe(older);
    expect((await request(t.app).post(`/api/auth/password-reset/${older}`).set(csrfHeaders).send({ password: NEW_PASSWORD })).status).toBe(410);
    expect((await request(t.app).post(`/api/auth/password-reset/${newer}`).set(csrfHeaders).send({ password: NEW_PASSWORD })).status).toBe(204);
  });

  it('checks the new password like sign-up does, naming the field', async () => {
    const member = await memberAdd(t.app, a.studio.id, 'cutter');
    const since = new Date(Date.now() - 1000);
    await resetAsk(member.email);
    const token = await resetLink(member.email, since);
    const short = await request(t.app).post(`/api/auth/password-reset/${token}`).set(csrfHeaders).send({ password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.password).toBe('Password must be at least 8 characters');
    const own = await request(t.app).post(`/api/auth/password-reset/${token}`).set(csrfHeaders).send({ password: member.email });
    expect(own.body.error.fields.password).toMatch(/must not be your e-mail/);
    const missing = await request(t.app).post('/api/auth/password-reset').set(csrfHeaders).send({});
    expect(missing.body.error.fields.email).toBe('E-mail is required');
    // Refused attempts leave the link usable.
    expect((await request(t.app).get(`/api/auth/password-reset/${token}`)).status).toBe(200);
  });

  it('sends no more than the per-address limit, with the same answer throughout', async () => {
    const member = await memberAdd(t.app, a.studio.id, 'cutter');
    const since = new Date(Date.now() - 1000);
    const answers = [];
    for (let i = 0; i < MAIL_LIMITS.resetPerAddress.max + 2; i++) answers.push(await resetAsk(member.email));
    expect(new Set(answers.map((r) => `${r.status} ${JSON.stringify(r.body)}`)).size).toBe(1);
    const received = await messagesTo(member.email, { count: MAIL_LIMITS.resetPerAddress.max + 1, timeoutMs: 1500, since });
    expect(received).toHaveLength(MAIL_LIMITS.resetPerAddress.max);
  });

  it('refuses a flood of requests from one client address with 429', async () => {
    const ip = testIp();
    for (let i = 0; i < MAIL_LIMITS.resetPerIp.max; i++) expect((await resetAsk(uniqueEmail('flood'), ip)).status).toBe(202);
    const refused = await resetAsk(uniqueEmail('flood'), ip);
    expect(refused.status).toBe(429);
    expect(refused.body.error.message).toMatch(/Wait an hour/);
  });

  it('counts limits in the database, shared by every app server', async () => {
    const key = uniqueEmail('counted');
    const results = [];
    for (let i = 0; i <= MAIL_LIMITS.invitationsPerStudio.max; i++) results.push(await mailThrottleHit(t.sequelize, 'invitationsPerStudio', key));
    expect(results.filter(Boolean)).toHaveLength(MAIL_LIMITS.invitationsPerStudio.max);
    expect(results.at(-1)).toBe(false);
  });
});
