import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ENGINE_VERSION } from '../../shared/engine/index.js';
import { DraftRevision } from '../../server/models/index.js';
import { csrfHeaders, memberAdd, studioSignUp, type Agent } from '../helpers/auth.js';
import { testAppCreate } from '../helpers/test-app.js';
import { draftMake, draftWorld, fabricAdd, type DraftWorld } from './drafts-fixtures.js';

const { app, close } = testAppCreate();
afterAll(close);

let owner: Agent;
let cutter: Agent;
let otherOwner: Agent;
let studioId: number;
let world: DraftWorld;

beforeAll(async () => {
  const a = await studioSignUp(app, { studioName: 'States Studio' });
  owner = a.agent;
  studioId = a.studio.id;
  cutter = (await memberAdd(app, a.studio.id, 'cutter')).agent;
  otherOwner = (await studioSignUp(app, { studioName: 'States Other Studio' })).agent;
  world = await draftWorld(owner, studioId);
});

const move = (agent: Agent, id: number, body: Record<string, unknown>) => agent.post(`/api/drafts/${id}/state`).set(csrfHeaders).send(body);

describe('draft states', () => {
  it('goes drafting → approved → cut → sewn → delivered, each step stamped with who and when', async () => {
    const d = await draftMake(owner, world);
    const approved = await move(owner, d.id, { to: 'approved', version: 0 });
    expect(approved.status).toBe(200);
    expect(approved.body).toMatchObject({
      state: 'approved',
      editable: false,
      approved: { revision: 1, engineVersion: ENGINE_VERSION, by: { name: expect.any(String) } },
    });
    const asCutter = await cutter.get(`/api/drafts/${d.id}`);
    expect(asCutter.body.allowedMoves).toEqual(['cut']);
    const cutFabric = await fabricAdd(studioId);
    const cut = await move(cutter, d.id, { to: 'cut', version: approved.body.version, fabricId: cutFabric, note: 'Cut 4 layers, 68 cm used' });
    expect(cut.status).toBe(200);
    expect(cut.body).toMatchObject({ state: 'cut', cut: { fabric: { id: cutFabric }, note: 'Cut 4 layers, 68 cm used', by: { name: expect.any(String) } } });
    const sewn = await move(cutter, d.id, { to: 'sewn', version: cut.body.version });
    const delivered = await move(owner, d.id, { to: 'delivered', version: sewn.body.version, note: 'Collected' });
    expect(delivered.body).toMatchObject({ state: 'delivered', delivered: { note: 'Collected' }, allowedMoves: [] });
    // The states never touched the drawing.
    expect(delivered.body.revision).toBe(1);
  });

  it('lets only an owner approve or reopen (403), and refuses moves the state does not allow (409)', async () => {
    const d = await draftMake(owner, world);
    const byCutter = await move(cutter, d.id, { to: 'approved', version: 0 });
    expect(byCutter.status).toBe(403);
    const early = await move(owner, d.id, { to: 'cut', version: 0, fabricId: world.fabricId });
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/drafting cannot be marked cut/);
    expect(early.body.error.current).toMatchObject({ id: d.id, state: 'drafting' });
    const approved = await move(owner, d.id, { to: 'approved', version: 0 });
    expect((await move(cutter, d.id, { to: 'drafting', version: approved.body.version })).status).toBe(403);
    const badFabric = await move(cutter, d.id, { to: 'cut', version: approved.body.version, fabricId: 987654 });
    expect(badFabric.status).toBe(400);
    expect(badFabric.body.error.fields.fabricId).toMatch(/No such fabric/);
    const noFabric = await move(cutter, d.id, { to: 'cut', version: approved.body.version });
    expect(noFabric.status).toBe(400);
    expect(noFabric.body.error.fields.fabricId).toBeDefined();
    const bad = await move(owner, d.id, { to: 'folded', version: 0 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.to).toMatch(/To must be one of/);
    expect((await move(otherOwner, d.id, { to: 'drafting', version: approved.body.version })).status).toBe(404);
  });

  it('keeps an approved draft read-only until an owner reopens it, which makes a new revision', async () => {
    const d = await draftMake(owner, world, { params: { bustEase: -8 } });
    const approved = await move(owner, d.id, { to: 'approved', version: 0 });
    const v = approved.body.version;
    const save = await owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: v, params: { bustEase: -10 } });
    expect(save.status).toBe(409);
    expect(save.body.error.message).toMatch(/reopen/);
    expect(save.body.error.current).toMatchObject({ state: 'approved', params: { bustEase: -8 } });
    expect((await owner.post(`/api/drafts/${d.id}/revisions/1/restore`).set(csrfHeaders).send({ version: v })).status).toBe(409);
    const stale = await move(owner, d.id, { to: 'drafting', version: 0 });
    expect(stale.status).toBe(409);
    const reopened = await move(owner, d.id, { to: 'drafting', version: v, note: 'Client wants it longer' });
    expect(reopened.status).toBe(200);
    expect(reopened.body).toMatchObject({ state: 'drafting', revision: 2, approved: null, editable: true });
    expect(reopened.body.current).toMatchObject({ kind: 'reopened', engineVersion: ENGINE_VERSION });
    const saved = await owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: reopened.body.version, params: { bustEase: -10 } });
    expect(saved.body).toMatchObject({ revision: 3, params: { bustEase: -10 } });
  });

  it('keeps the engine version an approved draft was approved with, and says when the current engine draws it differently', async () => {
    const d = await draftMake(owner, world);
    // Stand in for a draft saved by an older engine: its stored numbers differ from today's run.
    const rev = await DraftRevision.findOne({ where: { draftId: d.id, number: 1 } });
    const older = structuredClone(rev!.computed);
    older.finished.bust += 12.7;
    older.edges.front!.neck! -= 3;
    rev!.set({ engineVersion: '0.9.0', computed: older });
    await rev!.save();
    const approved = await move(owner, d.id, { to: 'approved', version: 0 });
    expect(approved.body.approved).toMatchObject({ engineVersion: '0.9.0', revision: 1 });
    const read = await cutter.get(`/api/drafts/${d.id}`);
    expect(read.body.current.engineVersion).toBe('0.9.0');
    expect(read.body.current.computed.finished.bust).toBeCloseTo(older.finished.bust, 9);
    expect(read.body.engineCheck).toMatchObject({ storedVersion: '0.9.0', currentVersion: ENGINE_VERSION, drawsDifferently: true });
    expect(read.body.engineCheck.differences.map((x: { path: string }) => x.path).sort()).toEqual(['edges.front.neck', 'finished.bust']);
    const bust = read.body.engineCheck.differences.find((x: { path: string }) => x.path === 'finished.bust');
    expect(bust.stored - bust.current).toBeCloseTo(12.7, 6);
  });

  it('does not flag a stored draft that today’s engine draws the same', async () => {
    const d = await draftMake(owner, world);
    await move(owner, d.id, { to: 'approved', version: 0 });
    const read = await owner.get(`/api/drafts/${d.id}`);
    expect(read.body.engineCheck).toEqual({ storedVersion: ENGINE_VERSION, currentVersion: ENGINE_VERSION, drawsDifferently: false, differences: [] });
  });
});

async function approve(id: number, version = 0) {
  const res = await owner.post(`/api/drafts/${id}/state`).set(csrfHeaders).send({ to: 'approved', version });
  expect(res.status).toBe(200);
  return res.body as { version: number };
}

describe('work queue', () => {
  it('lists approved drafts waiting to be cut, oldest approval first, with client, style, fabric and due date', async () => {
    const first = await draftMake(owner, world, { dueOn: '2026-06-01' });
    const second = await draftMake(owner, world, { dueOn: '2026-05-01' });
    const waiting = await draftMake(owner, world);
    // Approved in the other order: the queue follows when drafts were approved.
    await approve(second.id);
    await approve(first.id);
    const res = await cutter.get('/api/queue');
    expect(res.status).toBe(200);
    const items = res.body.items as { id: number; since: string }[];
    const ids = items.map((i) => i.id);
    expect(ids.indexOf(second.id)).toBeGreaterThanOrEqual(0);
    expect(ids.indexOf(second.id)).toBeLessThan(ids.indexOf(first.id));
    expect(ids).not.toContain(waiting.id);
    const since = items.map((i) => i.since);
    expect(since).toEqual([...since].sort());
    expect(items.find((i) => i.id === first.id)).toMatchObject({
      state: 'approved',
      client: { id: world.clientId, name: expect.any(String) },
      style: { id: world.styleId, name: expect.any(String) },
      fabric: { id: world.fabricId, name: expect.any(String) },
      dueOn: '2026-06-01',
      revision: 1,
      fold: 'four-layers',
      lengthNeeded: expect.any(Number),
    });
  });

  it('moves a draft out of the queue once it is cut, into the cut list', async () => {
    const d = await draftMake(owner, world);
    const { version } = await approve(d.id);
    const cut = await cutter.post(`/api/drafts/${d.id}/state`).set(csrfHeaders).send({ to: 'cut', version, fabricId: world.fabricId, note: 'One tank, 4 layers' });
    expect(cut.status).toBe(200);
    expect((await cutter.get('/api/queue')).body.items.map((i: { id: number }) => i.id)).not.toContain(d.id);
    expect((await cutter.get('/api/queue?state=cut')).body.items.map((i: { id: number }) => i.id)).toContain(d.id);
    expect((await cutter.get('/api/queue?state=delivered')).status).toBe(400);
  });

  it('shows each studio only its own queue, and nobody signed out', async () => {
    const d = await draftMake(owner, world);
    await approve(d.id);
    const theirs = await otherOwner.get('/api/queue');
    expect(theirs.status).toBe(200);
    expect(theirs.body.items.map((i: { id: number }) => i.id)).not.toContain(d.id);
    expect((await request(app).get('/api/queue')).status).toBe(401);
  });
});
