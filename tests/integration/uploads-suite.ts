/**
 * The upload behaviour every storage adapter must show, run by uploads-folder.test.ts (a temp
 * folder) and uploads-s3.test.ts (a local S3 fake). Facts checked against sharp's metadata reader
 * and the Exif standard (see uploads-fixtures.ts), not against the app's own code.
 */
import type { Express } from 'express';
import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Photo, Swatch } from '../../server/models/index.js';
import { storageFromUrl } from '../../server/storage/storage-url.js';
import type { StorageAdapter } from '../../server/storage/storage.js';
import type { PhotoView, SwatchOne, SwatchView } from '../../shared/schemas/photo.js';
import { csrfHeaders, memberAdd, studioSignUp, type Agent } from '../helpers/auth.js';
import { testAppCreate } from '../helpers/test-app.js';
import { exifHasGps, heicStart, jpegFromPhone, oversizedJpeg, pngSwatch, webpSwatch } from './uploads-fixtures.js';

export interface StorageUnderTest {
  url: string;
  stop: () => Promise<void>;
}

interface World {
  app: Express;
  close: () => Promise<void>;
  storage: StorageAdapter;
  studioId: number;
  owner: Agent;
  cutter: Agent;
  otherOwner: Agent;
}

const TODAY = new Date().toISOString().slice(0, 10);
const FRONT = { kind: 'front', takenOn: TODAY };

function photoPost(agent: Agent, clientId: number, file: Buffer, filename: string, fields: Record<string, string> = FRONT, contentType?: string) {
  let req = agent.post(`/api/clients/${clientId}/photos`).set(csrfHeaders);
  for (const [key, value] of Object.entries(fields)) req = req.field(key, value);
  return req.attach('photo', file, contentType ? { filename, contentType } : { filename });
}

/**
 * A multipart body written by hand (RFC 7578), so the file name reaches the server exactly as
 * given: the form-data library would reduce a path to its last part before sending.
 */
function photoPostRaw(agent: Agent, clientId: number, file: Buffer, filename: string, fields: Record<string, string> = FRONT) {
  const boundary = `----knitwright-test-${Date.now().toString(36)}`;
  const parts: Buffer[] = [];
  for (const [key, value] of Object.entries(fields)) {
    parts.push(Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="${key}"\r\n\r\n${value}\r\n`));
  }
  parts.push(Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="photo"; filename="${filename}"\r\nContent-Type: image/jpeg\r\n\r\n`));
  parts.push(file, Buffer.from(`\r\n--${boundary}--\r\n`));
  return agent
    .post(`/api/clients/${clientId}/photos`)
    .set(csrfHeaders)
    .set('Content-Type', `multipart/form-data; boundary=${boundary}`)
    .send(Buffer.concat(parts));
}

async function bytesOf(res: request.Response): Promise<Buffer> {
  return Buffer.isBuffer(res.body) ? res.body : Buffer.from(res.text ?? '', 'binary');
}

/** GET an image as raw bytes (supertest would otherwise try to parse it). */
function imageGet(agent: Agent, path: string) {
  return agent
    .get(path)
    .buffer(true)
    .parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
}

export function uploadsSuite(label: string, storageStart: () => Promise<StorageUnderTest>): void {
  describe(`uploads through the ${label} adapter`, () => {
    let w: World;
    let storageStop: () => Promise<void> = async () => undefined;

    beforeAll(async () => {
      const started = await storageStart();
      storageStop = started.stop;
      const { app, close } = testAppCreate({ STORAGE_URL: started.url });
      const a = await studioSignUp(app, { studioName: `Upload Studio ${label}`, name: 'Wren Ashdown' });
      const cutter = await memberAdd(app, a.studio.id, 'cutter');
      const b = await studioSignUp(app, { studioName: `Upload Studio ${label} (other)` });
      w = { app, close, storage: storageFromUrl(started.url), studioId: a.studio.id, owner: a.agent, cutter: cutter.agent, otherOwner: b.agent };
    }, 60_000);

    afterAll(async () => {
      await w?.close();
      await storageStop();
    });

    async function clientNew(name = 'Isolde Marsh'): Promise<number> {
      const res = await w.owner.post('/api/clients').set(csrfHeaders).send({ name });
      expect(res.status).toBe(201);
      return (res.body as { id: number }).id;
    }

    async function setNew(clientId: number): Promise<number> {
      const body = { takenAt: TODAY, unit: 'cm', values: { bust: 88, hip: 96, armholeDepth: 20 } };
      const res = await w.owner.post(`/api/clients/${clientId}/measurements`).set(csrfHeaders).send(body);
      expect(res.status).toBe(201);
      return (res.body as { setId: number }).setId;
    }

    const photoKeys = () => w.storage.list(`photos/${w.studioId}/`);
    const swatchKeys = () => w.storage.list(`swatches/${w.studioId}/`);

    it('stores a phone photo upright, without its EXIF (GPS position included), with a thumbnail', async () => {
      const original = await jpegFromPhone(1200, 900);
      const before = await sharp(original).metadata();
      // The input really carries what must go: a GPS IFD, the camera make, orientation 6.
      expect(exifHasGps(before.exif)).toBe(true);
      expect(before.orientation).toBe(6);

      const clientId = await clientNew();
      const setId = await setNew(clientId);
      const res = await photoPost(w.owner, clientId, original, 'IMG_2041.JPG', { ...FRONT, measurementSetId: String(setId) }, 'image/jpeg');
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      const photo = res.body as PhotoView;
      // Orientation 6 is a quarter turn (Exif 2.32 Table 4, tag 0x0112): 1200 × 900 stands up as 900 × 1200.
      expect(photo).toMatchObject({ clientId, kind: 'front', takenOn: TODAY, measurementSetId: setId, contentType: 'image/jpeg', width: 900, height: 1200 });
      expect(Math.max(photo.thumbWidth, photo.thumbHeight)).toBe(400);

      const full = await imageGet(w.owner, photo.fullUrl);
      expect(full.status).toBe(200);
      expect(full.headers['content-type']).toBe('image/jpeg');
      expect(full.headers['x-content-type-options']).toBe('nosniff');
      expect(full.headers['cache-control']).toMatch(/^private/);
      const served = await sharp(await bytesOf(full)).metadata();
      expect(served).toMatchObject({ format: 'jpeg', width: 900, height: 1200 });
      expect({ exif: served.exif, xmp: served.xmp, iptc: served.iptc, icc: served.icc, orientation: served.orientation }).toEqual({
        exif: undefined,
        xmp: undefined,
        iptc: undefined,
        icc: undefined,
        orientation: undefined,
      });

      const thumb = await imageGet(w.owner, photo.thumbUrl);
      expect(thumb.headers['content-type']).toBe('image/webp');
      expect(thumb.headers['x-content-type-options']).toBe('nosniff');
      const thumbMeta = await sharp(await bytesOf(thumb)).metadata();
      expect(thumbMeta).toMatchObject({ format: 'webp', width: 300, height: 400 });
      expect(thumbMeta.exif).toBeUndefined();

      const row = await Photo.findByPk(photo.id);
      const stored = await w.storage.get(row!.fullKey);
      const chunks: Buffer[] = [];
      for await (const c of stored.body) chunks.push(c as Buffer);
      expect(exifHasGps((await sharp(Buffer.concat(chunks)).metadata()).exif)).toBe(false);
      expect(await photoKeys()).toEqual(expect.arrayContaining([row!.fullKey, row!.thumbKey]));
    });

    it('lets a cutter view photos but not upload or delete them', async () => {
      const clientId = await clientNew();
      const up = await photoPost(w.owner, clientId, await jpegFromPhone(), 'side.jpg', { kind: 'side', takenOn: TODAY });
      const photo = up.body as PhotoView;
      const list = await w.cutter.get(`/api/clients/${clientId}/photos`);
      expect(list.status).toBe(200);
      expect((list.body as { items: PhotoView[] }).items.map((p) => p.id)).toEqual([photo.id]);
      expect((await imageGet(w.cutter, photo.thumbUrl)).status).toBe(200);

      const refusedUpload = await photoPost(w.cutter, clientId, await jpegFromPhone(), 'back.jpg', { kind: 'back', takenOn: TODAY });
      expect(refusedUpload.status).toBe(403);
      const refusedDelete = await w.cutter.delete(`/api/photos/${photo.id}`).set(csrfHeaders);
      expect(refusedDelete.status).toBe(403);
      expect(await Photo.count({ where: { clientId } })).toBe(1);
    });

    it('answers 404 to another studio for the client, its photos and their files', async () => {
      const clientId = await clientNew();
      const photo = (await photoPost(w.owner, clientId, await jpegFromPhone(), 'front.jpg')).body as PhotoView;
      const keysBefore = await photoKeys();
      expect((await w.otherOwner.get(`/api/clients/${clientId}/photos`)).status).toBe(404);
      expect((await imageGet(w.otherOwner, photo.fullUrl)).status).toBe(404);
      expect((await imageGet(w.otherOwner, photo.thumbUrl)).status).toBe(404);
      expect((await w.otherOwner.delete(`/api/photos/${photo.id}`).set(csrfHeaders)).status).toBe(404);
      expect((await photoPost(w.otherOwner, clientId, await jpegFromPhone(), 'front.jpg')).status).toBe(404);
      expect((await request(w.app).get(photo.fullUrl)).status).toBe(401);
      expect(await photoKeys()).toEqual(keysBefore);
      expect(await Photo.count({ where: { clientId } })).toBe(1);
    });

    it('refuses bad uploads with an error naming the field, leaving no row and no file', async () => {
      const clientId = await clientNew('Refused Uploads');
      const otherClientSet = await setNew(await clientNew('Someone Else'));
      const jpeg = await jpegFromPhone(400, 300);
      const png = await pngSwatch();
      const cases: { what: string; send: () => request.Test; status: number; field: string }[] = [
        { what: 'a text file', send: () => photoPost(w.owner, clientId, Buffer.from('bust 88 cm, hip 96 cm\n'), 'notes.jpg', FRONT, 'image/jpeg'), status: 415, field: 'photo' },
        { what: 'PNG bytes named .jpg', send: () => photoPost(w.owner, clientId, png, 'front.jpg', FRONT, 'image/jpeg'), status: 415, field: 'photo' },
        { what: 'JPEG bytes sent as image/png', send: () => photoPost(w.owner, clientId, jpeg, 'front', FRONT, 'image/png'), status: 415, field: 'photo' },
        { what: 'a HEIC file', send: () => photoPost(w.owner, clientId, heicStart(), 'IMG_0001.HEIC', FRONT, 'image/heic'), status: 415, field: 'photo' },
        { what: 'a path in the name', send: () => photoPostRaw(w.owner, clientId, jpeg, '../../fittings/front.jpg'), status: 400, field: 'photo' },
        { what: 'a Windows path in the name', send: () => photoPostRaw(w.owner, clientId, jpeg, 'C:\\fittings\\front.jpg'), status: 400, field: 'photo' },
        { what: 'a file over 10 MB', send: () => photoPost(w.owner, clientId, oversizedJpeg(), 'huge.jpg'), status: 413, field: 'photo' },
        { what: 'a damaged JPEG', send: () => photoPost(w.owner, clientId, jpeg.subarray(0, 300), 'cut.jpg'), status: 400, field: 'photo' },
        { what: 'no file', send: () => w.owner.post(`/api/clients/${clientId}/photos`).set(csrfHeaders).field('kind', 'front').field('takenOn', TODAY), status: 400, field: 'photo' },
        { what: 'an unknown view', send: () => photoPost(w.owner, clientId, jpeg, 'f.jpg', { kind: 'top', takenOn: TODAY }), status: 400, field: 'kind' },
        { what: 'a future date', send: () => photoPost(w.owner, clientId, jpeg, 'f.jpg', { kind: 'front', takenOn: '2999-01-01' }), status: 400, field: 'takenOn' },
        // Checked inside the transaction, after the files were written: they must be removed again.
        {
          what: 'another client’s measurement set',
          send: () => photoPost(w.owner, clientId, jpeg, 'f.jpg', { ...FRONT, measurementSetId: String(otherClientSet) }),
          status: 400,
          field: 'measurementSetId',
        },
      ];
      const before = await photoKeys();
      for (const c of cases) {
        const res = await c.send();
        expect(res.status, `${c.what}: ${JSON.stringify(res.body)}`).toBe(c.status);
        const error = (res.body as { error: { fields?: Record<string, string> } }).error;
        expect(error.fields?.[c.field], c.what).toEqual(expect.any(String));
        expect(await Photo.count({ where: { clientId } }), c.what).toBe(0);
        expect(await photoKeys(), c.what).toEqual(before);
      }
    });

    it('deletes a photo with its two files', async () => {
      const clientId = await clientNew();
      const photo = (await photoPost(w.owner, clientId, await jpegFromPhone(), 'back.jpg', { kind: 'back', takenOn: TODAY })).body as PhotoView;
      const row = (await Photo.findByPk(photo.id))!;
      expect(await photoKeys()).toEqual(expect.arrayContaining([row.fullKey, row.thumbKey]));
      const res = await w.owner.delete(`/api/photos/${photo.id}`).set(csrfHeaders);
      expect(res.status).toBe(204);
      expect(await photoKeys()).not.toEqual(expect.arrayContaining([row.fullKey]));
      expect(await photoKeys()).not.toEqual(expect.arrayContaining([row.thumbKey]));
      expect((await imageGet(w.owner, photo.fullUrl)).status).toBe(404);
    });

    it('keeps one swatch per fabric: a new one replaces the old files, removing it removes the rest', async () => {
      const fabric = await w.owner.post('/api/fabrics').set(csrfHeaders).send({ name: 'Sage bamboo jersey', stretchCrosswise: 50, recovery: 'good' });
      const fabricId = (fabric.body as { id: number }).id;
      const swatchPut = (agent: Agent, file: Buffer, name: string) =>
        agent.put(`/api/fabrics/${fabricId}/swatch`).set(csrfHeaders).attach('photo', file, { filename: name });

      expect(((await w.owner.get(`/api/fabrics/${fabricId}/swatch`)).body as SwatchOne).swatch).toBeNull();
      const first = await swatchPut(w.owner, await pngSwatch(), 'sage.png');
      expect(first.status, JSON.stringify(first.body)).toBe(200);
      expect(first.body as SwatchView).toMatchObject({ fabricId, contentType: 'image/png', width: 300, height: 200 });
      const full = await imageGet(w.cutter, (first.body as SwatchView).fullUrl);
      expect(full.headers['content-type']).toBe('image/png');
      expect(full.headers['x-content-type-options']).toBe('nosniff');
      const firstRow = (await Swatch.findOne({ where: { fabricId } }))!;

      expect((await swatchPut(w.cutter, await pngSwatch(), 'sage.png')).status).toBe(403);
      expect((await swatchPut(w.otherOwner, await pngSwatch(), 'sage.png')).status).toBe(404);
      expect((await imageGet(w.otherOwner, `/api/fabrics/${fabricId}/swatch/thumb`)).status).toBe(404);

      const second = await swatchPut(w.owner, await webpSwatch(), 'sage-daylight.webp');
      expect(second.status).toBe(200);
      expect((second.body as SwatchView).thumbUrl).not.toBe((first.body as SwatchView).thumbUrl);
      const secondRow = (await Swatch.findOne({ where: { fabricId } }))!;
      expect(await swatchKeys()).toEqual(expect.arrayContaining([secondRow.fullKey, secondRow.thumbKey]));
      expect(await swatchKeys()).not.toEqual(expect.arrayContaining([firstRow.fullKey]));
      expect(await swatchKeys()).not.toEqual(expect.arrayContaining([firstRow.thumbKey]));
      const list = await w.cutter.get('/api/swatches');
      expect((list.body as { items: SwatchView[] }).items.map((s) => s.fabricId)).toContain(fabricId);

      expect((await w.cutter.delete(`/api/fabrics/${fabricId}/swatch`).set(csrfHeaders)).status).toBe(403);
      expect((await w.owner.delete(`/api/fabrics/${fabricId}/swatch`).set(csrfHeaders)).status).toBe(204);
      expect(await swatchKeys()).not.toEqual(expect.arrayContaining([secondRow.fullKey]));
      expect((await imageGet(w.owner, `/api/fabrics/${fabricId}/swatch/full`)).status).toBe(404);
    });

    it('removes the stored files of a fabric or a client that is deleted', async () => {
      const fabric = await w.owner.post('/api/fabrics').set(csrfHeaders).send({ name: 'Offcut rib', stretchCrosswise: 60, recovery: 'fair' });
      const fabricId = (fabric.body as { id: number }).id;
      await w.owner.put(`/api/fabrics/${fabricId}/swatch`).set(csrfHeaders).attach('photo', await pngSwatch(), { filename: 'rib.png' });
      const swatch = (await Swatch.findOne({ where: { fabricId } }))!;
      const clientId = await clientNew('Entered By Mistake');
      const photo = (await photoPost(w.owner, clientId, await jpegFromPhone(), 'front.jpg')).body as PhotoView;
      const row = (await Photo.findByPk(photo.id))!;

      expect((await w.owner.delete(`/api/fabrics/${fabricId}`).set(csrfHeaders)).status).toBe(204);
      expect((await w.owner.delete(`/api/clients/${clientId}`).set(csrfHeaders)).status).toBe(204);
      // The files go once the delete has committed, just after the answer.
      await expect.poll(() => swatchKeys()).not.toEqual(expect.arrayContaining([swatch.fullKey]));
      await expect.poll(() => photoKeys()).not.toEqual(expect.arrayContaining([row.fullKey]));
      expect(await swatchKeys()).not.toEqual(expect.arrayContaining([swatch.thumbKey]));
      expect(await photoKeys()).not.toEqual(expect.arrayContaining([row.thumbKey]));
      expect(await Photo.count({ where: { clientId } })).toBe(0);
    });
  });
}
