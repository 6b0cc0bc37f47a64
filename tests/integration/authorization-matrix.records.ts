/**
 * Authorization matrix entries of the records routes (clients, measurement sets, fabrics),
 * spread into MATRIX_ENTRIES. Records are made in studio A through the API as its owner; a
 * route that changes or deletes one gets a fresh record per call.
 */
import { csrfHeaders } from '../helpers/auth.js';
import type { MatrixEntry, MatrixFixture, Who } from './authorization-matrix.entries.js';

const signedIn = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: status, owner: status, otherOwner: status });
const ownerOnly = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: 403, owner: status, otherOwner: status });
/** Any member of studio A reads it; studio B's owner must not learn it exists. */
const memberRecord = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: status, owner: status, otherOwner: 404 });
const ownerRecord = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: 403, owner: status, otherOwner: 404 });

const SET = { takenAt: '2026-03-14', unit: 'cm', values: { bust: 88, hip: 96, armholeDepth: 20 } };
const FABRIC = { name: 'Matrix jersey', stretchCrosswise: 50, recovery: 'good' };

async function created(fx: MatrixFixture, path: string, body: object): Promise<{ id: number; setId?: number }> {
  const res = await fx.agent('owner').post(path).set(csrfHeaders).send(body);
  if (res.status !== 201) throw new Error(`matrix fixture: POST ${path} answered ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; setId?: number };
}

const clientNew = (fx: MatrixFixture) => created(fx, '/api/clients', { name: 'Matrix Client' });
async function setNew(fx: MatrixFixture): Promise<{ clientId: number; setId: number }> {
  const client = await clientNew(fx);
  const set = await created(fx, `/api/clients/${client.id}/measurements`, SET);
  return { clientId: client.id, setId: set.setId ?? set.id };
}
const fabricNew = (fx: MatrixFixture) => created(fx, '/api/fabrics', FABRIC);

// Read-only routes share one record per fixture.
const shared = new WeakMap<MatrixFixture, Promise<{ clientId: number; setId: number; fabricId: number }>>();
function sharedRecords(fx: MatrixFixture) {
  let records = shared.get(fx);
  if (!records) {
    records = (async () => ({ ...(await setNew(fx)), fabricId: (await fabricNew(fx)).id }))();
    shared.set(fx, records);
  }
  return records;
}

export const RECORDS_MATRIX_ENTRIES: MatrixEntry[] = [
  { method: 'GET', route: '/api/clients', expect: signedIn(200) },
  { method: 'POST', route: '/api/clients', expect: ownerOnly(201), request: () => ({ body: { name: 'Matrix Client' } }) },
  {
    method: 'GET',
    route: '/api/clients/:id',
    expect: memberRecord(200),
    request: async (fx) => ({ path: `/api/clients/${(await sharedRecords(fx)).clientId}` }),
  },
  {
    method: 'PATCH',
    route: '/api/clients/:id',
    expect: ownerRecord(200),
    request: async (fx) => ({ path: `/api/clients/${(await clientNew(fx)).id}`, body: { version: 0, notes: 'Matrix' } }),
  },
  {
    method: 'POST',
    route: '/api/clients/:id/archive',
    expect: ownerRecord(200),
    request: async (fx) => ({ path: `/api/clients/${(await clientNew(fx)).id}/archive` }),
  },
  {
    method: 'POST',
    route: '/api/clients/:id/restore',
    expect: ownerRecord(200),
    request: async (fx) => ({ path: `/api/clients/${(await clientNew(fx)).id}/restore` }),
  },
  {
    method: 'DELETE',
    route: '/api/clients/:id',
    expect: ownerRecord(204),
    request: async (fx) => ({ path: `/api/clients/${(await clientNew(fx)).id}` }),
  },
  {
    method: 'GET',
    route: '/api/clients/:clientId/measurements',
    expect: memberRecord(200),
    request: async (fx) => ({ path: `/api/clients/${(await sharedRecords(fx)).clientId}/measurements` }),
  },
  {
    method: 'POST',
    route: '/api/clients/:clientId/measurements',
    expect: ownerRecord(201),
    request: async (fx) => ({ path: `/api/clients/${(await clientNew(fx)).id}/measurements`, body: SET }),
  },
  {
    method: 'GET',
    route: '/api/clients/:clientId/measurements/:setId',
    expect: memberRecord(200),
    request: async (fx) => {
      const { clientId, setId } = await sharedRecords(fx);
      return { path: `/api/clients/${clientId}/measurements/${setId}` };
    },
  },
  {
    method: 'PATCH',
    route: '/api/clients/:clientId/measurements/:setId',
    expect: ownerRecord(200),
    request: async (fx) => {
      const { clientId, setId } = await setNew(fx);
      return { path: `/api/clients/${clientId}/measurements/${setId}`, body: { ...SET, version: 1 } };
    },
  },
  {
    method: 'GET',
    route: '/api/clients/:clientId/measurements/:setId/versions/:version',
    expect: memberRecord(200),
    request: async (fx) => {
      const { clientId, setId } = await sharedRecords(fx);
      return { path: `/api/clients/${clientId}/measurements/${setId}/versions/1` };
    },
  },
  { method: 'GET', route: '/api/fabrics', expect: signedIn(200) },
  { method: 'POST', route: '/api/fabrics', expect: ownerOnly(201), request: () => ({ body: FABRIC }) },
  {
    method: 'GET',
    route: '/api/fabrics/:id',
    expect: memberRecord(200),
    request: async (fx) => ({ path: `/api/fabrics/${(await sharedRecords(fx)).fabricId}` }),
  },
  {
    method: 'PATCH',
    route: '/api/fabrics/:id',
    expect: ownerRecord(200),
    request: async (fx) => ({ path: `/api/fabrics/${(await fabricNew(fx)).id}`, body: { version: 0, notes: 'Matrix' } }),
  },
  {
    method: 'DELETE',
    route: '/api/fabrics/:id',
    expect: ownerRecord(204),
    request: async (fx) => ({ path: `/api/fabrics/${(await fabricNew(fx)).id}` }),
  },
];
