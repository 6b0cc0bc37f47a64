import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import type { Browser, BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TEST_PASSWORD, uniqueEmail } from '../helpers/auth.js';
import { jpegFromPhone, pngSwatch } from '../integration/uploads-fixtures.js';
import { axeSeriousFindings } from './axe-check.js';
import { browserLaunch, screenshot, serverStart, type RunningServer } from './harness.js';

const WAIT = { timeout: 15_000 };
const TABLET = { width: 1024, height: 768 };
const XHR = { 'X-Requested-With': 'XMLHttpRequest' };

describe('fitting photos in chromium', () => {
  let server: RunningServer;
  let browser: Browser;
  let uploads: string;

  beforeAll(async () => {
    uploads = await fs.mkdtemp(path.join(os.tmpdir(), 'kw-e2e-uploads-'));
    server = await serverStart({ STORAGE_URL: pathToFileURL(uploads).href });
    browser = await browserLaunch();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
    if (uploads) await fs.rm(uploads, { recursive: true, force: true });
  });

  /** A new studio signed up through the API; the browser context keeps its session cookie. */
  async function ownerContext(): Promise<BrowserContext> {
    // axe-core is injected as a script, which the app's CSP forbids: this context bypasses it.
    const context = await browser.newContext({ viewport: TABLET, bypassCSP: true });
    const signup = await context.request.post(`${server.url}/api/auth/signup`, {
      headers: XHR,
      data: { studioName: 'Larkspur Knitwear', name: 'Odile Farrant', email: uniqueEmail('e2e-photos'), password: TEST_PASSWORD },
    });
    expect(signup.status()).toBe(201);
    return context;
  }

  it('an owner uploads a fitting photo on the client page and sees it shown', async () => {
    const context = await ownerContext();
    const client = await context.request.post(`${server.url}/api/clients`, { headers: XHR, data: { name: 'Briony Takahashi' } });
    const clientId = ((await client.json()) as { id: number }).id;
    const today = new Date().toISOString().slice(0, 10);
    const set = await context.request.post(`${server.url}/api/clients/${clientId}/measurements`, {
      headers: XHR,
      data: { takenAt: today, unit: 'cm', values: { bust: 88, hip: 96, armholeDepth: 20 } },
    });
    expect(set.status()).toBe(201);

    const page = await context.newPage();
    await page.goto(`${server.url}/clients/${clientId}`);
    await page.getByRole('heading', { name: 'Fitting photos' }).waitFor(WAIT);
    await page.getByText('No photos yet. Add front, side and back views').waitFor(WAIT);

    await page.getByTestId('photo-add').click();
    const dialog = page.getByRole('dialog', { name: 'Add a fitting photo of Briony Takahashi' });
    await dialog.waitFor(WAIT);
    await dialog.getByTestId('photo-file').setInputFiles({ name: 'side-fitting.jpg', mimeType: 'image/jpeg', buffer: await jpegFromPhone(1200, 900) });
    await dialog.getByRole('img', { name: 'The chosen fitting photo' }).waitFor(WAIT);
    await dialog.getByLabel('View').selectOption('side');
    await expect.poll(() => dialog.getByLabel(/Goes with the fitting/).inputValue()).not.toBe('');
    expect(await axeSeriousFindings(page)).toEqual([]);
    await screenshot(page, 'photos-upload-dialog');

    await dialog.getByRole('button', { name: 'Upload photo' }).click();
    await dialog.waitFor({ state: 'hidden', ...WAIT });

    const thumb = page.getByTestId('photo-thumb').first();
    await thumb.waitFor(WAIT);
    // The thumbnail really loaded through the authorised route (an <img> that failed has no size).
    await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(300);
    await page.getByText('Side', { exact: true }).waitFor(WAIT);
    expect(await axeSeriousFindings(page)).toEqual([]);
    await screenshot(page, 'photos-client-section');

    await page.getByRole('button', { name: /^Open at full size: Side · / }).click();
    const viewer = page.getByRole('dialog', { name: /Side view/ });
    const full = viewer.getByTestId('photo-full');
    await full.waitFor(WAIT);
    // Stood upright from EXIF orientation 6: 900 px wide, 1200 px high.
    await expect.poll(() => full.evaluate((img: HTMLImageElement) => img.complete && `${img.naturalWidth}×${img.naturalHeight}`)).toBe('900×1200');
    expect(await axeSeriousFindings(page)).toEqual([]);
    await screenshot(page, 'photos-full-view');
    await context.close();
  });
  it('an owner adds a swatch to a fabric and sees it on the fabric and in the fabrics list', async () => {
    const context = await ownerContext();
    const fabric = await context.request.post(`${server.url}/api/fabrics`, {
      headers: XHR,
      data: { name: 'Heather rib knit', stretchCrosswise: 60, recovery: 'good' },
    });
    const fabricId = ((await fabric.json()) as { id: number }).id;

    const page = await context.newPage();
    await page.goto(`${server.url}/fabrics/${fabricId}`);
    await page.getByRole('heading', { name: 'Swatch' }).waitFor(WAIT);
    await page.getByText('No swatch yet: add a photo of the knit.').waitFor(WAIT);
    await page.getByTestId('photo-file').setInputFiles({ name: 'heather-rib.png', mimeType: 'image/png', buffer: await pngSwatch(600, 400) });
    await page.getByRole('button', { name: 'Save swatch' }).click();
    const thumb = page.getByTestId('swatch-thumb');
    await thumb.waitFor(WAIT);
    await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(400);
    await page.getByRole('button', { name: 'Replace swatch' }).waitFor(WAIT);
    expect(await axeSeriousFindings(page)).toEqual([]);
    await screenshot(page, 'photos-fabric-swatch');

    await page.goto(`${server.url}/fabrics`);
    const row = page.getByRole('row', { name: /Heather rib knit/ });
    const listThumb = row.locator('img');
    await listThumb.waitFor(WAIT);
    await expect.poll(() => listThumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(400);
    expect(await axeSeriousFindings(page)).toEqual([]);
    await screenshot(page, 'photos-fabrics-list');
    await context.close();
  });
});
