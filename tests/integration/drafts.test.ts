import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { draft as engineDraft } from '../../shared/engine/index.js';
import { draftInputBuild } from '../../shared/schemas/draft-input-build.js';
import { csrfHeaders, memberAdd, studioSignUp, type Agent } from '../helpers/auth.js';
import { testAppCreate } from '../helpers/test-app.js';
import { blockMake, clientWithSet, draftMake, draftWorld, fabricAdd, IN, styleMake, WORKED_BODY } from './drafts-fixtures.js';

const { app, close } = testAppCreate();
afterAll(close);

let owner: Agent;
let cutter: Agent;
let otherOwner: Agent;
let studioId: number;

/** Lengths that went through mm ⇄ in conversions agree to far below a printer's resolution. */
const SAME_MM = 1e-6;

beforeAll(async () => {
  const a = await studioSignUp(app, { studioName: 'Drafts Studio' });
  owner = a.agent;
  studioId = a.studio.id;
  cutter = (await memberAdd(app, a.studio.id, 'cutter')).agent;
  otherOwner = (await studioSignUp(app, { studioName: 'Drafts Other Studio' })).agent;
});

describe('drafts', () => {
  it('starts a draft from a block and stores the engine’s numbers with revision 1', async () => {
    const w = await draftWorld(owner, studioId);
    // Worked example (issue 4, common practice): bust 38 in less 3 in of negative ease is a
    // finished bust of 35 in; hip 43 in with no ease stays 43 in.
    const bustEase = (-3 / 38) * 100;
    const res = await owner
      .post('/api/drafts')
      .set(csrfHeaders)
      .send({ blockId: w.blockId, styleId: w.styleId, fabricId: w.fabricId, params: { bustEase, hipEase: 0 }, dueOn: '2026-04-30', notes: 'For the spring trunk show' });
    expect(res.status).toBe(201);
    const d = res.body;
    expect(d).toMatchObject({ state: 'drafting', revision: 1, version: 0, unit: 'in', dueOn: '2026-04-30', editable: true, allowedMoves: ['approved'] });
    expect(d.current).toMatchObject({ number: 1, kind: 'created', changes: [], engineVersion: expect.any(String) });
    expect(d.current.computed.finished.bust).toBeCloseTo(35 * IN, 6);
    expect(d.current.computed.finished.hip).toBeCloseTo(43 * IN, 6);
    expect(d.current.computed.bindings.length).toBeGreaterThan(0);
    expect(d.current.computed.layout.lengthNeeded).toBeGreaterThan(0);
    expect(d.current.computed.edges.front.neck).toBeGreaterThan(0);
    // The input is written in the studio's unit: 38 in stays 38.
    expect(d.current.input.measurements.bust).toBeCloseTo(38, 9);
    expect(d.engineCheck).toMatchObject({ drawsDifferently: false, differences: [] });
  });

  it('gives the browser the parts to rebuild exactly the input the server drafted', async () => {
    const w = await draftWorld(owner, studioId, { racerBack: true, defaults: { frontNeckDepth: 6 * IN } });
    const d = (await owner.get(`/api/drafts/${(await draftMake(owner, w, { params: { bustEase: -8 } })).id}`)).body;
    const rebuilt = draftInputBuild(d.inputParts, d.params);
    expect(rebuilt).toEqual(d.current.input);
    expect(rebuilt.params?.racerBackInset).toBeCloseTo(2.5, 9);
    expect(d.inputOutdated).toBe(false);
    // The same engine in the browser gives the stored figures.
    const local = engineDraft(rebuilt);
    expect(local.ok && local.draft.finished.bust).toBeCloseTo(d.current.computed.finished.bust, 9);
  });

  it('reuses the block the client’s last draft used, with its corrections, for a new style', async () => {
    const { clientId, setId } = await clientWithSet(studioId);
    const fabricId = await fabricAdd(studioId);
    // "+1 cm at hip", "armhole 0.5 cm higher", "bust ease 2 % more" (a fitter's corrections).
    const block = await blockMake(owner, clientId, setId, [
      { target: 'hip', amount: 10, note: '+1 cm at hip', notedOn: '2026-02-10' },
      { target: 'armholeDepth', amount: -5, note: 'armhole 0.5 cm higher', notedOn: '2026-02-10' },
      { target: 'bustEase', amount: -2, note: 'bust ease 2 % more', notedOn: '2026-02-10' },
    ]);
    const first = await styleMake(owner, { name: `Scoop ${Date.now()}`, defaults: { bustEase: -8, hipEase: 0 } });
    await draftMake(owner, { clientId, setId, fabricId, styleId: first.id, blockId: block.id });
    const second = await styleMake(owner, { defaults: { bustEase: -8, hipEase: 0 } });
    const res = await owner.post('/api/drafts').set(csrfHeaders).send({ clientId, styleId: second.id, fabricId });
    expect(res.status).toBe(201);
    expect(res.body.blockId).toBe(block.id);
    const { input, computed } = res.body.current;
    expect(input.measurements.hip * IN).toBeCloseTo(WORKED_BODY.hip + 10, 6);
    expect(input.measurements.armholeDepth * IN).toBeCloseTo(WORKED_BODY.armholeDepth - 5, 6);
    expect(input.params.bustEase).toBeCloseTo(-10, 9);
    // Worn-stretch arithmetic (trade notes): 10 % negative ease cuts the bust at 0.9 of the body.
    expect(computed.finished.bust).toBeCloseTo(0.9 * WORKED_BODY.bust, 6);
    expect(computed.finished.hip).toBeCloseTo(WORKED_BODY.hip + 10, 6);
  });

  it('makes a revision on every save with a diff of what changed; a save that changes nothing makes none', async () => {
    const w = await draftWorld(owner, studioId);
    const d = await draftMake(owner, w, { params: { bustEase: -8 } });
    const saved = await owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 0, params: { bustEase: -10, frontNeckDepth: 6 * IN } });
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({ revision: 2, version: 1 });
    expect(saved.body.current.kind).toBe('saved');
    expect(saved.body.current.createdBy).toMatchObject({ name: expect.any(String) });
    expect(saved.body.current.changes).toEqual([
      { field: 'params.bustEase', from: -8, to: -10 },
      { field: 'params.frontNeckDepth', from: null, to: 6 * IN },
    ]);
    const same = await owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 1, params: { bustEase: -10, frontNeckDepth: 6 * IN } });
    expect(same.body).toMatchObject({ revision: 2, version: 1 });
    const notes = await owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 1, notes: 'Client prefers it longer', dueOn: null });
    expect(notes.body.current.changes).toEqual([{ field: 'notes', from: '', to: 'Client prefers it longer' }]);
    const list = await cutter.get(`/api/drafts/${d.id}/revisions`);
    expect(list.body.items.map((r: { number: number; kind: string }) => [r.number, r.kind])).toEqual([
      [3, 'saved'],
      [2, 'saved'],
      [1, 'created'],
    ]);
  });

  it('answers a stale save with 409 carrying the current draft, and writes nothing', async () => {
    const w = await draftWorld(owner, studioId);
    const d = await draftMake(owner, w);
    await owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 0, params: { bustEase: -9 } });
    const stale = await owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 0, params: { bustEase: -12 } });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('conflict');
    expect(stale.body.error.current).toMatchObject({ id: d.id, version: 1, revision: 2, params: { bustEase: -9 } });
    // Keeping theirs: save again on top of the current version.
    const kept = await owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 1, params: { bustEase: -12 } });
    expect(kept.body).toMatchObject({ revision: 3, params: { bustEase: -12 } });
  });

  it('lets only one of two simultaneous saves of the same version through', async () => {
    const w = await draftWorld(owner, studioId);
    const d = await draftMake(owner, w);
    const [a, b] = await Promise.all([
      owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 0, params: { bustEase: -7 } }),
      owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 0, params: { bustEase: -11 } }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const revisions = await owner.get(`/api/drafts/${d.id}/revisions`);
    expect(revisions.body.items).toHaveLength(2);
  });

  it('refuses bad values naming the field and writes nothing', async () => {
    const w = await draftWorld(owner, studioId);
    const d = await draftMake(owner, w);
    const range = await owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 0, params: { bustEase: -75, strapWidth: 'wide' }, dueOn: '30/04' });
    expect(range.status).toBe(400);
    expect(range.body.error.fields['params.bustEase']).toMatch(/Bust ease must be between -40 % and 30 %/);
    expect(range.body.error.fields['params.strapWidth']).toMatch(/Strap width must be a number/);
    expect(range.body.error.fields.dueOn).toMatch(/Due date must be a date/);
    // A neckline deeper than the armhole: the engine's own consistency check.
    const deep = await owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 0, params: { frontNeckDepth: 9.5 * IN } });
    expect(deep.status).toBe(400);
    expect(deep.body.error.fields['params.frontNeckDepth']).toMatch(/Front neck depth/);
    const refs = await owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 0, fabricId: 999999 });
    expect(refs.status).toBe(400);
    expect(refs.body.error.fields.fabricId).toMatch(/No such fabric/);
    const after = await owner.get(`/api/drafts/${d.id}`);
    expect(after.body).toMatchObject({ version: 0, revision: 1 });
  });

  it('shows any revision and restores it as a new revision', async () => {
    const w = await draftWorld(owner, studioId);
    const d = await draftMake(owner, w, { params: { bustEase: -8 } });
    await owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 0, params: { bustEase: -12 } });
    const one = await cutter.get(`/api/drafts/${d.id}/revisions/1`);
    expect(one.status).toBe(200);
    expect(one.body).toMatchObject({ number: 1, snapshot: { params: { bustEase: -8 } } });
    expect(one.body.computed.finished.bustEase.percent).toBeCloseTo(-8, 9);
    const restored = await owner.post(`/api/drafts/${d.id}/revisions/1/restore`).set(csrfHeaders).send({ version: 1 });
    expect(restored.status).toBe(200);
    expect(restored.body).toMatchObject({ revision: 3, params: { bustEase: -8 } });
    expect(restored.body.current).toMatchObject({ kind: 'restored', restoredFrom: 1, changes: [{ field: 'params.bustEase', from: -12, to: -8 }] });
    expect((await owner.get(`/api/drafts/${d.id}/revisions/9`)).status).toBe(404);
    const stale = await owner.post(`/api/drafts/${d.id}/revisions/1/restore`).set(csrfHeaders).send({ version: 1 });
    expect(stale.status).toBe(409);
  });

  it('flags a draft whose block changed since its last save', async () => {
    const w = await draftWorld(owner, studioId);
    const d = await draftMake(owner, w);
    await owner
      .post(`/api/clients/${w.clientId}/blocks/${w.blockId}/corrections`)
      .set(csrfHeaders)
      .send({ target: 'bust', amount: 10, note: 'Fuller at the bust', notedOn: '2026-03-01' });
    const read = await owner.get(`/api/drafts/${d.id}`);
    expect(read.body.inputOutdated).toBe(true);
    const saved = await owner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 0, notes: 'redrawn' });
    expect(saved.body.inputOutdated).toBe(false);
    expect(saved.body.current.input.measurements.bust * IN).toBeCloseTo(WORKED_BODY.bust + 10, 6);
    expect(Math.abs(saved.body.current.input.measurements.bust * IN - (WORKED_BODY.bust + 10))).toBeLessThan(SAME_MM);
  });

  it('lists drafts with filters and pages', async () => {
    const w = await draftWorld(owner, studioId);
    const one = await draftMake(owner, w, { dueOn: '2026-05-01' });
    const two = await draftMake(owner, w, { dueOn: '2026-04-01' });
    const res = await cutter.get(`/api/drafts?clientId=${w.clientId}&sort=due`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ total: 2, page: 1, pageSize: 25 });
    expect(res.body.items.map((i: { id: number }) => i.id)).toEqual([two.id, one.id]);
    expect(res.body.items[0]).toMatchObject({ client: { id: w.clientId }, style: { id: w.styleId }, fabric: { id: w.fabricId }, state: 'drafting' });
    const approvedOnly = await cutter.get(`/api/drafts?clientId=${w.clientId}&state=approved,cut`);
    expect(approvedOnly.body.items).toEqual([]);
    const bad = await cutter.get('/api/drafts?state=folded&pageSize=500');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['pageSize', 'state.0']);
  });

  it('lets cutters read drafts but not start or change them, and hides another studio’s', async () => {
    const w = await draftWorld(owner, studioId);
    const d = await draftMake(owner, w);
    const read = await cutter.get(`/api/drafts/${d.id}`);
    expect(read.status).toBe(200);
    expect(read.body).toMatchObject({ editable: false, allowedMoves: [] });
    expect((await cutter.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 0, params: { bustEase: -5 } })).status).toBe(403);
    expect((await cutter.post('/api/drafts').set(csrfHeaders).send({ blockId: w.blockId, styleId: w.styleId, fabricId: w.fabricId })).status).toBe(403);
    expect((await cutter.post(`/api/drafts/${d.id}/revisions/1/restore`).set(csrfHeaders).send({ version: 0 })).status).toBe(403);
    expect((await otherOwner.get(`/api/drafts/${d.id}`)).status).toBe(404);
    expect((await otherOwner.get(`/api/drafts/${d.id}/revisions`)).status).toBe(404);
    expect((await otherOwner.patch(`/api/drafts/${d.id}`).set(csrfHeaders).send({ version: 0, notes: 'x' })).status).toBe(404);
    const theirs = await otherOwner.post('/api/drafts').set(csrfHeaders).send({ blockId: w.blockId, styleId: w.styleId, fabricId: w.fabricId });
    expect(theirs.status).toBe(400);
    expect(theirs.body.error.fields).toMatchObject({ blockId: expect.stringMatching(/No such block/) });
  });
});
