/**
 * Sending work by e-mail through the real local SMTP sink: a client's measurements in the
 * studio's unit, and a draft's PDF (read back with pdf-lib, a general-purpose PDF library) as an
 * attachment, each send recorded on the client or draft.
 */
import { PDFDocument } from 'pdf-lib';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, Studio } from '../../server/models/index.js';
import type { DeliveriesResponse, DeliveryView, MailMessageView } from '../../shared/schemas/mail.js';
import { csrfHeaders, memberAdd, studioSignUp, uniqueEmail, type Agent, type SignedUpStudio } from '../helpers/auth.js';
import { clientWithSet, draftMake, draftWorld, IN, setAdd, type DraftWorld } from './drafts-fixtures.js';
import { mailTestAppCreate, messageTo, type MailTestApp } from './mail-fixtures.js';

let t: MailTestApp;
let a: SignedUpStudio;
let b: SignedUpStudio;
let cutter: Agent;
let world: DraftWorld;
let draftId: number;

beforeAll(async () => {
  t = await mailTestAppCreate();
  a = await studioSignUp(t.app, { studioName: 'Purl & Pin Atelier' });
  b = await studioSignUp(t.app, { studioName: 'Elsewhere Knits' });
  cutter = (await memberAdd(t.app, a.studio.id, 'cutter')).agent;
  world = await draftWorld(a.agent, a.studio.id);
  draftId = (await draftMake(a.agent, world)).id;
});
afterAll(() => t.close());

async function clientWithAddress(): Promise<{ clientId: number; email: string }> {
  const email = uniqueEmail('client');
  // An older fitting, then the latest one: bust 36 in, hip 40 in, armhole depth 8 1/2 in.
  const { clientId } = await clientWithSet(a.studio.id, { bust: 34 * IN, hip: 38 * IN, armholeDepth: 8 * IN }, '2026-01-05');
  await setAdd(a.studio.id, clientId, { bust: 36 * IN, hip: 40 * IN, armholeDepth: 8.5 * IN }, '2026-03-14');
  await Client.update({ email }, { where: { id: clientId } });
  return { clientId, email };
}

describe('e-mailing a client their measurements', () => {
  it("sends the latest fitting in the studio's unit and records the send on the client", async () => {
    const { clientId, email } = await clientWithAddress();
    const res = await a.agent.post(`/api/clients/${clientId}/send-measurements`).set(csrfHeaders).send({ note: 'See you at the second fitting.' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ kind: 'measurements', to: email, status: 'sent' });

    const { message } = await messageTo(email);
    expect(message.fromName).toBe('Purl & Pin Atelier');
    expect(message.subject).toBe('Your measurements from Purl & Pin Atelier');
    // 1 in = 25.4 mm exactly (NIST SP 811, appendix B): 914.4 mm is 36 in; shown to 1/8 in.
    expect(message.text).toMatch(/Bust girth\s+36 in/);
    expect(message.text).toMatch(/Armhole depth\s+8 1\/2 in/);
    expect(message.text).toContain('14 March 2026');
    expect(message.text).not.toMatch(/34 in/);
    expect(message.text).toContain('> See you at the second fitting.');
    expect(message.html).toMatch(/<th[^>]*>.*Hip girth.*<\/th><td[^>]*>.*40 in/);

    const deliveries = (await a.agent.get(`/api/clients/${clientId}/deliveries`)).body as DeliveriesResponse;
    expect(deliveries.deliveries[0]).toMatchObject({ kind: 'measurements', to: email, status: 'sent', sentBy: a.owner.name, messageId: message.id });
  });

  it('writes centimetres to the millimetre when the studio works in centimetres', async () => {
    const studio = await studioSignUp(t.app, { studioName: 'Metric Knit Rooms' });
    await Studio.update({ defaultUnit: 'cm' }, { where: { id: studio.studio.id } });
    const email = uniqueEmail('metric');
    const { clientId } = await clientWithSet(studio.studio.id, { bust: 914.4, hip: 1016, armholeDepth: 215.9 });
    await Client.update({ email }, { where: { id: clientId } });
    expect((await studio.agent.post(`/api/clients/${clientId}/send-measurements`).set(csrfHeaders).send({})).status).toBe(201);
    const { message } = await messageTo(email);
    expect(message.text).toMatch(/Bust girth\s+91\.4 cm/);
    expect(message.text).toMatch(/Armhole depth\s+21\.6 cm/);
  });

  it('refuses clearly and sends nothing when it cannot be sent', async () => {
    const { clientId } = await clientWithSet(a.studio.id);
    const noAddress = await a.agent.post(`/api/clients/${clientId}/send-measurements`).set(csrfHeaders).send({});
    expect(noAddress.status).toBe(400);
    expect(noAddress.body.error.fields.to).toMatch(/has no e-mail address/);
    const { clientId: withAddress } = await clientWithAddress();
    expect((await cutter.post(`/api/clients/${withAddress}/send-measurements`).set(csrfHeaders).send({})).status).toBe(403);
    expect((await b.agent.post(`/api/clients/${withAddress}/send-measurements`).set(csrfHeaders).send({})).status).toBe(404);
    const extra = await a.agent.post(`/api/clients/${withAddress}/send-measurements`).set(csrfHeaders).send({ to: 'x@example.com' });
    expect(extra.body.error.fields.to).toBe('Unknown field "to".');
    expect(((await a.agent.get(`/api/clients/${withAddress}/deliveries`)).body as DeliveriesResponse).deliveries).toEqual([]);
  });
});

describe("e-mailing a draft's documents", () => {
  it('attaches the ticket as a PDF for a copy shop, readable and downloadable from Sent mail', async () => {
    const shop = uniqueEmail('copyshop');
    const res = await cutter.post(`/api/drafts/${draftId}/send`).set(csrfHeaders).send({ kind: 'ticket', to: shop, paper: 'letter' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect((res.body as DeliveryView).kind).toBe('ticket');

    const { message, attachments } = await messageTo(shop);
    expect(attachments).toHaveLength(1);
    const [pdf] = attachments;
    expect(pdf!.contentType).toBe('application/pdf');
    expect(pdf!.filename).toMatch(new RegExp(`^[a-z0-9-]+-draft-${draftId}-ticket-letter\\.pdf$`));
    expect(pdf!.content.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    // ANSI Letter is 8.5 × 11 in = 612 × 792 pt at 72 pt/in (ISO 32000-1, 8.3.2.3).
    const doc = await PDFDocument.load(pdf!.content, { updateMetadata: false });
    const { width, height } = doc.getPage(0).getSize();
    expect([Math.round(width), Math.round(height)]).toEqual([612, 792]);
    // A copy shop is not told whose pattern it is.
    const client = await Client.findByPk(world.clientId);
    expect(message.text).not.toContain(client!.name);
    expect(message.subject).not.toContain(client!.name);

    const view = (await a.agent.get(`/api/studio/mail/${message.id}`)).body as MailMessageView;
    expect(view.attachments).toEqual([{ id: pdf!.id, filename: pdf!.filename, contentType: 'application/pdf', size: pdf!.content.length }]);
    const download = await a.agent.get(`/api/studio/mail/${message.id}/attachments/${pdf!.id}`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(download.status).toBe(200);
    expect(download.headers['content-type']).toBe('application/pdf');
    expect(download.headers['content-disposition']).toMatch(/^attachment; filename="?style-/);
    expect(download.headers['x-content-type-options']).toBe('nosniff');
    expect(Buffer.compare(download.body as Buffer, pdf!.content)).toBe(0);
    expect((await b.agent.get(`/api/studio/mail/${message.id}/attachments/${pdf!.id}`)).status).toBe(404);
    expect((await cutter.get(`/api/studio/mail/${message.id}/attachments/${pdf!.id}`)).status).toBe(403);

    const onDraft = (await a.agent.get(`/api/drafts/${draftId}/deliveries`)).body as DeliveriesResponse;
    expect(onDraft.deliveries.find((d) => d.to === shop)).toMatchObject({ kind: 'ticket', status: 'sent', messageId: message.id });
  });

  it("sends the tiled pattern to the client's own address, owners only", async () => {
    const email = uniqueEmail('draftclient');
    await Client.update({ email }, { where: { id: world.clientId } });
    const byCutter = await cutter.post(`/api/drafts/${draftId}/send`).set(csrfHeaders).send({ kind: 'tiles', to: 'client' });
    expect(byCutter.status).toBe(403);
    const res = await a.agent.post(`/api/drafts/${draftId}/send`).set(csrfHeaders).send({ kind: 'tiles', to: 'client', paper: 'a4' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const { message, attachments } = await messageTo(email);
    expect(message.text).toMatch(/Print every page at 100 %/);
    const doc = await PDFDocument.load(attachments[0]!.content, { updateMetadata: false });
    // ISO 216 A4 is 210 × 297 mm = 595.28 × 841.89 pt; a tiled print has several pages.
    expect(doc.getPageCount()).toBeGreaterThan(1);
    const size = doc.getPage(0).getSize();
    expect([Math.round(Math.min(size.width, size.height)), Math.round(Math.max(size.width, size.height))]).toEqual([595, 842]);
    const onClient = (await a.agent.get(`/api/clients/${world.clientId}/deliveries`)).body as DeliveriesResponse;
    expect(onClient.deliveries.some((d) => d.kind === 'tiles' && d.to === email)).toBe(true);
  });

  it('names the field of every bad request, and keeps drafts of other studios out of reach', async () => {
    const kind = await a.agent.post(`/api/drafts/${draftId}/send`).set(csrfHeaders).send({ kind: 'poster', to: uniqueEmail('x') });
    expect(kind.status).toBe(400);
    expect(kind.body.error.fields.kind).toBe('Kind must be "tiles", "sheet" or "ticket"');
    const to = await a.agent.post(`/api/drafts/${draftId}/send`).set(csrfHeaders).send({ kind: 'ticket', to: 'the copy shop' });
    expect(to.body.error.fields.to).toMatch(/"client" or an e-mail address/);
    const paper = await a.agent.post(`/api/drafts/${draftId}/send`).set(csrfHeaders).send({ kind: 'ticket', to: uniqueEmail('x'), paper: 'roll36' });
    expect(paper.status).toBe(400);
    expect(paper.body.error.fields.paper).toMatch(/Paper for ticket must be one of letter, a4/);
    expect((await b.agent.post(`/api/drafts/${draftId}/send`).set(csrfHeaders).send({ kind: 'ticket', to: uniqueEmail('x') })).status).toBe(404);
    expect((await request(t.app).post(`/api/drafts/${draftId}/send`).set(csrfHeaders).send({ kind: 'ticket', to: uniqueEmail('x') })).status).toBe(401);
  });
});
