/**
 * Authorization matrix entries of the drafting routes (styles, blocks, drafts, revisions,
 * states, the work queue), spread into MATRIX_ENTRIES. Records are made in studio A (clients,
 * sets and fabrics straight in the database, the rest through the API as its owner); a route
 * that changes one gets a fresh record per call so its version is known.
 */
import { csrfHeaders } from '../helpers/auth.js';
import type { MatrixEntry, MatrixFixture, Who } from './authorization-matrix.entries.js';
import { blockMake, draftMake, draftWorld, styleMake, type DraftWorld } from './drafts-fixtures.js';

const signedIn = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: status, owner: status, otherOwner: status });
const ownerOnly = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: 403, owner: status, otherOwner: status });
/** Any member of studio A reads it; studio B's owner must not learn it exists. */
const memberRecord = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: status, owner: status, otherOwner: 404 });
const ownerRecord = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: 403, owner: status, otherOwner: 404 });

const worlds = new WeakMap<MatrixFixture, Promise<DraftWorld & { draftId: number }>>();
/** One client, set, fabric, style, block and draft of studio A, shared by the read-only routes. */
function world(fx: MatrixFixture) {
  let w = worlds.get(fx);
  if (!w) {
    w = (async () => {
      const base = await draftWorld(fx.agent('owner'), fx.studioId);
      return { ...base, draftId: (await draftMake(fx.agent('owner'), base)).id };
    })();
    worlds.set(fx, w);
  }
  return w;
}

const owner = (fx: MatrixFixture) => fx.agent('owner');
const freshDraft = async (fx: MatrixFixture) => (await draftMake(owner(fx), await world(fx))).id;
const freshBlock = async (fx: MatrixFixture) => {
  const w = await world(fx);
  return { clientId: w.clientId, blockId: (await blockMake(owner(fx), w.clientId, w.setId)).id };
};
const CORRECTION = { target: 'hip', amount: 10, note: '+1 cm at hip', notedOn: '2026-03-14' };

export const DRAFTS_MATRIX_ENTRIES: MatrixEntry[] = [
  { method: 'GET', route: '/api/styles', expect: signedIn(200) },
  {
    method: 'POST',
    route: '/api/styles',
    expect: ownerOnly(201),
    request: (fx) => ({ body: { name: `Matrix style ${fx.email('style')}` } }),
  },
  { method: 'GET', route: '/api/styles/:id', expect: memberRecord(200), request: async (fx) => ({ path: `/api/styles/${(await world(fx)).styleId}` }) },
  {
    method: 'PATCH',
    route: '/api/styles/:id',
    expect: ownerRecord(200),
    request: async (fx) => ({ path: `/api/styles/${(await styleMake(owner(fx))).id}`, body: { version: 0, notes: 'matrix' } }),
  },

  {
    method: 'GET',
    route: '/api/clients/:clientId/blocks',
    expect: memberRecord(200),
    request: async (fx) => ({ path: `/api/clients/${(await world(fx)).clientId}/blocks` }),
  },
  {
    method: 'GET',
    route: '/api/clients/:clientId/blocks/to-use',
    expect: memberRecord(200),
    request: async (fx) => ({ path: `/api/clients/${(await world(fx)).clientId}/blocks/to-use` }),
  },
  {
    method: 'POST',
    route: '/api/clients/:clientId/blocks',
    expect: ownerRecord(201),
    request: async (fx) => {
      const w = await world(fx);
      return { path: `/api/clients/${w.clientId}/blocks`, body: { measurementSetId: w.setId } };
    },
  },
  {
    method: 'GET',
    route: '/api/clients/:clientId/blocks/:blockId',
    expect: memberRecord(200),
    request: async (fx) => {
      const w = await world(fx);
      return { path: `/api/clients/${w.clientId}/blocks/${w.blockId}` };
    },
  },
  {
    method: 'PATCH',
    route: '/api/clients/:clientId/blocks/:blockId',
    expect: ownerRecord(200),
    request: async (fx) => {
      const b = await freshBlock(fx);
      return { path: `/api/clients/${b.clientId}/blocks/${b.blockId}`, body: { version: 0, notes: 'matrix' } };
    },
  },
  {
    method: 'POST',
    route: '/api/clients/:clientId/blocks/:blockId/corrections',
    expect: ownerRecord(201),
    request: async (fx) => {
      const w = await world(fx);
      return { path: `/api/clients/${w.clientId}/blocks/${w.blockId}/corrections`, body: CORRECTION };
    },
  },
  {
    method: 'DELETE',
    route: '/api/clients/:clientId/blocks/:blockId/corrections/:correctionId',
    expect: ownerRecord(200),
    request: async (fx) => {
      const b = await freshBlock(fx);
      const res = await owner(fx).post(`/api/clients/${b.clientId}/blocks/${b.blockId}/corrections`).set(csrfHeaders).send(CORRECTION);
      const correctionId = (res.body as { corrections: { id: number }[] }).corrections[0]!.id;
      return { path: `/api/clients/${b.clientId}/blocks/${b.blockId}/corrections/${correctionId}` };
    },
  },

  { method: 'GET', route: '/api/drafts', expect: signedIn(200) },
  {
    method: 'POST',
    route: '/api/drafts',
    // Studio B's owner naming studio A's block, style and fabric: a bad reference (400), not a leak.
    expect: { anonymous: 401, cutter: 403, owner: 201, otherOwner: 400 },
    request: async (fx) => {
      const w = await world(fx);
      return { body: { blockId: w.blockId, styleId: w.styleId, fabricId: w.fabricId } };
    },
  },
  { method: 'GET', route: '/api/drafts/:id', expect: memberRecord(200), request: async (fx) => ({ path: `/api/drafts/${(await world(fx)).draftId}` }) },
  {
    method: 'PATCH',
    route: '/api/drafts/:id',
    expect: ownerRecord(200),
    request: async (fx) => ({ path: `/api/drafts/${await freshDraft(fx)}`, body: { version: 0, notes: 'matrix' } }),
  },
  {
    method: 'GET',
    route: '/api/drafts/:id/revisions',
    expect: memberRecord(200),
    request: async (fx) => ({ path: `/api/drafts/${(await world(fx)).draftId}/revisions` }),
  },
  {
    method: 'GET',
    route: '/api/drafts/:id/revisions/:rev',
    expect: memberRecord(200),
    request: async (fx) => ({ path: `/api/drafts/${(await world(fx)).draftId}/revisions/1` }),
  },
  {
    method: 'POST',
    route: '/api/drafts/:id/revisions/:rev/restore',
    expect: ownerRecord(200),
    request: async (fx) => ({ path: `/api/drafts/${await freshDraft(fx)}/revisions/1/restore`, body: { version: 0 } }),
  },
  {
    method: 'POST',
    route: '/api/drafts/:id/state',
    // Approving: owners only. Cutters' moves (cut, sewn, delivered) are checked in drafts-states.test.ts.
    expect: ownerRecord(200),
    request: async (fx) => ({ path: `/api/drafts/${await freshDraft(fx)}/state`, body: { to: 'approved', version: 0 } }),
  },
  { method: 'GET', route: '/api/queue', expect: signedIn(200) },
];
