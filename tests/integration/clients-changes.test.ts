import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ClientPage, ClientView } from '../../shared/schemas/client.js';
import { csrfHeaders, recordsWorldCreate, studioRows, type RecordsWorld } from './records.fixture.js';

let w: RecordsWorld;
beforeAll(async () => {
  w = await recordsWorldCreate('Client Changes Knits');
});
afterAll(() => w.close());

let sequence = 0;
async function clientAdd(extra: Record<string, unknown> = {}): Promise<ClientView> {
  sequence += 1;
  const res = await w.owner
    .post('/api/clients')
    .set(csrfHeaders)
    .send({ name: `Tamsin Okafor ${sequence}`, email: `tamsin${sequence}@example.com`, ...extra });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as ClientView;
}

const patch = (id: number, body: unknown) => w.owner.patch(`/api/clients/${id}`).set(csrfHeaders).send(body as object);

describe('PATCH /api/clients/:id', () => {
  it('changes the fields sent, clears e-mail with null, and moves the version on', async () => {
    const client = await clientAdd({ phone: '555 010 0100' });
    const res = await patch(client.id, { version: 0, name: 'Tamsin Okafor-Reid', email: null, notes: 'Moved to a longer strap.' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      id: client.id,
      name: 'Tamsin Okafor-Reid',
      email: null,
      phone: '555 010 0100',
      notes: 'Moved to a longer strap.',
      version: 1,
    });
  });

  it('answers a stale version with 409 carrying the current client, and keeps the newer change', async () => {
    const client = await clientAdd();
    expect((await patch(client.id, { version: 0, notes: 'First edit' })).status).toBe(200);
    const before = await studioRows(w.sequelize, 'clients', w.studioId);
    const stale = await patch(client.id, { version: 0, notes: 'Edit from an old screen' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('conflict');
    expect(stale.body.error.message).toMatch(/changed this client/);
    expect(stale.body.error.current).toMatchObject({ id: client.id, notes: 'First edit', version: 1 });
    expect(await studioRows(w.sequelize, 'clients', w.studioId)).toEqual(before);
  });

  it('lets only one of two simultaneous edits of the same version through', async () => {
    const client = await clientAdd();
    const results = await Promise.all([patch(client.id, { version: 0, notes: 'Tablet' }), patch(client.id, { version: 0, notes: 'Laptop' })]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    const now = (await w.owner.get(`/api/clients/${client.id}`)).body as ClientView;
    expect(now.version).toBe(1);
    const winner = results.find((r) => r.status === 200);
    expect(now.notes).toBe(winner?.body.notes);
  });

  it('refuses bad input naming the field, and writes nothing', async () => {
    const client = await clientAdd();
    const before = await studioRows(w.sequelize, 'clients', w.studioId);
    const cases: [unknown, string][] = [
      [{ name: 'No version' }, 'version'],
      [{ version: 'one', name: 'A' }, 'version'],
      [{ version: 0 }, '_'],
      [{ version: 0, name: '   ' }, 'name'],
      [{ version: 0, email: 'ada.example.com' }, 'email'],
      [{ version: 0, archived: true }, 'archived'],
      [{ version: 0, phone: 12345 }, 'phone'],
    ];
    for (const [body, field] of cases) {
      const res = await patch(client.id, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(Object.keys(res.body.error.fields), JSON.stringify(body)).toContain(field);
    }
    expect(await studioRows(w.sequelize, 'clients', w.studioId)).toEqual(before);
  });

  it('refuses an id that is not a positive whole number, and answers 404 for one that does not exist', async () => {
    const bad = await w.owner.get('/api/clients/abc');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ id: 'Client id must be a positive whole number' });
    expect((await w.owner.get('/api/clients/0')).status).toBe(400);
    expect((await w.owner.get('/api/clients/4000000000')).status).toBe(404);
  });
});

describe('archive and restore', () => {
  it('archives a client out of the active list and restores them', async () => {
    const client = await clientAdd({ name: 'Priya Castellan archive-case' });
    const archived = await w.owner.post(`/api/clients/${client.id}/archive`).set(csrfHeaders).send({});
    expect(archived.status).toBe(200);
    expect(archived.body).toMatchObject({ archived: true, version: 1 });
    const q = 'archive-case';
    expect(((await w.owner.get('/api/clients').query({ q })).body as ClientPage).total).toBe(0);
    expect(((await w.owner.get('/api/clients').query({ q, status: 'archived' })).body as ClientPage).total).toBe(1);
    expect(((await w.owner.get('/api/clients').query({ q, status: 'all' })).body as ClientPage).total).toBe(1);
    // Archiving twice changes nothing.
    const again = await w.owner.post(`/api/clients/${client.id}/archive`).set(csrfHeaders);
    expect(again.body).toMatchObject({ archived: true, version: 1 });
    const restored = await w.owner.post(`/api/clients/${client.id}/restore`).set(csrfHeaders).send({});
    expect(restored.status).toBe(200);
    expect(restored.body).toMatchObject({ archived: false, version: 2 });
    expect(((await w.owner.get('/api/clients').query({ q })).body as ClientPage).total).toBe(1);
  });

  it('keeps an archived client read-only until restored', async () => {
    const client = await clientAdd();
    const archived = (await w.owner.post(`/api/clients/${client.id}/archive`).set(csrfHeaders)).body as ClientView;
    const res = await patch(client.id, { version: archived.version, notes: 'Too late' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/Restore the client/);
    expect(res.body.error.current).toMatchObject({ id: client.id, archived: true });
  });

  it('refuses a body on archive', async () => {
    const client = await clientAdd();
    const res = await w.owner.post(`/api/clients/${client.id}/archive`).set(csrfHeaders).send({ archived: false });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('archived');
  });
});

describe('DELETE /api/clients/:id', () => {
  it('deletes a client entered by mistake, who has no measurements', async () => {
    const client = await clientAdd();
    const res = await w.owner.delete(`/api/clients/${client.id}`).set(csrfHeaders);
    expect(res.status).toBe(204);
    expect((await w.owner.get(`/api/clients/${client.id}`)).status).toBe(404);
  });

  it('never deletes a client with measurement sets: 409, and the client stays', async () => {
    const client = await clientAdd();
    const set = await w.owner
      .post(`/api/clients/${client.id}/measurements`)
      .set(csrfHeaders)
      .send({ takenAt: '2026-01-05', unit: 'in', values: { bust: 36, hip: 38, armholeDepth: 8 } });
    expect(set.status).toBe(201);
    const res = await w.owner.delete(`/api/clients/${client.id}`).set(csrfHeaders);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/Archive the client instead/);
    expect(res.body.error.current).toMatchObject({ id: client.id, measurementSetCount: 1 });
    expect((await w.owner.get(`/api/clients/${client.id}`)).status).toBe(200);
  });
});
