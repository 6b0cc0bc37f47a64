/**
 * Invitations through the real local SMTP sink: the owner invites, the message arrives parsed
 * with a link that works once, within 72 hours, for that studio only. Token handling follows
 * OWASP ASVS 5.0 §7.2.3 (random, at least 128 bits) and the OWASP Forgot Password Cheat Sheet's
 * advice for e-mailed tokens (single use, expiring, stored hashed), which applies to any
 * e-mailed account link.
 */
import { createHash } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Invitation, User } from '../../server/models/index.js';
import type { InvitationView, MailListResponse, MailMessageView } from '../../shared/schemas/mail.js';
import { csrfHeaders, memberAdd, studioSignUp, TEST_PASSWORD, uniqueEmail, type SignedUpStudio } from '../helpers/auth.js';
import { linkToken, mailTestAppCreate, messageTo, type MailTestApp } from './mail-fixtures.js';

let t: MailTestApp;
let a: SignedUpStudio;
let b: SignedUpStudio;

beforeAll(async () => {
  t = await mailTestAppCreate();
  a = await studioSignUp(t.app, { studioName: 'Heddle & Hem Knits', name: 'Orla Vance' });
  b = await studioSignUp(t.app, { studioName: 'Other Studio' });
});
afterAll(() => t.close());

async function invite(email: string, role: 'cutter' | 'owner' = 'cutter', agent = a.agent) {
  const res = await agent.post('/api/studio/invitations').set(csrfHeaders).send({ email, role });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as InvitationView;
}

describe('an invitation e-mailed through the local SMTP sink', () => {
  it('arrives parsed, from the studio, with text and HTML parts carrying a link that works once', async () => {
    const email = uniqueEmail('invitee');
    const since = new Date(Date.now() - 1000);
    const view = await invite(email);
    expect(view).toMatchObject({ email, role: 'cutter', status: 'open', invitedBy: 'Orla Vance', sentCount: 1 });
    // 72 hours from now, within the few seconds the request took.
    expect(Date.parse(view.expiresAt) - Date.now()).toBeGreaterThan(72 * 3600_000 - 60_000);
    expect(Date.parse(view.expiresAt) - Date.now()).toBeLessThanOrEqual(72 * 3600_000);

    const { message } = await messageTo(email, since);
    expect(message.fromName).toBe('Heddle & Hem Knits');
    expect(message.subject).toBe('Join Heddle & Hem Knits on Knitwright');
    expect(message.studioId).toBe(a.studio.id);
    const fromText = linkToken(message.text, 'invitations');
    const fromHtml = linkToken(message.html, 'invitations');
    expect(fromHtml.token).toBe(fromText.token);
    // No tracking: no images or remote content, and the link is the app's own, written as itself.
    expect(message.html).not.toMatch(/<img|src=|url\(/i);
    expect(new URL(fromText.url).pathname).toBe(`/invitations/${fromText.token}`);

    const anonymous = request.agent(t.app);
    const offer = await anonymous.get(`/api/invitations/${fromText.token}`);
    expect(offer.status).toBe(200);
    expect(offer.body).toEqual({ studioName: 'Heddle & Hem Knits', role: 'cutter', email, invitedBy: 'Orla Vance', expiresAt: view.expiresAt });

    const accepted = await anonymous.post(`/api/invitations/${fromText.token}/accept`).set(csrfHeaders).send({ name: 'Tamsin Reed', password: TEST_PASSWORD });
    expect(accepted.status, JSON.stringify(accepted.body)).toBe(201);
    expect(accepted.body.user).toMatchObject({ email, name: 'Tamsin Reed', role: 'cutter' });
    expect(accepted.body.studio.id).toBe(a.studio.id);
    // Signed in at once, with the invited role.
    const me = await anonymous.get('/api/auth/me');
    expect(me.body.user.role).toBe('cutter');
    expect((await anonymous.get('/api/studio')).status).toBe(403);

    // Used once: the link is gone, and a second acceptance creates nobody.
    const again = await request.agent(t.app).post(`/api/invitations/${fromText.token}/accept`).set(csrfHeaders).send({ name: 'Someone Else', password: TEST_PASSWORD });
    expect(again.status).toBe(410);
    expect(again.body.error.message).toMatch(/already been accepted/);
    expect((await anonymous.get(`/api/invitations/${fromText.token}`)).status).toBe(410);
    expect(await User.count({ where: { email } })).toBe(1);

    const list = (await a.agent.get('/api/studio/invitations')).body.invitations as InvitationView[];
    expect(list.find((i) => i.id === view.id)).toMatchObject({ status: 'accepted' });
  });

  it('keeps only a SHA-256 hash of the token', async () => {
    const email = uniqueEmail('hashed');
    const view = await invite(email);
    const { token } = linkToken((await messageTo(email)).message.text, 'invitations');
    const row = await Invitation.findByPk(view.id, { raw: true });
    expect(row?.tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
    expect(JSON.stringify(row)).not.toContain(token);
  });

  it('shows the message under the owner\'s Sent mail, and to no other studio', async () => {
    const email = uniqueEmail('listed');
    await invite(email);
    const list = (await a.agent.get('/api/studio/mail')).body as MailListResponse;
    const summary = list.messages.find((m) => m.to.includes(email));
    expect(summary).toMatchObject({ subject: 'Join Heddle & Hem Knits on Knitwright', fromName: 'Heddle & Hem Knits', attachmentCount: 0 });
    expect(list.sink).toEqual({ host: '127.0.0.1', port: t.sink.port });
    const full = (await a.agent.get(`/api/studio/mail/${summary!.id}`)).body as MailMessageView;
    expect(full.text).toContain('/invitations/');
    expect(full.html).toContain('Accept the invitation');

    const other = (await b.agent.get('/api/studio/mail')).body as MailListResponse;
    expect(other.messages.some((m) => m.id === summary!.id)).toBe(false);
    expect((await b.agent.get(`/api/studio/mail/${summary!.id}`)).status).toBe(404);
  });

  it('refuses an expired link, and a resend gives a new link while the old one stops working', async () => {
    const email = uniqueEmail('expired');
    const view = await invite(email);
    const first = linkToken((await messageTo(email)).message.text, 'invitations').token;
    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: view.id } });
    const gone = await request(t.app).get(`/api/invitations/${first}`);
    expect(gone.status).toBe(410);
    expect(gone.body.error.message).toMatch(/expired/);
    const late = await request(t.app).post(`/api/invitations/${first}/accept`).set(csrfHeaders).send({ name: 'Late Comer', password: TEST_PASSWORD });
    expect(late.status).toBe(410);
    expect(await User.count({ where: { email } })).toBe(0);

    const since = new Date();
    const resent = await a.agent.post(`/api/studio/invitations/${view.id}/resend`).set(csrfHeaders).send({});
    expect(resent.status).toBe(200);
    expect(resent.body).toMatchObject({ status: 'open', sentCount: 2 });
    const second = linkToken((await messageTo(email, since)).message.text, 'invitations').token;
    expect(second).not.toBe(first);
    expect((await request(t.app).get(`/api/invitations/${first}`)).status).toBe(404);
    expect((await request(t.app).get(`/api/invitations/${second}`)).status).toBe(200);
  });

  it('stops a revoked link at once', async () => {
    const email = uniqueEmail('revoked');
    const view = await invite(email);
    const { token } = linkToken((await messageTo(email)).message.text, 'invitations');
    const revoked = await a.agent.post(`/api/studio/invitations/${view.id}/revoke`).set(csrfHeaders).send({});
    expect(revoked.body).toMatchObject({ status: 'revoked' });
    const res = await request(t.app).post(`/api/invitations/${token}/accept`).set(csrfHeaders).send({ name: 'Too Late', password: TEST_PASSWORD });
    expect(res.status).toBe(410);
    expect(res.body.error.message).toMatch(/withdrawn/);
    expect((await a.agent.post(`/api/studio/invitations/${view.id}/resend`).set(csrfHeaders).send({})).status).toBe(409);
  });

  it("does not let another studio's owner see, resend or revoke the invitation", async () => {
    const view = await invite(uniqueEmail('private'));
    expect((await b.agent.post(`/api/studio/invitations/${view.id}/resend`).set(csrfHeaders).send({})).status).toBe(404);
    expect((await b.agent.post(`/api/studio/invitations/${view.id}/revoke`).set(csrfHeaders).send({})).status).toBe(404);
    const theirs = (await b.agent.get('/api/studio/invitations')).body.invitations as InvitationView[];
    expect(theirs.some((i) => i.id === view.id)).toBe(false);
    expect((await Invitation.findByPk(view.id))?.revokedAt).toBeNull();
  });

  it('refuses to invite an address that is already a member, naming the field', async () => {
    const member = await memberAdd(t.app, a.studio.id, 'cutter', { name: 'Ines Carrow' });
    const res = await a.agent.post('/api/studio/invitations').set(csrfHeaders).send({ email: member.email, role: 'owner' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('already_member');
    expect(res.body.error.fields.email).toMatch(/Ines Carrow .* is already a member of this studio/);
    const elsewhere = await a.agent.post('/api/studio/invitations').set(csrfHeaders).send({ email: b.email, role: 'cutter' });
    expect(elsewhere.status).toBe(409);
    expect(elsewhere.body.error.fields.email).toMatch(/another studio/);

    const email = uniqueEmail('twice');
    await invite(email);
    const twice = await a.agent.post('/api/studio/invitations').set(csrfHeaders).send({ email, role: 'cutter' });
    expect(twice.status).toBe(409);
    expect(twice.body.error.fields.email).toMatch(/still open: resend it/);
    expect(await Invitation.count({ where: { email } })).toBe(1);
  });

  it('names the field of every bad input and changes nothing', async () => {
    const before = await Invitation.count({ where: { studioId: a.studio.id } });
    const role = await a.agent.post('/api/studio/invitations').set(csrfHeaders).send({ email: uniqueEmail('x'), role: 'admin' });
    expect(role.status).toBe(400);
    expect(role.body.error.fields.role).toBe('Role must be "owner" or "cutter"');
    const address = await a.agent.post('/api/studio/invitations').set(csrfHeaders).send({ email: 'not-an-address', role: 'cutter' });
    expect(address.body.error.fields.email).toMatch(/E-mail must be an address/);
    expect(await Invitation.count({ where: { studioId: a.studio.id } })).toBe(before);

    const short = await request(t.app).get('/api/invitations/abc');
    expect(short.status).toBe(400);
    expect(short.body.error.fields.token).toMatch(/not complete/);

    const email = uniqueEmail('weak');
    await invite(email);
    const { token } = linkToken((await messageTo(email)).message.text, 'invitations');
    const weak = await request(t.app).post(`/api/invitations/${token}/accept`).set(csrfHeaders).send({ name: 'Weak Pass', password: 'password' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.fields.password).toMatch(/most common/);
    const noName = await request(t.app).post(`/api/invitations/${token}/accept`).set(csrfHeaders).send({ name: ' ', password: TEST_PASSWORD });
    expect(noName.body.error.fields.name).toBe('Your name is required');
    // The link still works after refused attempts.
    expect((await request(t.app).get(`/api/invitations/${token}`)).status).toBe(200);
  });
});
