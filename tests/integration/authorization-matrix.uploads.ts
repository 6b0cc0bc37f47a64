/**
 * Authorization matrix entries of the upload routes (fitting photos, fabric swatches), spread
 * into MATRIX_ENTRIES. Records are made in studio A through the API as its owner; a route that
 * deletes one gets a fresh record per call.
 */
import sharp from 'sharp';
import { csrfHeaders, type Agent } from '../helpers/auth.js';
import type { MatrixEntry, MatrixFixture, Who } from './authorization-matrix.entries.js';

const signedIn = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: status, owner: status, otherOwner: status });
const memberRecord = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: status, owner: status, otherOwner: 404 });
const ownerRecord = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: 403, owner: status, otherOwner: 404 });

let pngMade: Promise<Buffer> | undefined;
const png = () => (pngMade ??= sharp({ create: { width: 64, height: 48, channels: 3, background: '#7a9a8a' } }).png().toBuffer());

/**
 * The caller's agent, but its POST and PUT send `photo` as a multipart file. The matrix runner
 * calls `.send({})` after `.set()`; here that keeps the multipart body instead.
 */
async function uploading(agent: Agent, fields: Record<string, string> = {}): Promise<Agent> {
  const file = await png();
  const wrapped = Object.create(agent) as Agent;
  for (const method of ['post', 'put'] as const) {
    wrapped[method] = ((path: string) => {
      let req = agent[method](path);
      for (const [key, value] of Object.entries(fields)) req = req.field(key, value);
      req = req.attach('photo', file, { filename: 'matrix.png', contentType: 'image/png' });
      return Object.assign(req, { send: () => req });
    }) as Agent['post'];
  }
  return wrapped;
}

async function created(fx: MatrixFixture, path: string, body: object): Promise<number> {
  const res = await fx.agent('owner').post(path).set(csrfHeaders).send(body);
  if (res.status !== 201) throw new Error(`matrix fixture: POST ${path} answered ${res.status} ${JSON.stringify(res.body)}`);
  return (res.body as { id: number }).id;
}

async function photoNew(fx: MatrixFixture): Promise<{ clientId: number; photoId: number }> {
  const clientId = await created(fx, '/api/clients', { name: 'Matrix Photo Client' });
  const res = await fx
    .agent('owner')
    .post(`/api/clients/${clientId}/photos`)
    .set(csrfHeaders)
    .field('kind', 'front')
    .field('takenOn', new Date().toISOString().slice(0, 10))
    .attach('photo', await png(), { filename: 'front.png' });
  if (res.status !== 201) throw new Error(`matrix fixture: photo upload answered ${res.status} ${JSON.stringify(res.body)}`);
  return { clientId, photoId: (res.body as { id: number }).id };
}

async function swatchNew(fx: MatrixFixture): Promise<number> {
  const fabricId = await created(fx, '/api/fabrics', { name: 'Matrix swatch jersey', stretchCrosswise: 40, recovery: 'good' });
  const res = await fx.agent('owner').put(`/api/fabrics/${fabricId}/swatch`).set(csrfHeaders).attach('photo', await png(), { filename: 'swatch.png' });
  if (res.status !== 200) throw new Error(`matrix fixture: swatch upload answered ${res.status} ${JSON.stringify(res.body)}`);
  return fabricId;
}

// Read-only routes share one photo and one swatch per fixture.
const shared = new WeakMap<MatrixFixture, Promise<{ clientId: number; photoId: number; fabricId: number }>>();
function sharedRecords(fx: MatrixFixture) {
  let records = shared.get(fx);
  if (!records) {
    records = (async () => ({ ...(await photoNew(fx)), fabricId: await swatchNew(fx) }))();
    shared.set(fx, records);
  }
  return records;
}

export const UPLOADS_MATRIX_ENTRIES: MatrixEntry[] = [
  {
    method: 'GET',
    route: '/api/clients/:id/photos',
    expect: memberRecord(200),
    request: async (fx) => ({ path: `/api/clients/${(await sharedRecords(fx)).clientId}/photos` }),
  },
  {
    method: 'POST',
    route: '/api/clients/:id/photos',
    expect: ownerRecord(201),
    request: async (fx, who) => {
      const clientId = await created(fx, '/api/clients', { name: 'Matrix Upload Client' });
      const agent = await uploading(fx.agent(who), { kind: 'side', takenOn: new Date().toISOString().slice(0, 10) });
      return { path: `/api/clients/${clientId}/photos`, agent };
    },
  },
  ...(['full', 'thumb'] as const).map(
    (size): MatrixEntry => ({
      method: 'GET',
      route: `/api/photos/:id/${size}`,
      expect: memberRecord(200),
      request: async (fx) => ({ path: `/api/photos/${(await sharedRecords(fx)).photoId}/${size}` }),
    }),
  ),
  {
    method: 'DELETE',
    route: '/api/photos/:id',
    expect: ownerRecord(204),
    request: async (fx) => ({ path: `/api/photos/${(await photoNew(fx)).photoId}` }),
  },
  { method: 'GET', route: '/api/swatches', expect: signedIn(200) },
  {
    method: 'GET',
    route: '/api/fabrics/:id/swatch',
    expect: memberRecord(200),
    request: async (fx) => ({ path: `/api/fabrics/${(await sharedRecords(fx)).fabricId}/swatch` }),
  },
  {
    method: 'PUT',
    route: '/api/fabrics/:id/swatch',
    expect: ownerRecord(200),
    request: async (fx, who) => ({ path: `/api/fabrics/${(await sharedRecords(fx)).fabricId}/swatch`, agent: await uploading(fx.agent(who)) }),
  },
  {
    method: 'DELETE',
    route: '/api/fabrics/:id/swatch',
    expect: ownerRecord(204),
    request: async (fx) => ({ path: `/api/fabrics/${await swatchNew(fx)}/swatch` }),
  },
  ...(['full', 'thumb'] as const).map(
    (size): MatrixEntry => ({
      method: 'GET',
      route: `/api/fabrics/:id/swatch/${size}`,
      expect: memberRecord(200),
      request: async (fx) => ({ path: `/api/fabrics/${(await sharedRecords(fx)).fabricId}/swatch/${size}` }),
    }),
  ),
];
