import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { csrfHeaders, memberAdd, studioSignUp, type Agent } from '../helpers/auth.js';
import { testAppCreate } from '../helpers/test-app.js';
import { IN } from './drafts-fixtures.js';

const { app, close } = testAppCreate();
afterAll(close);

let owner: Agent;
let cutter: Agent;
let otherOwner: Agent;

beforeAll(async () => {
  const a = await studioSignUp(app, { studioName: 'Styles Studio' });
  owner = a.agent;
  cutter = (await memberAdd(app, a.studio.id, 'cutter')).agent;
  otherOwner = (await studioSignUp(app, { studioName: 'Styles Other Studio' })).agent;
});

describe('styles', () => {
  it('saves a studio style with its default parameters in mm and lists it by name', async () => {
    // A scoop neck about 6 in deep at the front (trade notes, common practice).
    const created = await owner
      .post('/api/styles')
      .set(csrfHeaders)
      .send({ name: 'Scoop tank', defaults: { frontNeckDepth: 6 * IN, bustEase: -9 }, notes: 'Everyday scoop' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({
      name: 'Scoop tank',
      garment: 'tank',
      racerBack: false,
      defaults: { bustEase: -9 },
      archived: false,
      version: 0,
    });
    // Stored as sent: 6 in = 152.4 mm (NIST SP 811), to floating-point rounding.
    expect(created.body.defaults.frontNeckDepth).toBeCloseTo(152.4, 9);
    await owner.post('/api/styles').set(csrfHeaders).send({ name: 'High-neck tank', defaults: { frontNeckDepth: 3 * IN } });
    const list = await cutter.get('/api/styles');
    expect(list.status).toBe(200);
    expect(list.body.items.map((s: { name: string }) => s.name)).toEqual(['High-neck tank', 'Scoop tank']);
  });

  it('keeps a racer back inset only on a racer-back style', async () => {
    const racer = await owner
      .post('/api/styles')
      .set(csrfHeaders)
      .send({ name: 'Racer tank', racerBack: true, defaults: { racerBackInset: 2.5 * IN } });
    expect(racer.status).toBe(201);
    const bad = await owner.post('/api/styles').set(csrfHeaders).send({ name: 'Plain with inset', defaults: { racerBackInset: 60 } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['defaults.racerBackInset']).toMatch(/racer-back style/);
    // Turning the racer back off drops its inset.
    const off = await owner.patch(`/api/styles/${racer.body.id}`).set(csrfHeaders).send({ version: 0, racerBack: false });
    expect(off.status).toBe(200);
    expect(off.body.defaults).toEqual({});
  });

  it('refuses values outside their range, naming the field in the studio unit, and writes nothing', async () => {
    const res = await owner
      .post('/api/styles')
      .set(csrfHeaders)
      .send({ name: 'Too deep', defaults: { frontNeckDepth: 900, bustEase: -80, wobble: 1 } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['defaults.frontNeckDepth']).toMatch(/Front neck depth must be between .* in and .* in/);
    expect(res.body.error.fields['defaults.bustEase']).toMatch(/Bust ease/);
    expect(res.body.error.fields.defaults ?? res.body.error.fields['defaults.wobble']).toMatch(/wobble/);
    const list = await owner.get('/api/styles');
    expect(list.body.items.map((s: { name: string }) => s.name)).not.toContain('Too deep');
  });

  it('refuses a second style of the same name', async () => {
    await owner.post('/api/styles').set(csrfHeaders).send({ name: 'Twin' });
    const again = await owner.post('/api/styles').set(csrfHeaders).send({ name: 'Twin' });
    expect(again.status).toBe(400);
    expect(again.body.error.fields.name).toMatch(/already has a style named "Twin"/);
  });

  it('answers a stale save with 409 and the style as it is now', async () => {
    const { body: style } = await owner.post('/api/styles').set(csrfHeaders).send({ name: 'Contested' });
    const first = await owner.patch(`/api/styles/${style.id}`).set(csrfHeaders).send({ version: 0, notes: 'first' });
    expect(first.status).toBe(200);
    expect(first.body.version).toBe(1);
    const second = await owner.patch(`/api/styles/${style.id}`).set(csrfHeaders).send({ version: 0, notes: 'second' });
    expect(second.status).toBe(409);
    expect(second.body.error.current).toMatchObject({ id: style.id, version: 1, notes: 'first' });
  });

  it('archives a style and lists archived styles on request', async () => {
    const { body: style } = await owner.post('/api/styles').set(csrfHeaders).send({ name: 'Retired tank' });
    await owner.patch(`/api/styles/${style.id}`).set(csrfHeaders).send({ version: 0, archived: true });
    const active = await owner.get('/api/styles');
    const archived = await owner.get('/api/styles?archived=true');
    expect(active.body.items.map((s: { id: number }) => s.id)).not.toContain(style.id);
    expect(archived.body.items.map((s: { id: number }) => s.id)).toEqual([style.id]);
  });

  it('lets cutters read styles but not change them, and hides another studio’s', async () => {
    const { body: style } = await owner.post('/api/styles').set(csrfHeaders).send({ name: 'Guarded' });
    expect((await cutter.get(`/api/styles/${style.id}`)).status).toBe(200);
    expect((await cutter.post('/api/styles').set(csrfHeaders).send({ name: 'By cutter' })).status).toBe(403);
    expect((await cutter.patch(`/api/styles/${style.id}`).set(csrfHeaders).send({ version: 0, notes: 'x' })).status).toBe(403);
    expect((await otherOwner.get(`/api/styles/${style.id}`)).status).toBe(404);
    expect((await otherOwner.patch(`/api/styles/${style.id}`).set(csrfHeaders).send({ version: 0, notes: 'x' })).status).toBe(404);
  });
});
