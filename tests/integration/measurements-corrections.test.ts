import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ClientView } from '../../shared/schemas/client.js';
import type { MeasurementSetDetail, MeasurementSetView } from '../../shared/schemas/measurement.js';
import { memberAdd } from '../helpers/auth.js';
import { csrfHeaders, recordsWorldCreate, studioRows, type RecordsWorld } from './records.fixture.js';

let w: RecordsWorld;
beforeAll(async () => {
  w = await recordsWorldCreate('Corrections Suite Knits');
});
afterAll(() => w.close());

const TAKEN = { takenAt: '2026-02-11', unit: 'in', values: { bust: 35, waist: 28, hip: 38, armholeDepth: 8.25 }, notes: 'First fitting.' };

let sequence = 0;
async function setOfNewClient(): Promise<{ client: ClientView; set: MeasurementSetDetail; base: string }> {
  sequence += 1;
  const client = (await w.owner.post('/api/clients').set(csrfHeaders).send({ name: `Maren Holt ${sequence}` })).body as ClientView;
  const res = await w.owner.post(`/api/clients/${client.id}/measurements`).set(csrfHeaders).send(TAKEN);
  expect(res.status).toBe(201);
  const set = res.body as MeasurementSetDetail;
  return { client, set, base: `/api/clients/${client.id}/measurements/${set.setId}` };
}

describe('PATCH /api/clients/:clientId/measurements/:setId (a correction)', () => {
  it('adds a new version and keeps the old one readable, with who and when', async () => {
    const { set, base } = await setOfNewClient();
    // A second owner corrects the hip; the set keeps who took it at the fitting.
    const second = await memberAdd(w.app, w.studioId, 'owner', { name: 'Idris Penrose' });
    const res = await second.agent
      .patch(base)
      .set(csrfHeaders)
      .send({ ...TAKEN, version: 1, values: { ...TAKEN.values, hip: '38 1/2' }, notes: 'Hip re-measured over the fullest part.' });
    expect(res.status).toBe(200);
    const now = res.body as MeasurementSetDetail;
    expect(now).toMatchObject({
      setId: set.setId,
      version: 2,
      versionCount: 2,
      isCurrent: true,
      takenBy: { id: w.ownerId, name: w.ownerName },
      recordedBy: { id: second.member.id, name: 'Idris Penrose' },
      notes: 'Hip re-measured over the fullest part.',
    });
    expect(now.id).not.toBe(set.id);
    expect(now.valuesMm.hip).toBeCloseTo(977.9, 2); // 38.5 in × 25.4 mm (NIST SP 811)
    expect(now.versions.map((v) => [v.version, v.recordedBy.name])).toEqual([
      [2, 'Idris Penrose'],
      [1, w.ownerName],
    ]);

    const old = (await w.cutter.get(`${base}/versions/1`)).body as MeasurementSetView;
    expect(old).toMatchObject({ id: set.id, version: 1, versionCount: 2, isCurrent: false, notes: 'First fitting.' });
    expect(old.valuesMm).toEqual(set.valuesMm);
  });

  it('answers a correction of a superseded version with 409 carrying the current version, and writes nothing', async () => {
    const { base } = await setOfNewClient();
    expect((await w.owner.patch(base).set(csrfHeaders).send({ ...TAKEN, version: 1, notes: 'Tablet' })).status).toBe(200);
    const before = await studioRows(w.sequelize, 'measurement_sets', w.studioId);
    const stale = await w.owner.patch(base).set(csrfHeaders).send({ ...TAKEN, version: 1, notes: 'Laptop, opened earlier' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('conflict');
    expect(stale.body.error.current).toMatchObject({ version: 2, versionCount: 2, notes: 'Tablet' });
    expect(await studioRows(w.sequelize, 'measurement_sets', w.studioId)).toEqual(before);
  });

  it('lets only one of two simultaneous corrections of the same version through', async () => {
    const { base } = await setOfNewClient();
    const results = await Promise.all(
      ['A', 'B', 'C'].map((n) => w.owner.patch(base).set(csrfHeaders).send({ ...TAKEN, version: 1, notes: `Correction ${n}` })),
    );
    expect(results.map((r) => r.status).sort()).toEqual([200, 409, 409]);
    const now = (await w.owner.get(base)).body as MeasurementSetDetail;
    expect(now.versionCount).toBe(2);
  });

  it('refuses a correction without its version, or with bad values, naming the field and writing nothing', async () => {
    const { base } = await setOfNewClient();
    const before = await studioRows(w.sequelize, 'measurement_sets', w.studioId);
    const noVersion = await w.owner.patch(base).set(csrfHeaders).send(TAKEN);
    expect(noVersion.status).toBe(400);
    expect(noVersion.body.error.fields).toEqual({ version: 'Version is required: send the version you edited' });
    const badValues = await w.owner
      .patch(base)
      .set(csrfHeaders)
      .send({ ...TAKEN, version: 1, unit: 'cm', values: { bust: 88, hip: 96, armholeDepth: 200 } });
    expect(badValues.status).toBe(400);
    expect(badValues.body.error.fields).toEqual({ 'values.armholeDepth': 'Armhole depth must be between 10 cm and 40 cm' });
    const zero = await w.owner.patch(base).set(csrfHeaders).send({ ...TAKEN, version: 0 });
    expect(zero.body.error.fields).toEqual({ version: 'Version must be 1 or more' });
    expect(await studioRows(w.sequelize, 'measurement_sets', w.studioId)).toEqual(before);
  });

  it('answers 404 for a set that does not exist, and 409 once the client is archived', async () => {
    const { client, base } = await setOfNewClient();
    const missing = await w.owner.patch(`/api/clients/${client.id}/measurements/999999999`).set(csrfHeaders).send({ ...TAKEN, version: 1 });
    expect(missing.status).toBe(404);
    await w.owner.post(`/api/clients/${client.id}/archive`).set(csrfHeaders);
    const archived = await w.owner.patch(base).set(csrfHeaders).send({ ...TAKEN, version: 1 });
    expect(archived.status).toBe(409);
    expect(archived.body.error.message).toMatch(/archived/);
  });
});
