import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { DEMO, demoStudioSeed } from '../../server/seed/demo-studio.js';
import { testAppCreate } from '../helpers/test-app.js';
import { axeSeriousFindings } from './axe-check.js';
import { browserLaunch, screenshot, serverStart, type RunningServer } from './harness.js';

const WAIT = { timeout: 15_000 };
/** Tablet size the fitting screen is designed for (landscape). */
const TABLET = { width: 1024, height: 768 };

/*
 * Expected values are worked out by hand from 1 in = 25.4 mm exactly (NIST SP 811, appendix B),
 * shown in centimetres to 1 mm and in inches to the nearest 1/8 in:
 *   35 1/2 in = 901.7 mm → 90.2 cm;  38 in = 965.2 mm → 96.5 cm;  28 1/4 in = 717.55 mm → 71.8 cm;
 *   8 1/4 in = 209.55 mm → 21 cm.  Second fitting: bust 92 cm (+18.3 mm → +1.8 cm), waist 70 cm
 *   (−17.55 mm → −1.8 cm), hip 96.5 cm (−0.2 mm: no visible change); 920 mm = 36 1/4 in.
 */

describe('records in chromium: clients, fitting mode and measurement history', () => {
  let server: RunningServer;
  let browser: Browser;
  const run = randomUUID().slice(0, 6);
  const clientName = `Wren Calloway ${run}`;
  let clientPath = '';

  beforeAll(async () => {
    const seedApp = testAppCreate();
    try {
      await demoStudioSeed(seedApp.sequelize);
    } finally {
      await seedApp.close();
    }
    server = await serverStart();
    browser = await browserLaunch();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  async function signedIn(person: { email: string; password: string }): Promise<Page> {
    // axe-core is injected as a script, which the app's CSP forbids: these pages bypass it.
    const context = await browser.newContext({ viewport: TABLET, bypassCSP: true });
    const page = await context.newPage();
    await page.goto(`${server.url}/sign-in`);
    await page.getByLabel('E-mail').fill(person.email);
    await page.getByLabel('Password', { exact: true }).fill(person.password);
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.getByRole('button', { name: 'Sign out' }).waitFor(WAIT);
    return page;
  }

  async function expectAxeClean(page: Page): Promise<void> {
    expect(await axeSeriousFindings(page)).toEqual([]);
  }

  const historyCell = (page: Page, field: string, column = 0) =>
    page.getByTestId('measurement-history').locator(`tbody td[data-field="${field}"]`).nth(column);

  async function fieldType(page: Page, text: string): Promise<void> {
    const input = page.getByTestId('fitting-input');
    await input.fill(text);
    await input.press('Enter');
  }

  it('an owner adds a client, takes a set in inches, reads it in cm, and sees the differences of a second set', async () => {
    const page = await signedIn(DEMO.owner);

    await page.goto(`${server.url}/clients`);
    await page.getByRole('heading', { name: 'Clients', level: 1 }).waitFor(WAIT);
    await page.getByRole('button', { name: 'Add client' }).first().click();
    const dialog = page.getByRole('dialog', { name: 'Add a client' });
    await dialog.getByLabel('Name').fill(clientName);
    await dialog.getByLabel('E-mail').fill(`wren.${run}@example.com`);
    await dialog.getByRole('button', { name: 'Add client' }).click();
    await page.waitForURL(/\/clients\/\d+$/, WAIT);
    clientPath = new URL(page.url()).pathname;
    await page.getByRole('heading', { name: clientName, level: 1 }).waitFor(WAIT);
    await page.getByTestId('measurements-empty').waitFor(WAIT);

    // The clients table finds the new client by a part of the name.
    await page.goto(`${server.url}/clients`);
    await page.getByLabel('Search clients').fill(run);
    await page.getByRole('link', { name: clientName }).waitFor(WAIT);
    await page.waitForURL(new RegExp(`q=${run}`), WAIT);
    // The last page stays on screen, dimmed, until the search answers.
    await page.waitForFunction(() => document.querySelectorAll('table tbody tr').length === 1, undefined, WAIT);
    await page.getByLabel('Search clients').fill('');
    await page.waitForURL(/\/clients$/, WAIT);
    await page.locator('table tbody tr').first().waitFor(WAIT);
    await screenshot(page, 'records-clients-table');
    await expectAxeClean(page);

    // First fitting, typed in inches in the forms a tape is read in.
    await page.goto(`${server.url}${clientPath}`);
    await page.getByRole('radio', { name: 'Inches' }).check();
    await page.getByTestId('take-measurements').first().click();
    await page.getByTestId('fitting-mode').waitFor(WAIT);
    expect(await page.getByTestId('body-diagram').getAttribute('data-field')).toBe('bust');
    await page.getByTestId('fitting-input').fill('35 1/2');
    await page.getByText('Reads as 35 1/2 in = 90.2 cm').waitFor(WAIT);
    await screenshot(page, 'records-fitting');
    await expectAxeClean(page);
    await page.getByTestId('fitting-input').press('Enter');
    // High bust: whole inches typed, the half tapped as a fraction key.
    expect(await page.getByTestId('body-diagram').getAttribute('data-field')).toBe('highBust');
    await page.getByTestId('fitting-input').fill('33');
    await page.getByRole('button', { name: 'Add one half' }).click();
    expect(await page.getByTestId('fitting-input').inputValue()).toBe('33½');
    await page.getByTestId('fitting-input').press('ArrowDown');
    // A sideways swipe (a finger, not the mouse) moves between fields too.
    expect(await page.getByTestId('body-diagram').getAttribute('data-field')).toBe('underbust');
    await swipe(page, -160);
    expect(await page.getByTestId('body-diagram').getAttribute('data-field')).toBe('waist');
    await swipe(page, 160);
    expect(await page.getByTestId('body-diagram').getAttribute('data-field')).toBe('underbust');
    await fieldType(page, '30');
    await fieldType(page, '28 1/4');
    await fieldType(page, '38');
    await page.getByRole('button', { name: /^12\. Armhole depth/ }).click();
    await fieldType(page, '8 1/4');
    await page.getByRole('button', { name: 'Review and save' }).click();
    const review = page.getByTestId('set-comparison');
    expect(await review.locator('td[data-field="bust"]').textContent()).toBe('35 1/2 in');
    expect(await review.locator('td[data-field="highBust"]').textContent()).toBe('33 1/2 in');
    await page.getByTestId('fitting-save').click();
    await page.waitForURL(new RegExp(`${clientPath}$`), WAIT);
    await page.getByText(/^Measurement set of .* saved\.$/).waitFor(WAIT);

    await page.getByText(/^1 fitting; the latest on /).waitFor(WAIT);
    expect(await historyCell(page, 'bust').textContent()).toBe('35 1/2 in');
    expect(await historyCell(page, 'hip').textContent()).toBe('38 in');
    expect(await historyCell(page, 'armholeDepth').textContent()).toBe('8 1/4 in');

    // The same set read in centimetres.
    await page.getByRole('radio', { name: 'Centimetres' }).check();
    await expectText(page, () => historyCell(page, 'bust').textContent(), '90.2 cm');
    expect(await historyCell(page, 'hip').textContent()).toBe('96.5 cm');
    expect(await historyCell(page, 'waist').textContent()).toBe('71.8 cm');
    expect(await historyCell(page, 'armholeDepth').textContent()).toBe('21 cm');

    // Second fitting, in centimetres now, compared with the first as it is typed.
    await page.getByTestId('take-measurements').first().click();
    await page.getByTestId('fitting-mode').waitFor(WAIT);
    await page.getByTestId('fitting-input').fill('92');
    await expectText(page, () => page.getByTestId('fitting-previous').textContent(), /90\.2 cm.*\+1\.8 cm/);
    // A stray tap on the menu asks before the typed measurements are lost.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Clients' }).click();
    const leave = page.getByRole('dialog', { name: 'Leave without saving?' });
    await leave.waitFor(WAIT);
    await leave.getByRole('button', { name: 'Cancel' }).click();
    await leave.waitFor({ state: 'hidden', ...WAIT });
    expect(await page.getByTestId('fitting-input').inputValue()).toBe('92');
    await page.getByTestId('fitting-input').press('Enter');
    await page.getByTestId('fitting-next').click();
    await page.getByTestId('fitting-next').click();
    await fieldType(page, '70');
    await fieldType(page, '96.5');
    await page.getByRole('button', { name: /^12\. Armhole depth/ }).click();
    await fieldType(page, '21');
    await page.getByRole('button', { name: 'Review and save' }).click();
    await page.getByTestId('set-comparison').locator('[data-testid="delta"]').first().waitFor(WAIT);
    await page.getByTestId('fitting-save').click();
    await page.waitForURL(new RegExp(`${clientPath}$`), WAIT);
    await page.getByText(/^Measurement set of .* saved\.$/).waitFor(WAIT);

    expect(await page.getByTestId('set-column').count()).toBe(2);
    const bust = historyCell(page, 'bust');
    expect(await bust.getAttribute('data-changed')).toBe('true');
    expect(await bust.textContent()).toBe('92 cm+1.8 cm, up 1.8 cm since the fitting before');
    const waist = historyCell(page, 'waist');
    expect(await waist.getAttribute('data-changed')).toBe('true');
    expect(await waist.getByTestId('delta').textContent()).toContain('−1.8 cm');
    const hip = historyCell(page, 'hip');
    expect(await hip.getAttribute('data-changed')).toBeNull();
    expect(await hip.textContent()).toBe('96.5 cm');
    expect(await historyCell(page, 'bust', 1).textContent()).toBe('90.2 cm');
    await screenshot(page, 'records-client-page');
    await expectAxeClean(page);
  }, 240_000);

  it('an owner adds a fabric from a stretch test and sees the negative ease it suits', async () => {
    const page = await signedIn(DEMO.owner);
    await page.goto(`${server.url}/fabrics`);
    await page.getByRole('heading', { name: 'Fabrics', level: 1 }).waitFor(WAIT);
    await page.getByRole('link', { name: 'Add fabric' }).first().click();
    await page.getByRole('heading', { name: 'Add a fabric', level: 1 }).waitFor(WAIT);
    // 10 cm pulled to 15 cm is 50 % (thesewingdirectory.co.uk "What is stretch?"; blog.fabric.com
    // "How to measure stretch of knit fabric"), typed with units whatever the unit on screen.
    await page.getByLabel('Relaxed length').fill('10 cm');
    await page.getByLabel('Stretched length').fill('15 cm');
    await expectText(page, () => page.getByTestId('stretch-result').textContent(), '50 %');
    await page.getByRole('button', { name: 'Use as crosswise stretch' }).click();
    expect(await page.getByLabel('Crosswise stretch').inputValue()).toBe('50');
    // Good recovery: worn at a fifth of the tested stretch (Knitwright's default), e = 0.10;
    // negative ease e ÷ (1 + e) = 9.09 % (worn-stretch arithmetic, trade.md), inside the 8–10 %
    // usual for a fitted knit tank top (common practice).
    await expectText(page, () => page.getByTestId('ease-result').textContent(), '−9.1 %');
    await page.getByLabel('Name').fill(`Sage modal jersey ${run}`);
    await page.getByLabel('Width').fill('150 cm');
    await page.getByRole('button', { name: 'Add fabric' }).click();
    await page.waitForURL(/\/fabrics\/\d+$/, WAIT);
    await page.getByRole('heading', { name: `Sage modal jersey ${run}`, level: 1 }).waitFor(WAIT);
    // 150 cm = 59.06 in, shown to the nearest 1/8 in.
    expect(await page.getByLabel('Width').inputValue()).toBe('59');
    await expectAxeClean(page);

    await page.goto(`${server.url}/fabrics`);
    const row = page.getByRole('row', { name: new RegExp(`Sage modal jersey ${run}`) });
    await row.waitFor(WAIT);
    expect(await row.textContent()).toContain('−9.1 %');
  }, 120_000);

  it('a cutter reads the sets but has no way to change them', async () => {
    expect(clientPath).not.toBe('');
    const page = await signedIn(DEMO.cutter);
    await page.goto(`${server.url}${clientPath}`);
    await page.getByRole('heading', { name: clientName, level: 1 }).waitFor(WAIT);
    await page.getByTestId('measurement-history').waitFor(WAIT);
    // A new session starts in the studio's unit (inches): 920 mm = 36 1/4 in.
    expect(await historyCell(page, 'bust').textContent()).toMatch(/^36 1\/4 in/);
    expect(await page.getByTestId('set-column').count()).toBe(2);
    for (const name of ['Take measurements', 'Edit details', 'Archive client']) {
      expect(await page.getByRole('button', { name }).count()).toBe(0);
      expect(await page.getByRole('link', { name }).count()).toBe(0);
    }
    expect(await page.getByTestId('correct-set').count()).toBe(0);
    expect(await page.getByText(`wren.${run}@example.com`).count()).toBe(0);
    await expectAxeClean(page);

    await page.goto(`${server.url}${clientPath}/fitting`);
    await page.getByRole('heading', { name: /for the studio.s owners/ }).waitFor(WAIT);
    expect(await page.getByTestId('fitting-mode').count()).toBe(0);

    await page.goto(`${server.url}/fabrics`);
    const fabricLink = page.getByRole('link', { name: new RegExp(`Sage modal jersey ${run}`) });
    await fabricLink.waitFor(WAIT);
    expect(await page.getByRole('link', { name: 'Add fabric' }).count()).toBe(0);
    await fabricLink.click();
    await page.getByRole('heading', { name: 'Recommended negative ease' }).waitFor(WAIT);
    expect(await page.getByRole('button', { name: 'Save fabric' }).count()).toBe(0);
    expect(await page.getByRole('textbox').count()).toBe(0);
  }, 120_000);
});

/** A touch swipe of `dx` pixels across the fitting panel, as the browser reports it. */
async function swipe(page: Page, dx: number): Promise<void> {
  await page.getByTestId('fitting-input').evaluate((input, dx) => {
    const box = input.getBoundingClientRect();
    const at = (type: string, x: number) =>
      input.dispatchEvent(new PointerEvent(type, { bubbles: true, pointerType: 'touch', isPrimary: true, clientX: x, clientY: box.top + 10 }));
    const x0 = box.left + box.width / 2;
    at('pointerdown', x0);
    at('pointerup', x0 + dx);
  }, dx);
}

/** Waits until `read()` gives the expected text (the screen re-renders after a switch). */
async function expectText(page: Page, read: () => Promise<string | null>, expected: string | RegExp): Promise<void> {
  const deadline = Date.now() + WAIT.timeout;
  let last: string | null = null;
  while (Date.now() < deadline) {
    last = await read();
    if (typeof expected === 'string' ? last === expected : expected.test(last ?? '')) return;
    await page.waitForTimeout(100);
  }
  expect(last).toEqual(expected);
}
