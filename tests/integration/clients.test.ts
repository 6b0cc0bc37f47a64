import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ClientPage, ClientView } from '../../shared/schemas/client.js';
import { csrfHeaders, recordsWorldCreate, studioRows, type RecordsWorld } from './records.fixture.js';

let w: RecordsWorld;
beforeAll(async () => {
  w = await recordsWorldCreate('Clients Suite Knits');
});
afterAll(() => w.close());

let sequence = 0;
/** A name no other test uses, so searches in one test never see another's clients. */
function tag(word: string): string {
  sequence += 1;
  return `${word}${sequence}x${Date.now().toString(36)}`;
}

async function clientAdd(body: Record<string, unknown>): Promise<ClientView> {
  const res = await w.owner.post('/api/clients').set(csrfHeaders).send(body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as ClientView;
}

const SET = { takenAt: '2026-03-14', unit: 'cm', values: { bust: 88, hip: 96, armholeDepth: 20 } };

describe('POST /api/clients', () => {
  it('adds a client for the owner and answers it with its version', async () => {
    const res = await w.owner
      .post('/api/clients')
      .set(csrfHeaders)
      .send({ name: '  Odile Brennan ', email: 'odile@example.com', phone: '+44 20 7946 0011', notes: 'Prefers a wide strap.' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      name: 'Odile Brennan',
      email: 'odile@example.com',
      phone: '+44 20 7946 0011',
      notes: 'Prefers a wide strap.',
      archived: false,
      version: 0,
      lastTakenAt: null,
      measurementSetCount: 0,
    });
    expect((await w.owner.get(`/api/clients/${res.body.id}`)).body).toEqual(res.body);
  });

  it('stores empty e-mail, phone and notes as none', async () => {
    const client = await clientAdd({ name: tag('Blank'), email: '', phone: '', notes: '  ' });
    expect(client).toMatchObject({ email: null, phone: null, notes: null });
  });

  it('refuses bad fields with a message naming each one, and writes nothing', async () => {
    const before = await studioRows(w.sequelize, 'clients', w.studioId);
    const res = await w.owner
      .post('/api/clients')
      .set(csrfHeaders)
      .send({ name: '', email: 'not-an-address', phone: 'call after six', notes: 'x'.repeat(4001), studioId: 99 });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid');
    expect(res.body.error.fields).toEqual({
      name: 'Name is required',
      email: expect.stringMatching(/^E-mail must be an address/),
      phone: expect.stringMatching(/^Phone must be digits/),
      notes: 'Notes must be at most 4000 characters',
      studioId: expect.stringMatching(/Unknown field/),
    });
    expect(await studioRows(w.sequelize, 'clients', w.studioId)).toEqual(before);
  });

  it('refuses a body that is not an object, and a missing name', async () => {
    const list = await w.owner.post('/api/clients').set(csrfHeaders).send([{ name: 'A' }]);
    expect(list.status).toBe(400);
    const missing = await w.owner.post('/api/clients').set(csrfHeaders).send({ email: 'a@example.com' });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields).toEqual({ name: 'Name is required' });
  });
});

describe('who may see and change clients', () => {
  it('answers 401 to a caller who is not signed in', async () => {
    const client = await clientAdd({ name: tag('Anon') });
    expect((await w.anonymous.get('/api/clients')).status).toBe(401);
    expect((await w.anonymous.get(`/api/clients/${client.id}`)).status).toBe(401);
    expect((await w.anonymous.post('/api/clients').set(csrfHeaders).send({ name: 'X' })).status).toBe(401);
  });

  it('shows a cutter the name and notes but never the e-mail or phone', async () => {
    const name = tag('Cutterview');
    const client = await clientAdd({ name, email: `${name}@example.com`, phone: '555 010 0199', notes: 'Short waisted.' });
    const one = await w.cutter.get(`/api/clients/${client.id}`);
    expect(one.status).toBe(200);
    expect(one.body).toMatchObject({ id: client.id, name, notes: 'Short waisted.' });
    expect(one.body).not.toHaveProperty('email');
    expect(one.body).not.toHaveProperty('phone');
    const list = await w.cutter.get('/api/clients').query({ q: name });
    expect(list.body.items).toHaveLength(1);
    expect(list.body.items[0]).not.toHaveProperty('email');
    expect(list.body.items[0]).not.toHaveProperty('phone');
    // Searching by e-mail would reveal it, so a cutter's search matches names only.
    const byEmail = await w.cutter.get('/api/clients').query({ q: `${name}@example` });
    expect(byEmail.body.total).toBe(0);
  });

  it('refuses a cutter every change with 403 and writes nothing', async () => {
    const client = await clientAdd({ name: tag('Cutterchange') });
    const before = await studioRows(w.sequelize, 'clients', w.studioId);
    const calls = [
      w.cutter.post('/api/clients').set(csrfHeaders).send({ name: 'By a cutter' }),
      w.cutter.patch(`/api/clients/${client.id}`).set(csrfHeaders).send({ version: 0, name: 'Renamed' }),
      w.cutter.post(`/api/clients/${client.id}/archive`).set(csrfHeaders).send({}),
      w.cutter.post(`/api/clients/${client.id}/restore`).set(csrfHeaders).send({}),
      w.cutter.delete(`/api/clients/${client.id}`).set(csrfHeaders),
    ];
    for (const res of await Promise.all(calls)) expect(res.status).toBe(403);
    expect(await studioRows(w.sequelize, 'clients', w.studioId)).toEqual(before);
  });

  it("answers 404 to another studio's owner for every route of a client, and lists none of them", async () => {
    const name = tag('Private');
    const client = await clientAdd({ name });
    const before = await studioRows(w.sequelize, 'clients', w.studioId);
    const calls = [
      w.otherOwner.get(`/api/clients/${client.id}`),
      w.otherOwner.patch(`/api/clients/${client.id}`).set(csrfHeaders).send({ version: 0, name: 'Taken over' }),
      w.otherOwner.post(`/api/clients/${client.id}/archive`).set(csrfHeaders).send({}),
      w.otherOwner.post(`/api/clients/${client.id}/restore`).set(csrfHeaders).send({}),
      w.otherOwner.delete(`/api/clients/${client.id}`).set(csrfHeaders),
    ];
    for (const res of await Promise.all(calls)) {
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
    expect((await w.otherOwner.get('/api/clients').query({ q: name, status: 'all' })).body.total).toBe(0);
    expect(await studioRows(w.sequelize, 'clients', w.studioId)).toEqual(before);
  });
});

describe('GET /api/clients', () => {
  it('searches names and e-mail addresses, sorts and pages', async () => {
    const word = tag('Paging');
    for (const first of ['Delia', 'Aoife', 'Cora', 'Bryony', 'Esme']) await clientAdd({ name: `${first} ${word}` });
    await clientAdd({ name: 'Unrelated Person', email: `fitting-${word}@example.com` });

    const page1 = await w.owner.get('/api/clients').query({ q: word, sort: 'name', order: 'asc', pageSize: 2 });
    expect(page1.status).toBe(200);
    const body1 = page1.body as ClientPage;
    expect(body1.total).toBe(6);
    expect(body1.items.map((c) => c.name)).toEqual([`Aoife ${word}`, `Bryony ${word}`]);
    const page3 = (await w.owner.get('/api/clients').query({ q: word, sort: 'name', order: 'asc', pageSize: 2, page: 3 })).body as ClientPage;
    expect(page3.items.map((c) => c.name)).toEqual([`Esme ${word}`, 'Unrelated Person']);
    const desc = (await w.owner.get('/api/clients').query({ q: word, sort: 'name', order: 'desc' })).body as ClientPage;
    expect(desc.items[0]?.name).toBe('Unrelated Person');
    const newest = (await w.owner.get('/api/clients').query({ q: word, sort: 'createdAt', order: 'desc', pageSize: 1 })).body as ClientPage;
    expect(newest.items[0]?.name).toBe('Unrelated Person');
  });

  it('treats % and _ in a search as plain characters and keeps quotes harmless', async () => {
    const word = tag('Wild');
    await clientAdd({ name: `${word} 50% merino` });
    await clientAdd({ name: `${word} 500 merino` });
    await clientAdd({ name: `${word} O'Brien_a` });
    const percent = (await w.owner.get('/api/clients').query({ q: `${word} 50%` })).body as ClientPage;
    expect(percent.items.map((c) => c.name)).toEqual([`${word} 50% merino`]);
    const underscore = (await w.owner.get('/api/clients').query({ q: `Brien_` })).body as ClientPage;
    expect(underscore.items.map((c) => c.name)).toEqual([`${word} O'Brien_a`]);
    const quote = await w.owner.get('/api/clients').query({ q: `' OR 1=1 --` });
    expect(quote.status).toBe(200);
    expect(quote.body.total).toBe(0);
  });

  it('sorts by the latest fitting and counts the sets', async () => {
    const word = tag('Fitted');
    const early = await clientAdd({ name: `Early ${word}` });
    const late = await clientAdd({ name: `Late ${word}` });
    await clientAdd({ name: `Never ${word}` });
    for (const [client, takenAt] of [[early, '2025-01-10'], [late, '2026-02-01'], [late, '2025-06-01']] as const) {
      const res = await w.owner.post(`/api/clients/${client.id}/measurements`).set(csrfHeaders).send({ ...SET, takenAt });
      expect(res.status).toBe(201);
    }
    const sorted = (await w.owner.get('/api/clients').query({ q: word, sort: 'lastTakenAt', order: 'desc' })).body as ClientPage;
    expect(sorted.items.map((c) => [c.name.split(' ')[0], c.lastTakenAt, c.measurementSetCount])).toEqual([
      ['Late', '2026-02-01', 2],
      ['Early', '2025-01-10', 1],
      ['Never', null, 0],
    ]);
  });

  it('refuses bad query parameters naming each one', async () => {
    const res = await w.owner.get('/api/clients').query({ sort: 'email', pageSize: '500', page: 'two', status: 'gone', colour: 'red' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['colour', 'page', 'pageSize', 'sort', 'status']);
    expect(res.body.error.fields.pageSize).toBe('Page size must be a whole number from 1 to 100');
  });
});
