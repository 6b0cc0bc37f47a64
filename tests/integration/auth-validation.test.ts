/**
 * Bad bodies: missing fields, wrong types, extra fields, huge strings. Each gets 400 with a
 * message naming the field, and nothing is written (ASVS 5.0 §2.2.1 positive validation,
 * §15.3.3 mass assignment, numbers from memory; OWASP Mass Assignment Cheat Sheet).
 */
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { Studio, User } from '../../server/models/index.js';
import { csrfHeaders, memberAdd, studioSignUp, TEST_PASSWORD, uniqueEmail } from '../helpers/auth.js';
import { testAppCreate } from '../helpers/test-app.js';

const { app, close } = testAppCreate();
afterAll(close);

/**
 * Posts a sign-up that must be refused and checks that neither its studio nor its member was
 * written (looked up by name and e-mail, so other suites writing at the same time do not matter).
 */
async function signUpRefused(body: unknown): Promise<{ status: number; fields: Record<string, string> }> {
  const res = await request(app).post('/api/auth/signup').set(csrfHeaders).send(body as object);
  const b = (body ?? {}) as { studioName?: unknown; email?: unknown };
  if (typeof b.studioName === 'string') expect(await Studio.count({ where: { name: b.studioName.slice(0, 120) } })).toBe(0);
  if (typeof b.email === 'string') expect(await User.count({ where: { email: b.email.trim().toLowerCase() } })).toBe(0);
  return { status: res.status, fields: (res.body as { error: { fields: Record<string, string> } }).error.fields };
}

describe('sign-up body', () => {
  it('names every missing field', async () => {
    const { status, fields } = await signUpRefused({});
    expect(status).toBe(400);
    expect(fields).toEqual({
      studioName: 'Studio name is required',
      name: 'Your name is required',
      email: 'E-mail is required',
      password: 'Password is required',
    });
  });

  it('names fields of the wrong type', async () => {
    const { status, fields } = await signUpRefused({ studioName: 42, name: ['Ada'], email: true, password: 12345678 });
    expect(status).toBe(400);
    expect(fields).toEqual({
      studioName: 'Studio name must be text',
      name: 'Your name must be text',
      email: 'E-mail must be text',
      password: 'Password must be text',
    });
  });

  it('refuses extra fields such as role and studioId (mass assignment) and writes nothing', async () => {
    const email = uniqueEmail('mass');
    const { status, fields } = await signUpRefused({
      studioName: `Heron Row ${email}`,
      name: 'Tam',
      email,
      password: TEST_PASSWORD,
      role: 'owner',
      studioId: 1,
    });
    expect(status).toBe(400);
    expect(fields).toEqual({ role: 'Unknown field "role".', studioId: 'Unknown field "studioId".' });
  });

  it('refuses huge strings with the field’s limit', async () => {
    const { status, fields } = await signUpRefused({
      studioName: 'S'.repeat(10_000),
      name: 'N'.repeat(121),
      email: `${'e'.repeat(250)}@studio.example`,
      password: 'p'.repeat(129),
    });
    expect(status).toBe(400);
    expect(fields).toEqual({
      studioName: 'Studio name must be at most 120 characters',
      name: 'Your name must be at most 120 characters',
      email: 'E-mail must be at most 254 characters',
      password: 'Password must be at most 128 characters',
    });
  });

  it('refuses a short password and a malformed e-mail, naming them', async () => {
    const { fields } = await signUpRefused({ studioName: `Heron Row ${uniqueEmail('short')}`, name: 'Tam', email: 'tam.at.heron', password: 'short' });
    expect(fields).toEqual({ email: 'E-mail must be an address like name@studio.com', password: 'Password must be at least 8 characters' });
  });

  it('refuses a body that is not an object', async () => {
    const { status, fields } = await signUpRefused(['studioName']);
    expect(status).toBe(400);
    expect(fields).toEqual({ _: 'Sign-up must be an object' });
  });

  it('answers a body past the size limit with 413 in the one error shape', async () => {
    const res = await request(app).post('/api/auth/signup').set(csrfHeaders).send({ studioName: 'x'.repeat(300_000) });
    expect(res.status).toBe(413);
    expect(res.body).toEqual({ error: { code: 'too_large', message: expect.any(String) } });
  });
});

describe('sign-in body', () => {
  it('names missing and mistyped fields', async () => {
    const res = await request(app).post('/api/auth/signin').set(csrfHeaders).send({ email: 7 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ email: 'E-mail must be text', password: 'Password is required' });
  });
});

describe('profile, studio and member bodies', () => {
  it('refuses role, email and studioId on the member’s own profile', async () => {
    const a = await studioSignUp(app);
    const cutter = await memberAdd(app, a.studio.id, 'cutter');
    const res = await cutter.agent.patch('/api/auth/me').set(csrfHeaders).send({ role: 'owner', studioId: 99, email: 'x@y.example' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'role', 'studioId']);
    const user = await User.findByPk(cutter.member.id);
    expect([user!.role, user!.studioId, user!.email]).toEqual(['cutter', a.studio.id, cutter.email]);
  });

  it('refuses out-of-range and mistyped studio defaults, naming each, and keeps the old values', async () => {
    const a = await studioSignUp(app);
    const res = await a.agent
      .patch('/api/studio')
      .set(csrfHeaders)
      .send({ defaultUnit: 'yd', defaultPaper: 'a0', seamAllowanceMm: '6', hemAllowanceMm: -1, bindingRatio: 1.5, version: 9 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({
      defaultUnit: 'Default unit must be "in" or "cm"',
      defaultPaper: 'Default paper must be one of letter, a4, legal, a3, tabloid',
      seamAllowanceMm: 'Seam allowance must be a number',
      hemAllowanceMm: 'Hem allowance must be between 0 and 50.8 mm',
      bindingRatio: 'Binding ratio must be between 0.5 and 1',
      version: 'Unknown field "version".',
    });
    const studio = await Studio.findByPk(a.studio.id);
    expect([studio!.defaultUnit, studio!.seamAllowanceMm, studio!.bindingRatio]).toEqual(['in', 6.35, 1]);
  });

  it('refuses a member id that is not a positive whole number, and unknown member fields', async () => {
    const a = await studioSignUp(app);
    const bad = await a.agent.patch('/api/studio/members/abc').set(csrfHeaders).send({ role: 'owner' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ id: 'Member id must be a number' });
    const extra = await a.agent.patch(`/api/studio/members/${a.owner.id}`).set(csrfHeaders).send({ studioId: 5, disabled: 'no' });
    expect(extra.status).toBe(400);
    expect(extra.body.error.fields).toEqual({ studioId: 'Unknown field "studioId".', disabled: 'Disabled must be true or false' });
  });
});
