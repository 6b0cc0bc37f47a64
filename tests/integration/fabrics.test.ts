import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FabricPage, FabricView } from '../../shared/schemas/fabric.js';
import { MM_PER_INCH } from '../../shared/units/index.js';
import { csrfHeaders, recordsWorldCreate, studioRows, type RecordsWorld } from './records.fixture.js';

let w: RecordsWorld;
beforeAll(async () => {
  w = await recordsWorldCreate('Fabric Suite Knits');
});
afterAll(() => w.close());

let sequence = 0;
const JERSEY = { fibreContent: '95 % cotton, 5 % elastane', unit: 'in', width: 60, weightGsm: 190, stretchCrosswise: 60, stretchLengthwise: 40, recovery: 'good' };
async function fabricAdd(extra: Record<string, unknown> = {}): Promise<FabricView> {
  sequence += 1;
  const res = await w.owner.post('/api/fabrics').set(csrfHeaders).send({ name: `Heather jersey ${sequence}`, ...JERSEY, ...extra });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as FabricView;
}

describe('POST /api/fabrics', () => {
  it('adds a fabric with its width stored in mm and the studio unit beside it', async () => {
    const fabric = await fabricAdd({ notes: 'Curls at the cut edge.' });
    expect(fabric).toMatchObject({
      fibreContent: '95 % cotton, 5 % elastane',
      weightGsm: 190,
      stretchCrosswise: 60,
      stretchLengthwise: 40,
      recovery: 'good',
      notes: 'Curls at the cut edge.',
      version: 0,
      studioUnit: 'in',
    });
    // 60 in × 25.4 mm (NIST SP 811).
    expect(fabric.widthMm).toBeCloseTo(60 * MM_PER_INCH, 2);
  });

  it('reads a width typed with its own unit, and leaves optional fields empty', async () => {
    const fabric = await fabricAdd({ unit: undefined, width: '150 cm', weightGsm: undefined, stretchLengthwise: undefined, fibreContent: '' });
    expect(fabric).toMatchObject({ widthMm: 1500, weightGsm: null, stretchLengthwise: null, fibreContent: null });
  });

  it('refuses bad fields naming each, and writes nothing', async () => {
    const before = await studioRows(w.sequelize, 'fabrics', w.studioId);
    const res = await w.owner
      .post('/api/fabrics')
      .set(csrfHeaders)
      .send({ name: ' ', unit: 'in', width: 2, weightGsm: 5000, stretchCrosswise: 400, stretchLengthwise: 'lots', recovery: 'springy', colour: 'teal' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({
      name: 'Name is required',
      width: 'Width must be between 11 7/8 in and 137 3/4 in',
      weightGsm: 'Weight must be between 20 and 1200 g/m²',
      stretchCrosswise: 'Crosswise stretch must be between 0 % and 150 %',
      stretchLengthwise: 'Lengthwise stretch must be a number of percent',
      recovery: 'Recovery must be "good", "fair" or "poor"',
      colour: expect.stringMatching(/Unknown field/),
    });
    const noUnit = await w.owner.post('/api/fabrics').set(csrfHeaders).send({ ...JERSEY, name: 'No unit', unit: undefined });
    expect(noUnit.body.error.fields).toEqual({ unit: 'Unit is required with a width: "in", "cm" or "mm"' });
    const missing = await w.owner.post('/api/fabrics').set(csrfHeaders).send({ name: 'Bare' });
    expect(missing.body.error.fields).toEqual({ stretchCrosswise: 'Crosswise stretch is required', recovery: 'Recovery must be "good", "fair" or "poor"' });
    expect(await studioRows(w.sequelize, 'fabrics', w.studioId)).toEqual(before);
  });
});

describe('GET /api/fabrics', () => {
  it('searches name and fibre content, sorts by stretch and pages', async () => {
    const word = `Rib${Date.now().toString(36)}`;
    await fabricAdd({ name: `${word} tencel`, stretchCrosswise: 45 });
    await fabricAdd({ name: `${word} bamboo`, stretchCrosswise: 55 });
    await fabricAdd({ name: 'Swim tricot', fibreContent: `nylon ${word}`, stretchCrosswise: 80 });
    const res = await w.cutter.get('/api/fabrics').query({ q: word, sort: 'stretchCrosswise', order: 'desc', pageSize: 2 });
    expect(res.status).toBe(200);
    const page = res.body as FabricPage;
    expect(page.total).toBe(3);
    expect(page.items.map((f) => f.stretchCrosswise)).toEqual([80, 55]);
    const bad = await w.owner.get('/api/fabrics').query({ sort: 'colour' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ sort: 'Sort must be one of name, updatedAt, stretchCrosswise' });
  });
});

describe('PATCH and DELETE /api/fabrics/:id', () => {
  it('changes the fields sent and answers a stale version with 409 and the current fabric', async () => {
    const fabric = await fabricAdd();
    const ok = await w.owner.patch(`/api/fabrics/${fabric.id}`).set(csrfHeaders).send({ version: 0, stretchCrosswise: 55.5, unit: 'cm', width: 152 });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ stretchCrosswise: 55.5, widthMm: 1520, version: 1, recovery: 'good' });
    const before = await studioRows(w.sequelize, 'fabrics', w.studioId);
    const stale = await w.owner.patch(`/api/fabrics/${fabric.id}`).set(csrfHeaders).send({ version: 0, recovery: 'poor' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.current).toMatchObject({ id: fabric.id, version: 1, recovery: 'good' });
    const bad = await w.owner.patch(`/api/fabrics/${fabric.id}`).set(csrfHeaders).send({ version: 1, recovery: 'so-so' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ recovery: 'Recovery must be "good", "fair" or "poor"' });
    const empty = await w.owner.patch(`/api/fabrics/${fabric.id}`).set(csrfHeaders).send({ version: 1 });
    expect(empty.body.error.fields).toEqual({ _: 'Send at least one field to change' });
    expect(await studioRows(w.sequelize, 'fabrics', w.studioId)).toEqual(before);
  });

  it('clears the width with null and deletes a fabric', async () => {
    const fabric = await fabricAdd();
    const cleared = await w.owner.patch(`/api/fabrics/${fabric.id}`).set(csrfHeaders).send({ version: 0, width: null });
    expect(cleared.body.widthMm).toBeNull();
    expect((await w.owner.delete(`/api/fabrics/${fabric.id}`).set(csrfHeaders)).status).toBe(204);
    expect((await w.owner.get(`/api/fabrics/${fabric.id}`)).status).toBe(404);
  });
});

describe('who may see and change fabrics', () => {
  it("answers 401 signed out, 403 to a cutter's change, 404 to another studio, and writes nothing", async () => {
    const fabric = await fabricAdd();
    const path = `/api/fabrics/${fabric.id}`;
    expect((await w.cutter.get(path)).status).toBe(200);
    const before = await studioRows(w.sequelize, 'fabrics', w.studioId);
    const expectations: [Promise<{ status: number }>, number][] = [
      [w.anonymous.get('/api/fabrics'), 401],
      [w.anonymous.get(path), 401],
      [w.anonymous.post('/api/fabrics').set(csrfHeaders).send(JERSEY), 401],
      [w.cutter.post('/api/fabrics').set(csrfHeaders).send({ ...JERSEY, name: 'Cutter fabric' }), 403],
      [w.cutter.patch(path).set(csrfHeaders).send({ version: 0, name: 'Renamed' }), 403],
      [w.cutter.delete(path).set(csrfHeaders), 403],
      [w.otherOwner.get(path), 404],
      [w.otherOwner.patch(path).set(csrfHeaders).send({ version: 0, name: 'Mine now' }), 404],
      [w.otherOwner.delete(path).set(csrfHeaders), 404],
    ];
    for (const [call, status] of expectations) expect((await call).status).toBe(status);
    const theirs = (await w.otherOwner.get('/api/fabrics').query({ q: fabric.name })).body as FabricPage;
    expect(theirs.total).toBe(0);
    expect(await studioRows(w.sequelize, 'fabrics', w.studioId)).toEqual(before);
  });
});
