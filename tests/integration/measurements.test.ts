import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ClientView } from '../../shared/schemas/client.js';
import type { MeasurementSetDetail, MeasurementSetList } from '../../shared/schemas/measurement.js';
import { MM_PER_INCH } from '../../shared/units/index.js';
import { csrfHeaders, recordsWorldCreate, studioRows, type RecordsWorld } from './records.fixture.js';

let w: RecordsWorld;
beforeAll(async () => {
  w = await recordsWorldCreate('Measurement Suite Knits');
});
afterAll(() => w.close());

/** Stored lengths are kept to 1/100 mm. */
const STORED_MM_DIGITS = 2;

let sequence = 0;
async function clientAdd(): Promise<ClientView> {
  sequence += 1;
  const res = await w.owner.post('/api/clients').set(csrfHeaders).send({ name: `June Alvarado ${sequence}` });
  expect(res.status).toBe(201);
  return res.body as ClientView;
}

async function setAdd(clientId: number, body: Record<string, unknown>): Promise<MeasurementSetDetail> {
  const res = await w.owner.post(`/api/clients/${clientId}/measurements`).set(csrfHeaders).send(body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as MeasurementSetDetail;
}

const CM_SET = { takenAt: '2026-03-14', unit: 'cm', values: { bust: 88, waist: 72, hip: 96, armholeDepth: 20 } };

describe('POST /api/clients/:clientId/measurements', () => {
  it('takes values in inches, typed as numbers, fractions and vulgar fractions, and stores them in mm', async () => {
    const client = await clientAdd();
    const set = await setAdd(client.id, {
      takenAt: '2026-03-14',
      unit: 'in',
      values: { bust: 36.5, hip: '40 1/4', armholeDepth: '8½', waist: '30 in', neckBase: '' },
      notes: 'Wore a soft-cup bra.',
    });
    // 1 in = 25.4 mm exactly (NIST SP 811, appendix B).
    expect(set.valuesMm.bust).toBeCloseTo(36.5 * MM_PER_INCH, STORED_MM_DIGITS);
    expect(set.valuesMm.hip).toBeCloseTo(40.25 * MM_PER_INCH, STORED_MM_DIGITS);
    expect(set.valuesMm.armholeDepth).toBeCloseTo(8.5 * MM_PER_INCH, STORED_MM_DIGITS);
    expect(set.valuesMm.waist).toBeCloseTo(762, STORED_MM_DIGITS);
    expect(set.valuesMm).not.toHaveProperty('neckBase');
    expect(set).toMatchObject({
      clientId: client.id,
      version: 1,
      versionCount: 1,
      isCurrent: true,
      takenAt: '2026-03-14',
      takenBy: { id: w.ownerId, name: w.ownerName },
      recordedBy: { id: w.ownerId, name: w.ownerName },
      notes: 'Wore a soft-cup bra.',
      studioUnit: 'in',
    });
    expect(set.setId).toBe(set.id);
    expect(set.versions).toEqual([expect.objectContaining({ id: set.id, version: 1 })]);
  });

  it('takes values in centimetres and millimetres, and a typed unit overrides the request unit', async () => {
    const client = await clientAdd();
    const set = await setAdd(client.id, { takenAt: '2026-03-14', unit: 'cm', values: { bust: 88, hip: '960 mm', armholeDepth: '20.5' } });
    expect(set.valuesMm).toEqual({ bust: 880, hip: 960, armholeDepth: 205 });
  });

  it('answers values in mm with the studio unit beside them, and follows a change of studio unit', async () => {
    const client = await clientAdd();
    const set = await setAdd(client.id, CM_SET);
    const studio = await w.owner.patch('/api/studio').set(csrfHeaders).send({ defaultUnit: 'cm' });
    expect(studio.status).toBe(200);
    try {
      const again = (await w.owner.get(`/api/clients/${client.id}/measurements/${set.setId}`)).body as MeasurementSetDetail;
      expect(again.studioUnit).toBe('cm');
      expect(again.valuesMm).toEqual(set.valuesMm);
    } finally {
      await w.owner.patch('/api/studio').set(csrfHeaders).send({ defaultUnit: 'in' });
    }
  });

  it('warns about an implausible set but saves it', async () => {
    const client = await clientAdd();
    // A hip far under the waist and a 32 cm armhole for an 88 cm bust: both worth a second look.
    const set = await setAdd(client.id, { takenAt: '2026-03-14', unit: 'cm', values: { bust: 88, waist: 90, hip: 70, armholeDepth: 32 } });
    expect(set.warnings.map((x) => x.code).sort()).toEqual(['armhole-depth-for-bust', 'hip-below-waist', 'outside-usual-range', 'outside-usual-range']);
    expect(set.warnings.find((x) => x.code === 'hip-below-waist')?.message).toMatch(/27 1\/2 in is far smaller than waist girth 35 3\/8 in/);
  });

  it('refuses bad values naming each field in the unit typed, and writes nothing', async () => {
    const client = await clientAdd();
    const before = await studioRows(w.sequelize, 'measurement_sets', w.studioId);
    const res = await w.owner
      .post(`/api/clients/${client.id}/measurements`)
      .set(csrfHeaders)
      .send({ takenAt: '2999-01-01', unit: 'in', values: { bust: 3, waist: '35 1/0', wrist: -6, shoulderLength: 'abc', tail: 4 } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({
      takenAt: 'Date taken cannot be in the future',
      'values.bust': 'Bust girth must be between 19 3/4 in and 78 5/8 in',
      'values.waist': 'Waist girth: the fraction 1/0 divides by zero',
      'values.wrist': 'Wrist girth must be greater than zero',
      'values.shoulderLength': expect.stringMatching(/^Shoulder length: "abc" is not a length/),
      'values.hip': 'Hip girth is required',
      'values.armholeDepth': 'Armhole depth is required',
      'values.tail': expect.stringMatching(/Unknown field/),
    });
    const unit = await w.owner
      .post(`/api/clients/${client.id}/measurements`)
      .set(csrfHeaders)
      .send({ ...CM_SET, unit: 'yd' });
    expect(unit.body.error.fields).toEqual({ unit: 'Unit must be "in", "cm" or "mm"' });
    const date = await w.owner.post(`/api/clients/${client.id}/measurements`).set(csrfHeaders).send({ ...CM_SET, takenAt: '2026-02-30' });
    expect(date.body.error.fields).toEqual({ takenAt: 'Date taken is not a calendar date' });
    expect(await studioRows(w.sequelize, 'measurement_sets', w.studioId)).toEqual(before);
  });

  it('refuses a new set for an archived client with 409', async () => {
    const client = await clientAdd();
    await w.owner.post(`/api/clients/${client.id}/archive`).set(csrfHeaders);
    const res = await w.owner.post(`/api/clients/${client.id}/measurements`).set(csrfHeaders).send(CM_SET);
    expect(res.status).toBe(409);
    expect(res.body.error.current).toMatchObject({ id: client.id, archived: true });
  });
});

describe('reading measurement sets', () => {
  it('lists the current version of each set, newest fitting first', async () => {
    const client = await clientAdd();
    const first = await setAdd(client.id, { ...CM_SET, takenAt: '2025-09-02' });
    const second = await setAdd(client.id, { ...CM_SET, takenAt: '2026-01-20', values: { ...CM_SET.values, bust: 90 } });
    await w.owner
      .patch(`/api/clients/${client.id}/measurements/${first.setId}`)
      .set(csrfHeaders)
      .send({ ...CM_SET, takenAt: '2025-09-02', version: 1, values: { ...CM_SET.values, hip: 97 } });
    const res = await w.cutter.get(`/api/clients/${client.id}/measurements`);
    expect(res.status).toBe(200);
    const list = res.body as MeasurementSetList;
    expect(list.items.map((s) => [s.setId, s.version, s.versionCount, s.takenAt])).toEqual([
      [second.setId, 1, 1, '2026-01-20'],
      [first.setId, 2, 2, '2025-09-02'],
    ]);
    expect(list.items[1]?.valuesMm.hip).toBe(970);
  });

  it('answers 404 for a set asked for under another client of the same studio', async () => {
    const a = await clientAdd();
    const b = await clientAdd();
    const set = await setAdd(a.id, CM_SET);
    expect((await w.owner.get(`/api/clients/${b.id}/measurements/${set.setId}`)).status).toBe(404);
    expect((await w.owner.get(`/api/clients/${a.id}/measurements/${set.setId}/versions/2`)).status).toBe(404);
    expect((await w.owner.get(`/api/clients/${a.id}/measurements/999999999`)).status).toBe(404);
    const bad = await w.owner.get(`/api/clients/${a.id}/measurements/first`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ setId: 'Measurement set id must be a positive whole number' });
  });
});

describe('who may read and take measurements', () => {
  it('lets a cutter read sets and versions but not take or correct them', async () => {
    const client = await clientAdd();
    const set = await setAdd(client.id, CM_SET);
    const base = `/api/clients/${client.id}/measurements`;
    for (const path of [base, `${base}/${set.setId}`, `${base}/${set.setId}/versions/1`]) {
      expect((await w.cutter.get(path)).status, path).toBe(200);
    }
    const before = await studioRows(w.sequelize, 'measurement_sets', w.studioId);
    expect((await w.cutter.post(base).set(csrfHeaders).send(CM_SET)).status).toBe(403);
    expect((await w.cutter.patch(`${base}/${set.setId}`).set(csrfHeaders).send({ ...CM_SET, version: 1 })).status).toBe(403);
    expect(await studioRows(w.sequelize, 'measurement_sets', w.studioId)).toEqual(before);
  });

  it("answers 401 when signed out and 404 to another studio's owner", async () => {
    const client = await clientAdd();
    const set = await setAdd(client.id, CM_SET);
    const base = `/api/clients/${client.id}/measurements`;
    const paths = [base, `${base}/${set.setId}`, `${base}/${set.setId}/versions/1`];
    for (const path of paths) {
      expect((await w.anonymous.get(path)).status).toBe(401);
      expect((await w.otherOwner.get(path)).status).toBe(404);
    }
    const before = await studioRows(w.sequelize, 'measurement_sets', w.studioId);
    expect((await w.anonymous.post(base).set(csrfHeaders).send(CM_SET)).status).toBe(401);
    expect((await w.otherOwner.post(base).set(csrfHeaders).send(CM_SET)).status).toBe(404);
    expect((await w.otherOwner.patch(`${base}/${set.setId}`).set(csrfHeaders).send({ ...CM_SET, version: 1 })).status).toBe(404);
    expect(await studioRows(w.sequelize, 'measurement_sets', w.studioId)).toEqual(before);
  });
});
