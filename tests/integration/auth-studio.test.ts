/**
 * The owner's studio routes: defaults, members, roles, the last-owner rule, and studio isolation
 * (OWASP ASVS 5.0 §8.2.1, §8.2.2, numbers from memory; OWASP Authorization Cheat Sheet).
 */
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { Session, User } from '../../server/models/index.js';
import { csrfHeaders, memberAdd, studioSignUp } from '../helpers/auth.js';
import { testAppCreate } from '../helpers/test-app.js';

const { app, close } = testAppCreate();
afterAll(close);

describe('studio defaults', () => {
  it('lets the owner read and change the defaults, and GET /api/auth/me shows them', async () => {
    const a = await studioSignUp(app);
    const res = await a.agent
      .patch('/api/studio')
      .set(csrfHeaders)
      .send({ name: 'Fernhill Knits', defaultUnit: 'cm', defaultPaper: 'a4', seamAllowanceMm: 10, hemAllowanceMm: 25.4, bindingRatio: 0.85 });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      id: a.studio.id,
      name: 'Fernhill Knits',
      defaultUnit: 'cm',
      defaultPaper: 'a4',
      seamAllowanceMm: 10,
      hemAllowanceMm: 25.4,
      bindingRatio: 0.85,
    });
    expect((await a.agent.get('/api/studio')).body).toEqual(res.body);
    expect((await a.agent.get('/api/auth/me')).body.studio).toEqual(res.body);
  });

  it('keeps a cutter out of the studio routes', async () => {
    const a = await studioSignUp(app);
    const cutter = await memberAdd(app, a.studio.id, 'cutter');
    const res = await cutter.agent.patch('/api/studio').set(csrfHeaders).send({ defaultUnit: 'cm' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
    expect((await a.agent.get('/api/studio')).body.defaultUnit).toBe('in');
  });
});

describe('members', () => {
  it('lists only the caller’s studio, without password hashes', async () => {
    const a = await studioSignUp(app);
    const cutter = await memberAdd(app, a.studio.id, 'cutter', { name: 'Bea Moreno' });
    await studioSignUp(app);
    const res = await a.agent.get('/api/studio/members');
    expect(res.status).toBe(200);
    expect(res.body.members.map((m: { id: number }) => m.id).sort()).toEqual([a.owner.id, cutter.member.id].sort());
    expect(res.body.members.find((m: { id: number }) => m.id === cutter.member.id)).toEqual({
      id: cutter.member.id,
      email: cutter.email,
      name: 'Bea Moreno',
      role: 'cutter',
      disabled: false,
      createdAt: expect.any(String),
    });
    expect(JSON.stringify(res.body)).not.toMatch(/argon2|passwordHash/);
  });

  it('answers 404, never 403, for another studio’s member, and changes nothing', async () => {
    const a = await studioSignUp(app);
    const b = await studioSignUp(app);
    const patch = await b.agent.patch(`/api/studio/members/${a.owner.id}`).set(csrfHeaders).send({ disabled: true });
    expect(patch.status).toBe(404);
    const del = await b.agent.delete(`/api/studio/members/${a.owner.id}`).set(csrfHeaders);
    expect(del.status).toBe(404);
    const missing = await b.agent.delete('/api/studio/members/4294967295').set(csrfHeaders);
    expect(missing.body).toEqual(del.body);
    expect((await User.findByPk(a.owner.id))!.disabled).toBe(false);
  });

  it('removes a member and ends their sessions', async () => {
    const a = await studioSignUp(app);
    const cutter = await memberAdd(app, a.studio.id, 'cutter');
    const res = await a.agent.delete(`/api/studio/members/${cutter.member.id}`).set(csrfHeaders);
    expect(res.status).toBe(204);
    expect(await User.count({ where: { id: cutter.member.id } })).toBe(0);
    expect(await Session.count({ where: { userId: cutter.member.id } })).toBe(0);
    expect((await cutter.agent.get('/api/auth/me')).status).toBe(401);
  });

  it('re-enables a disabled member, who can then sign in again', async () => {
    const a = await studioSignUp(app);
    const cutter = await memberAdd(app, a.studio.id, 'cutter', { disabled: true });
    const res = await a.agent.patch(`/api/studio/members/${cutter.member.id}`).set(csrfHeaders).send({ disabled: false });
    expect(res.body.disabled).toBe(false);
    const signIn = await request(app).post('/api/auth/signin').set(csrfHeaders).send({ email: cutter.email, password: cutter.password });
    expect(signIn.status).toBe(200);
  });
});

describe('the last owner', () => {
  it.each([
    ['demoted', { role: 'cutter' }],
    ['disabled', { disabled: true }],
  ])('cannot be %s', async (_what, body) => {
    const a = await studioSignUp(app);
    const res = await a.agent.patch(`/api/studio/members/${a.owner.id}`).set(csrfHeaders).send(body);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('last_owner');
    expect(await User.findByPk(a.owner.id)).toMatchObject({ role: 'owner', disabled: false });
  });

  it('cannot be removed', async () => {
    const a = await studioSignUp(app);
    const res = await a.agent.delete(`/api/studio/members/${a.owner.id}`).set(csrfHeaders);
    expect(res.status).toBe(409);
    expect(await User.count({ where: { id: a.owner.id } })).toBe(1);
  });

  it('does not count a disabled owner as an owner', async () => {
    const a = await studioSignUp(app);
    await memberAdd(app, a.studio.id, 'owner', { disabled: true });
    const res = await a.agent.patch(`/api/studio/members/${a.owner.id}`).set(csrfHeaders).send({ role: 'cutter' });
    expect(res.status).toBe(409);
  });

  it('can step down once another owner is active; the change applies at once', async () => {
    const a = await studioSignUp(app);
    const second = await memberAdd(app, a.studio.id, 'owner');
    const res = await a.agent.patch(`/api/studio/members/${a.owner.id}`).set(csrfHeaders).send({ role: 'cutter' });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe('cutter');
    expect((await a.agent.get('/api/studio')).status).toBe(403);
    const back = await second.agent.patch(`/api/studio/members/${second.member.id}`).set(csrfHeaders).send({ role: 'cutter' });
    expect(back.status).toBe(409);
  });

  it('survives two owners demoting each other at the same moment', async () => {
    const a = await studioSignUp(app);
    const second = await memberAdd(app, a.studio.id, 'owner');
    const [one, two] = await Promise.all([
      a.agent.patch(`/api/studio/members/${second.member.id}`).set(csrfHeaders).send({ role: 'cutter' }),
      second.agent.patch(`/api/studio/members/${a.owner.id}`).set(csrfHeaders).send({ role: 'cutter' }),
    ]);
    expect([one.status, two.status].sort()).toEqual([200, 409]);
    expect(await User.count({ where: { studioId: a.studio.id, role: 'owner', disabled: false } })).toBe(1);
  });
});
