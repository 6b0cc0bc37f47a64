import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ClientPage } from '../../shared/schemas/client.js';
import type { FabricPage } from '../../shared/schemas/fabric.js';
import type { MeasurementSetList } from '../../shared/schemas/measurement.js';
import { DEMO_CLIENTS, DEMO_FABRICS, demoRecordsSeed } from '../../server/seed/demo-records.js';
import { studioSignUp, type Agent } from '../helpers/auth.js';
import { testAppCreate } from '../helpers/test-app.js';

const { app, sequelize, close } = testAppCreate();
let owner: Agent;
let studioId: number;

beforeAll(async () => {
  const signed = await studioSignUp(app, { studioName: 'Demo Seed Knits' });
  owner = signed.agent;
  studioId = signed.studio.id;
});
afterAll(close);

describe('demo records seed', () => {
  it('adds the demo clients and fabrics once; a second run adds nothing', async () => {
    expect(await demoRecordsSeed(sequelize, studioId)).toEqual({ clients: DEMO_CLIENTS.length, fabrics: DEMO_FABRICS.length });
    expect(await demoRecordsSeed(sequelize, studioId)).toEqual({ clients: 0, fabrics: 0 });
    const all = (await owner.get('/api/clients').query({ status: 'all' })).body as ClientPage;
    expect(all.total).toBe(DEMO_CLIENTS.length);
    const active = (await owner.get('/api/clients')).body as ClientPage;
    expect(active.total).toBe(DEMO_CLIENTS.filter((c) => !c.archived).length);
    expect(((await owner.get('/api/fabrics')).body as FabricPage).total).toBe(DEMO_FABRICS.length);
  });

  it('gives the clients realistic histories: several fittings, a correction, and no plausibility warnings', async () => {
    const all = (await owner.get('/api/clients').query({ status: 'all', sort: 'name' })).body as ClientPage;
    let sets = 0;
    let corrected = 0;
    for (const client of all.items) {
      const list = (await owner.get(`/api/clients/${client.id}/measurements`)).body as MeasurementSetList;
      expect(list.items.length, client.name).toBe(DEMO_CLIENTS.find((d) => d.name === client.name)?.fittings.length);
      for (const set of list.items) {
        expect(set.warnings, `${client.name} ${set.takenAt}`).toEqual([]);
        sets += 1;
        if (set.versionCount > 1) corrected += 1;
      }
    }
    expect(sets).toBeGreaterThanOrEqual(8);
    expect(corrected).toBe(1);
  });
});
