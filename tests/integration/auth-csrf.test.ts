/**
 * Cross-site request forgery and content types on the JSON API (OWASP CSRF Prevention Cheat
 * Sheet: "Employing Custom Request Headers for AJAX/API", "Verifying Origin With Standard
 * Headers", "Fetch Metadata headers"; ASVS 5.0 §3.5.1, §3.5.3 and §4.1.1, numbers from memory).
 */
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { Studio, User } from '../../server/models/index.js';
import { csrfHeaders, memberAdd, sessionCookieOf, studioSignUp, TEST_PASSWORD } from '../helpers/auth.js';
import { testAppCreate } from '../helpers/test-app.js';

const { app, close } = testAppCreate();
afterAll(close);

describe('CSRF defence', () => {
  it('refuses a sign-in without X-Requested-With (login CSRF) and starts no session', async () => {
    const a = await studioSignUp(app);
    const res = await request(app).post('/api/auth/signin').send({ email: a.email, password: TEST_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf');
    expect(sessionCookieOf(res.headers['set-cookie'])).toBeUndefined();
  });

  it('refuses a signed-in owner’s change without the header and changes nothing', async () => {
    const a = await studioSignUp(app);
    const res = await a.agent.patch('/api/studio').send({ name: 'Forged Name' });
    expect(res.status).toBe(403);
    expect((await Studio.findByPk(a.studio.id))!.name).toBe(a.studio.name);
  });

  it('refuses a wrong value of the header', async () => {
    const a = await studioSignUp(app);
    const res = await a.agent.patch('/api/auth/me').set('X-Requested-With', 'fetch').send({ name: 'Forged' });
    expect(res.status).toBe(403);
  });

  it('refuses a request whose Origin is another site, even with the header', async () => {
    const a = await studioSignUp(app);
    const cutter = await memberAdd(app, a.studio.id, 'cutter');
    const res = await a.agent.delete(`/api/studio/members/${cutter.member.id}`).set(csrfHeaders).set('Origin', 'https://knit-deals.example');
    expect(res.status).toBe(403);
    expect(await User.count({ where: { id: cutter.member.id } })).toBe(1);
  });

  it('refuses Origin: null (sandboxed frames, some redirects)', async () => {
    const a = await studioSignUp(app);
    const res = await a.agent.patch('/api/auth/me').set(csrfHeaders).set('Origin', 'null').send({ name: 'Sandboxed' });
    expect(res.status).toBe(403);
  });

  it('accepts the app’s own Origin', async () => {
    const a = await studioSignUp(app);
    const res = await a.agent
      .patch('/api/auth/me')
      .set(csrfHeaders)
      .set('Host', 'studio.knitwright.example')
      .set('Origin', 'http://studio.knitwright.example')
      .send({ name: 'Same Origin' });
    expect(res.status).toBe(200);
  });

  it.each(['cross-site', 'same-site', 'none'])('refuses Sec-Fetch-Site: %s and accepts same-origin', async (site) => {
    const a = await studioSignUp(app);
    const refused = await a.agent.patch('/api/auth/me').set(csrfHeaders).set('Sec-Fetch-Site', site).send({ name: 'Elsewhere' });
    expect(refused.status).toBe(403);
    const accepted = await a.agent.patch('/api/auth/me').set(csrfHeaders).set('Sec-Fetch-Site', 'same-origin').send({ name: 'Here' });
    expect(accepted.status).toBe(200);
  });

  // ASVS 5.0 §3.5.3: no state change on GET.
  it('has no GET route that signs out or changes anything', async () => {
    const a = await studioSignUp(app);
    expect((await a.agent.get('/api/auth/signout')).status).toBe(404);
    expect((await a.agent.get('/api/auth/me')).status).toBe(200);
  });
});

describe('JSON only', () => {
  it.each([
    ['text/plain', '{"email":"a@b.example","password":"x"}'],
    ['application/x-www-form-urlencoded', 'email=a%40b.example&password=x'],
    ['multipart/form-data; boundary=kw', '--kw\r\nContent-Disposition: form-data; name="email"\r\n\r\na@b.example\r\n--kw--\r\n'],
  ])('answers a %s body with 415', async (type, body) => {
    const res = await request(app).post('/api/auth/signin').set(csrfHeaders).set('Content-Type', type).send(body);
    expect(res.status).toBe(415);
    expect(res.body).toEqual({ error: { code: 'unsupported_media_type', message: expect.any(String) } });
  });

  it('answers malformed JSON with 400 in the one error shape', async () => {
    const res = await request(app).post('/api/auth/signin').set(csrfHeaders).set('Content-Type', 'application/json').send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({ error: { code: 'invalid_json', message: expect.any(String) } });
  });
});

describe('response headers', () => {
  // OWASP HTTP Headers Cheat Sheet; ASVS 5.0 §3.4.3 (CSP), §3.4.4 (nosniff), §3.4.5 (referrer policy),
  // §14.3.2 (no caching of sensitive data).
  it('sends a strict CSP, nosniff, a referrer policy and no-store on API answers', async () => {
    const res = await request(app).get('/api/auth/me');
    const csp = String(res.headers['content-security-policy']);
    expect(csp).toMatch(/default-src 'self'/);
    expect(csp).toMatch(/script-src 'self'(;|$)/);
    expect(csp).not.toMatch(/unsafe-inline|unsafe-eval/);
    expect(csp).toMatch(/frame-ancestors 'none'/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['referrer-policy']).toBe('same-origin');
    expect(res.headers['cache-control']).toBe('no-store');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});
