import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { browserLaunch, screenshot, serverStart, type RunningServer } from './harness.js';

describe('the built app in chromium', () => {
  let server: RunningServer;
  let browser: Browser;

  beforeAll(async () => {
    server = await serverStart();
    browser = await browserLaunch();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('renders the first page styled, with Inter loaded from the app itself', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
    const external: string[] = [];
    page.on('request', (req) => {
      if (!req.url().startsWith(server.url) && !req.url().startsWith('data:')) external.push(req.url());
    });
    await page.goto(server.url);
    await page.waitForSelector('header');
    await page.evaluate(() => document.fonts.ready);
    const fontOk = await page.evaluate(() => document.fonts.check('16px Inter'));
    const interLoaded = await page.evaluate(() => [...document.fonts].some((f) => f.family.replace(/"/g, '') === 'Inter' && f.status === 'loaded'));
    const bodyFont = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
    const background = await page.evaluate(() => getComputedStyle(document.body).backgroundColor);
    expect(fontOk).toBe(true);
    expect(interLoaded).toBe(true);
    expect(bodyFont).toMatch(/Inter/);
    // Tailwind applied: the surface colour, not the browser's white.
    expect(background).not.toBe('rgba(0, 0, 0, 0)');
    expect(background).not.toBe('rgb(255, 255, 255)');
    expect(external).toEqual([]);
    await screenshot(page, 'shell-home');
  });

  it('shows a 404 page for an unknown address', async () => {
    const page = await browser.newPage();
    await page.goto(`${server.url}/no/such/page`);
    const heading = page.getByRole('heading', { name: /no page at this address/i });
    await heading.waitFor({ state: 'visible', timeout: 10_000 });
    expect(await heading.isVisible()).toBe(true);
  });
});
