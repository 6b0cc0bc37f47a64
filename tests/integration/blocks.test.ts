import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { csrfHeaders, memberAdd, studioSignUp, type Agent } from '../helpers/auth.js';
import { Client } from '../../server/models/index.js';
import { testAppCreate } from '../helpers/test-app.js';
import { blockMake, clientWithSet, draftMake, fabricAdd, IN, setAdd, setCorrect, styleMake, WORKED_BODY } from './drafts-fixtures.js';

const { app, close } = testAppCreate();
afterAll(close);

let owner: Agent;
let cutter: Agent;
let otherOwner: Agent;
let studioId: number;

beforeAll(async () => {
  const a = await studioSignUp(app, { studioName: 'Blocks Studio' });
  owner = a.agent;
  studioId = a.studio.id;
  cutter = (await memberAdd(app, a.studio.id, 'cutter')).agent;
  otherOwner = (await studioSignUp(app, { studioName: 'Blocks Other Studio' })).agent;
});

// Fit corrections as a fitter writes them: "+1 cm at hip", "armhole 0.5 cm higher", "bust ease 2 % more".
const CORRECTIONS = [
  { target: 'hip', amount: 10, note: '+1 cm at hip: pulled across the seat', notedOn: '2026-02-10' },
  { target: 'armholeDepth', amount: -5, note: 'armhole 0.5 cm higher: gaped at the side', notedOn: '2026-02-10' },
  { target: 'bustEase', amount: -2, note: 'bust ease 2 % more negative: loose at the underarm', notedOn: '2026-02-24' },
];

describe('blocks', () => {
  it('makes a block from a measurement set with its fit corrections, each with note and date', async () => {
    const { clientId, setId } = await clientWithSet(studioId);
    const res = await owner.post(`/api/clients/${clientId}/blocks`).set(csrfHeaders).send({ measurementSetId: setId, corrections: CORRECTIONS });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ clientId, measurementSetId: setId, measuredOn: '2026-02-10', newerSetVersionId: null, lastUsedAt: null, version: 0 });
    expect(res.body.name).toMatch(/2026-02-10/);
    // The set's figures in mm, exactly as measured: 38 in = 965.2 mm (1 in = 25.4 mm, NIST SP 811).
    expect(res.body.measurements.bust).toBeCloseTo(965.2, 9);
    expect(res.body.corrections.map((k: { target: string; amount: number; notedOn: string }) => [k.target, k.amount, k.notedOn])).toEqual([
      ['hip', 10, '2026-02-10'],
      ['armholeDepth', -5, '2026-02-10'],
      ['bustEase', -2, '2026-02-24'],
    ]);
    expect(res.body.corrections[0].createdBy).toMatchObject({ name: expect.any(String) });
    const list = await cutter.get(`/api/clients/${clientId}/blocks`);
    expect(list.status).toBe(200);
    expect(list.body.items.map((b: { id: number }) => b.id)).toEqual([res.body.id]);
  });

  it('adds and removes corrections', async () => {
    const { clientId, setId } = await clientWithSet(studioId);
    const block = await blockMake(owner, clientId, setId);
    const added = await owner
      .post(`/api/clients/${clientId}/blocks/${block.id}/corrections`)
      .set(csrfHeaders)
      .send({ target: 'length', amount: 2 * IN, note: 'Longer over the hip', notedOn: '2026-03-01' });
    expect(added.status).toBe(201);
    expect(added.body.corrections).toHaveLength(1);
    const correctionId = added.body.corrections[0].id;
    const removed = await owner.delete(`/api/clients/${clientId}/blocks/${block.id}/corrections/${correctionId}`).set(csrfHeaders);
    expect(removed.status).toBe(200);
    expect(removed.body.corrections).toEqual([]);
    const again = await owner.delete(`/api/clients/${clientId}/blocks/${block.id}/corrections/${correctionId}`).set(csrfHeaders);
    expect(again.status).toBe(404);
  });

  it('refuses bad corrections naming the field, and writes nothing', async () => {
    const { clientId, setId } = await clientWithSet(studioId);
    const res = await owner
      .post(`/api/clients/${clientId}/blocks`)
      .set(csrfHeaders)
      .send({
        measurementSetId: setId,
        corrections: [
          { target: 'hip', amount: 400, note: 'far too much', notedOn: '2026-02-10' },
          { target: 'elbow', amount: 5, note: 'no such thing', notedOn: '2026-02-10' },
          { target: 'bust', amount: 5, note: '', notedOn: '10/02/2026' },
        ],
      });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['corrections.0.amount']).toMatch(/within ±5 7\/8 in/);
    expect(res.body.error.fields['corrections.1.target']).toMatch(/Correction target must be one of/);
    expect(res.body.error.fields['corrections.2.note']).toMatch(/Note is required/);
    expect(res.body.error.fields['corrections.2.notedOn']).toMatch(/Date must be a date like 2026-03-14/);
    expect((await owner.get(`/api/clients/${clientId}/blocks`)).body.items).toEqual([]);
  });

  it('refuses a measurement set of another client', async () => {
    const a = await clientWithSet(studioId);
    const b = await clientWithSet(studioId);
    const res = await owner.post(`/api/clients/${a.clientId}/blocks`).set(csrfHeaders).send({ measurementSetId: b.setId });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.measurementSetId).toMatch(/No such measurement set/);
  });

  it('points out a newer version of its set and moves onto it', async () => {
    const { clientId, setId } = await clientWithSet(studioId);
    const block = await blockMake(owner, clientId, setId);
    const corrected = await setCorrect(studioId, clientId, setId, { ...WORKED_BODY, hip: 44 * IN });
    const read = await owner.get(`/api/clients/${clientId}/blocks/${block.id}`);
    expect(read.body.newerSetVersionId).toBe(corrected);
    const moved = await owner.patch(`/api/clients/${clientId}/blocks/${block.id}`).set(csrfHeaders).send({ version: 0, measurementSetId: corrected });
    expect(moved.status).toBe(200);
    expect(moved.body).toMatchObject({ measurementSetId: corrected, newerSetVersionId: null, version: 1 });
    expect(moved.body.measurements.hip).toBeCloseTo(44 * IN, 9);
  });

  it('answers a stale block save with 409 and the block as it is now', async () => {
    const { clientId, setId } = await clientWithSet(studioId);
    const block = await blockMake(owner, clientId, setId);
    await owner.patch(`/api/clients/${clientId}/blocks/${block.id}`).set(csrfHeaders).send({ version: 0, name: 'Spring block' });
    const stale = await owner.patch(`/api/clients/${clientId}/blocks/${block.id}`).set(csrfHeaders).send({ version: 0, name: 'Other name' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.current).toMatchObject({ id: block.id, name: 'Spring block', version: 1 });
  });

  it('offers the block the client’s last draft used, else their newest block', async () => {
    const { clientId, setId } = await clientWithSet(studioId);
    const none = await owner.get(`/api/clients/${clientId}/blocks/to-use`);
    expect(none.body).toEqual({ block: null, reason: 'none' });
    const older = await blockMake(owner, clientId, setId, [CORRECTIONS[0]]);
    const newerSet = await setAdd(studioId, clientId, WORKED_BODY);
    const newer = await blockMake(owner, clientId, newerSet);
    const newest = await cutter.get(`/api/clients/${clientId}/blocks/to-use`);
    expect(newest.body).toMatchObject({ reason: 'newest', block: { id: newer.id } });
    const styleId = (await styleMake(owner)).id;
    const fabricId = await fabricAdd(studioId);
    await draftMake(owner, { clientId, setId, fabricId, styleId, blockId: older.id });
    const used = await owner.get(`/api/clients/${clientId}/blocks/to-use`);
    expect(used.body).toMatchObject({ reason: 'last-used', block: { id: older.id, corrections: [{ target: 'hip', amount: 10 }] } });
    const list = await owner.get(`/api/clients/${clientId}/blocks`);
    expect(list.body.items[0]).toMatchObject({ id: older.id, lastUsedAt: expect.any(String) });
  });

  it('keeps an archived client’s blocks read-only until the client is restored', async () => {
    const { clientId, setId } = await clientWithSet(studioId);
    const block = await blockMake(owner, clientId, setId);
    const client = await Client.findByPk(clientId);
    await client!.set({ archived: true }).save();
    const add = await owner.post(`/api/clients/${clientId}/blocks/${block.id}/corrections`).set(csrfHeaders).send(CORRECTIONS[0]);
    expect(add.status).toBe(409);
    expect(add.body.error.message).toMatch(/archived/);
    expect((await owner.post(`/api/clients/${clientId}/blocks`).set(csrfHeaders).send({ measurementSetId: setId })).status).toBe(409);
    expect((await owner.get(`/api/clients/${clientId}/blocks/${block.id}`)).status).toBe(200);
  });

  it('lets cutters read blocks but not make or change them, and hides another studio’s', async () => {
    const { clientId, setId } = await clientWithSet(studioId);
    const block = await blockMake(owner, clientId, setId);
    expect((await cutter.get(`/api/clients/${clientId}/blocks/${block.id}`)).status).toBe(200);
    expect((await cutter.post(`/api/clients/${clientId}/blocks`).set(csrfHeaders).send({ measurementSetId: setId })).status).toBe(403);
    expect(
      (await cutter.post(`/api/clients/${clientId}/blocks/${block.id}/corrections`).set(csrfHeaders).send(CORRECTIONS[0])).status,
    ).toBe(403);
    expect((await otherOwner.get(`/api/clients/${clientId}/blocks`)).status).toBe(404);
    expect((await otherOwner.get(`/api/clients/${clientId}/blocks/${block.id}`)).status).toBe(404);
    expect((await otherOwner.post(`/api/clients/${clientId}/blocks`).set(csrfHeaders).send({ measurementSetId: setId })).status).toBe(404);
  });
});
