/**
 * The team and its mail in chromium, through the real server and its own local SMTP sink: the
 * owner invites a cutter, the cutter's link is taken from the owner's Sent mail page, the cutter
 * joins and is signed in as a cutter; a forgotten password is reset through the e-mailed link.
 * New screens are checked with axe-core (WCAG 2.x A/AA): no serious or critical findings.
 */
import { createHash, randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { testAppCreate } from '../helpers/test-app.js';
import { axeSeriousFindings } from './axe-check.js';
import { browserLaunch, screenshot, serverStart, type RunningServer } from './harness.js';

const WAIT = { timeout: 15_000 };

describe('team and e-mail in chromium', () => {
  let server: RunningServer;
  let browser: Browser;
  const run = randomUUID().slice(0, 8);
  const owner = { studioName: `Bramble Rib Studio ${run}`, name: 'Nell Fairley', email: `nell.${run}@bramblerib.example`, password: 'tension swatch and a steam iron' };
  const cutter = { name: 'Joss Ormond', email: `joss.${run}@bramblerib.example`, password: 'rotary blade on a green mat', newPassword: 'walking foot and woolly nylon' };

  beforeAll(async () => {
    // The browser asks from 127.0.0.1: forget that address's earlier reset requests, so reruns within the hour are not refused.
    const db = testAppCreate();
    try {
      const key = createHash('sha256').update('127.0.0.1').digest('hex');
      await db.sequelize.query("DELETE FROM mail_throttle WHERE bucket = 'resetPerIp' AND key_hash = ?", { replacements: [key] });
    } finally {
      await db.close();
    }
    // Port 0: this server's own sink on a free port, never another run's.
    server = await serverStart({ SMTP_SINK_PORT: '0' });
    browser = await browserLaunch();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  async function contextOpen(forAxe = false): Promise<BrowserContext> {
    return browser.newContext({ viewport: { width: 1280, height: 860 }, bypassCSP: forAxe });
  }

  async function signIn(page: Page, email: string, password: string): Promise<void> {
    await page.goto(`${server.url}/sign-in`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password', { exact: true }).fill(password);
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.getByTestId('header-member').waitFor(WAIT);
  }

  /** Opens the newest message with this subject on the owner's Sent mail page; returns its first link. */
  async function linkFromSentMail(page: Page, subject: string, shot: string): Promise<string> {
    await page.goto(`${server.url}/studio/mail`);
    await page.getByRole('heading', { name: 'Sent mail' }).waitFor(WAIT);
    await page.getByRole('link', { name: subject }).first().click();
    await page.getByRole('heading', { name: subject }).waitFor(WAIT);
    const frame = page.frameLocator('[data-testid="mail-html"]');
    const link = frame.getByRole('link').first();
    await link.waitFor(WAIT);
    await screenshot(page, shot);
    const href = await link.getAttribute('href');
    if (!href) throw new Error('the message has no link');
    return href;
  }

  let ownerContext: BrowserContext;
  let ownerPage: Page;

  it('lets the owner invite a cutter, who joins through the link read on the Sent mail page', async () => {
    ownerContext = await contextOpen();
    ownerPage = await ownerContext.newPage();
    const signup = await ownerContext.request.post(`${server.url}/api/auth/signup`, {
      headers: { 'X-Requested-With': 'XMLHttpRequest' },
      data: { studioName: owner.studioName, name: owner.name, email: owner.email, password: owner.password },
    });
    expect(signup.status()).toBe(201);

    await ownerPage.goto(`${server.url}/studio`);
    await ownerPage.getByRole('link', { name: 'Invitations' }).click();
    await ownerPage.getByRole('heading', { name: 'Invitations', level: 1 }).waitFor(WAIT);
    await ownerPage.getByText('No invitations yet').waitFor(WAIT);
    await ownerPage.getByLabel('E-mail').fill(cutter.email);
    await ownerPage.getByLabel('Role').selectOption('cutter');
    await ownerPage.getByRole('button', { name: 'Send the invitation' }).click();
    await ownerPage.getByText(`Invitation sent to ${cutter.email}.`).waitFor(WAIT);
    const row = ownerPage.getByTestId(`invitation-${cutter.email}`);
    expect(await row.textContent()).toContain('Waiting');
    // The same address twice is refused beside the field.
    await ownerPage.getByLabel('E-mail').fill(cutter.email);
    await ownerPage.getByRole('button', { name: 'Send the invitation' }).click();
    await ownerPage.getByText('An invitation to this address is still open: resend it from the list instead.').waitFor(WAIT);
    await screenshot(ownerPage, 'team-invitations');

    const href = await linkFromSentMail(ownerPage, `Join ${owner.studioName} on Knitwright`, 'team-sent-mail-invitation');
    expect(new URL(href).origin).toBe(server.url);

    const cutterContext = await contextOpen();
    const page = await cutterContext.newPage();
    await page.goto(href);
    await page.getByRole('heading', { name: `Join ${owner.studioName}` }).waitFor(WAIT);
    expect(await page.getByLabel('E-mail').inputValue()).toBe(cutter.email);
    await page.getByLabel('Your name').fill(cutter.name);
    await page.getByLabel('Password', { exact: true }).fill('short');
    await page.getByRole('button', { name: 'Join the studio' }).click();
    await page.getByText('Password must be at least 8 characters').waitFor(WAIT);
    await screenshot(page, 'team-accept-invitation');
    await page.getByLabel('Password', { exact: true }).fill(cutter.password);
    await page.getByRole('button', { name: 'Join the studio' }).click();
    await page.getByTestId('header-member').waitFor(WAIT);
    expect(await page.getByTestId('header-member').textContent()).toContain('Cutter');
    expect(await page.getByTestId('header-studio').textContent()).toBe(owner.studioName);
    expect(await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Studio' }).count()).toBe(0);

    // The link worked once.
    const again = await cutterContext.newPage();
    await again.goto(href);
    await again.getByText('This invitation has already been accepted.').waitFor(WAIT);

    // Signing in again later works with the chosen password.
    await cutterContext.close();
    const later = await (await contextOpen()).newPage();
    await signIn(later, cutter.email, cutter.password);
    expect(await later.getByTestId('header-member').textContent()).toContain('Cutter');
    await later.context().close();

    await ownerPage.goto(`${server.url}/studio/invitations`);
    await ownerPage.getByTestId(`invitation-${cutter.email}`).getByText('Accepted').waitFor(WAIT);
  });

  it('resets a forgotten password through the e-mailed link', async () => {
    const context = await contextOpen();
    const page = await context.newPage();
    await page.goto(`${server.url}/sign-in`);
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.getByRole('heading', { name: 'Reset your password' }).waitFor(WAIT);
    await page.getByLabel('E-mail').fill(cutter.email);
    await page.getByRole('button', { name: 'Send me a reset link' }).click();
    await page.getByText('Check your e-mail').waitFor(WAIT);
    await screenshot(page, 'team-forgot-password');

    // The message goes out just after the answer: the owner's Sent mail shows it once stored.
    let href = '';
    for (let i = 0; i < 20 && !href; i++) {
      try {
        href = await linkFromSentMail(ownerPage, 'Reset your Knitwright password', 'team-sent-mail-reset');
      } catch {
        await new Promise((r) => setTimeout(r, 250));
      }
    }
    expect(new URL(href).pathname).toMatch(/^\/reset-password\/[A-Za-z0-9_-]{43}$/);

    await page.goto(href);
    await page.getByRole('heading', { name: 'Choose a new password' }).waitFor(WAIT);
    await page.getByText(`For ${cutter.email}`).waitFor(WAIT);
    await page.getByLabel('New password', { exact: true }).fill(cutter.newPassword);
    await screenshot(page, 'team-reset-password');
    await page.getByRole('button', { name: 'Save the new password' }).click();
    await page.getByText('Password changed').waitFor(WAIT);

    await page.goto(href);
    await page.getByText('This password-reset link has already been used').waitFor(WAIT);

    await signIn(page, cutter.email, cutter.newPassword);
    expect(await page.getByTestId('header-member').textContent()).toContain('Cutter');
    await context.close();
  });

  it("e-mails a client their measurements from the client's page", async () => {
    const headers = { 'X-Requested-With': 'XMLHttpRequest' };
    const clientEmail = `wren.${run}@client.example`;
    const created = await ownerContext.request.post(`${server.url}/api/clients`, { headers, data: { name: 'Wren Calloway', email: clientEmail } });
    expect(created.status()).toBe(201);
    const clientId = ((await created.json()) as { id: number }).id;
    const set = await ownerContext.request.post(`${server.url}/api/clients/${clientId}/measurements`, {
      headers,
      data: { takenAt: '2026-03-14', unit: 'in', values: { bust: '36 1/2', hip: 40, armholeDepth: '8 1/2' } },
    });
    expect(set.status()).toBe(201);

    await ownerPage.goto(`${server.url}/clients/${clientId}`);
    await ownerPage.getByText('Nothing has been e-mailed about Wren Calloway yet.').waitFor(WAIT);
    await ownerPage.getByRole('button', { name: 'E-mail the measurements' }).click();
    await ownerPage.getByRole('dialog').getByRole('button', { name: 'Send the measurements' }).click();
    await ownerPage.getByText(`The measurements went to ${clientEmail}.`).waitFor(WAIT);
    await ownerPage.getByRole('link', { name: 'Open the message: Measurements' }).waitFor(WAIT);
    await screenshot(ownerPage, 'team-client-mail');
    await ownerPage.getByRole('link', { name: 'Open the message: Measurements' }).click();
    await ownerPage.getByRole('heading', { name: `Your measurements from ${owner.studioName}` }).waitFor(WAIT);
    await ownerPage.getByRole('button', { name: 'Show as plain text' }).click();
    // 36 1/2 in typed, stored in mm and written back in the studio's unit (inches, to 1/8 in).
    expect(await ownerPage.getByTestId('mail-text').textContent()).toMatch(/Bust girth\s+36 1\/2 in/);
    await screenshot(ownerPage, 'team-mail-text');
  });

  it('has no serious accessibility findings on the new screens', async () => {
    const context = await contextOpen(true);
    const page = await context.newPage();
    await signIn(page, owner.email, owner.password);
    const screens = ['/studio/invitations', '/studio/mail'];
    for (const path of screens) {
      await page.goto(`${server.url}${path}`);
      await page.getByRole('heading', { level: 1 }).waitFor(WAIT);
      await page.getByRole('table').first().waitFor(WAIT);
      expect(await axeSeriousFindings(page), path).toEqual([]);
    }
    await page.getByRole('link', { name: /^Join / }).first().click();
    await page.locator('[data-testid="mail-html"]').waitFor(WAIT);
    expect(await axeSeriousFindings(page), 'message').toEqual([]);

    const anonymous = await (await contextOpen(true)).newPage();
    for (const path of ['/forgot-password', '/reset-password/not-a-real-link-but-long-enough-to-look-like-1', `/invitations/${'x'.repeat(43)}`]) {
      await anonymous.goto(`${server.url}${path}`);
      await anonymous.getByRole('heading', { level: 1 }).waitFor(WAIT);
      await anonymous.getByRole('status').or(anonymous.getByRole('alert')).or(anonymous.getByRole('form')).first().waitFor(WAIT);
      expect(await axeSeriousFindings(anonymous), path).toEqual([]);
    }
    await anonymous.context().close();
    await context.close();
  });
});
