/**
 * E-mailing a draft's documents in chromium, through the real server and its own local SMTP
 * sink, on the demo studio: the owner e-mails the cutting ticket of a demo draft to a copy
 * shop's address from the draft page, sees it in the dialog's Sent list, then opens it under
 * Studio → Sent mail with its PDF attached. A cutter may send to an address but not to the
 * client. The dialog is checked with axe-core (WCAG 2.x A/AA): no serious or critical findings.
 */
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import type { DraftSummaryDto } from '../../shared/schemas/draft-dto.js';
import type { DeliveriesResponse } from '../../shared/schemas/mail.js';
import { DEMO, demoStudioSeed } from '../../server/seed/demo-studio.js';
import { DEMO_CLIENTS, demoRecordsSeed } from '../../server/seed/demo-records.js';
import { demoDraftsSeed } from '../../server/seed/demo-drafts.js';
import { testAppCreate } from '../helpers/test-app.js';
import { axeSeriousFindings } from './axe-check.js';
import { browserLaunch, screenshot, serverStart, type RunningServer } from './harness.js';

const WAIT = { timeout: 15_000 };
const CLIENT = 'Marisol Venn';
const STYLE = 'Scoop tank';

describe('e-mailing a draft in chromium', () => {
  let server: RunningServer;
  let browser: Browser;
  let owner: { context: BrowserContext; page: Page };
  let draftId = 0;
  const shop = `prints.${randomUUID().slice(0, 8)}@copyshop.example`;

  async function signedIn(email: string, password: string): Promise<{ context: BrowserContext; page: Page }> {
    // axe-core is injected as a script, which the app's CSP forbids: these contexts bypass it.
    const context = await browser.newContext({ viewport: { width: 1440, height: 900 }, bypassCSP: true });
    const page = await context.newPage();
    await page.goto(`${server.url}/sign-in`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password', { exact: true }).fill(password);
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'), WAIT);
    return { context, page };
  }

  async function dialogOpen(page: Page) {
    await page.goto(`${server.url}/drafts/${draftId}`);
    await page.getByTestId('finished-bust').waitFor(WAIT);
    await page.getByRole('button', { name: 'E-mail…' }).click();
    const dialog = page.getByRole('dialog', { name: `E-mail ${CLIENT}, ${STYLE}` });
    await dialog.waitFor(WAIT);
    return dialog;
  }

  async function sendsCount(page: Page): Promise<number> {
    const body = await page.evaluate(async (id) => (await fetch(`/api/drafts/${id}/deliveries`, { headers: { Accept: 'application/json' } })).json(), draftId);
    return (body as DeliveriesResponse).deliveries.length;
  }

  beforeAll(async () => {
    const seedApp = testAppCreate();
    try {
      const { studioId } = await demoStudioSeed(seedApp.sequelize);
      await demoRecordsSeed(seedApp.sequelize, studioId);
      await demoDraftsSeed(studioId);
    } finally {
      await seedApp.close();
    }
    // Port 0: this server's own sink on a free port, never another run's.
    server = await serverStart({ SMTP_SINK_PORT: '0' });
    browser = await browserLaunch();
    owner = await signedIn(DEMO.owner.email, DEMO.owner.password);
    const list = await owner.page.evaluate(async () => (await fetch('/api/drafts?pageSize=100', { headers: { Accept: 'application/json' } })).json());
    const found = (list as { items: DraftSummaryDto[] }).items.find((d) => d.client.name === CLIENT && d.style.name === STYLE);
    if (!found) throw new Error(`the demo studio has no ${STYLE} draft for ${CLIENT}`);
    draftId = found.id;
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('e-mails the cutting ticket to a copy shop and lists it under Sent', async () => {
    const { page } = owner;
    // The test database keeps earlier runs' sends: count from here.
    const before = await sendsCount(page);
    const dialog = await dialogOpen(page);
    // The client is offered with their address; another address is typed.
    const clientEmail = DEMO_CLIENTS.find((c) => c.name === CLIENT)?.email ?? '';
    expect(clientEmail).not.toBe('');
    const toClient = dialog.getByRole('radio', { name: /^The client/ });
    expect(await toClient.isDisabled()).toBe(false);
    expect(await dialog.getByTestId('mail-recipient').innerText()).toContain(clientEmail);

    await dialog.getByRole('radio', { name: /^Cutting ticket/ }).check();
    // The ticket takes the print dialog's ticket papers: Letter and A4 only.
    const papers = await dialog.getByLabel('Paper').locator('option').evaluateAll((os) => os.map((o) => (o as HTMLOptionElement).value));
    expect(papers).toEqual(['letter', 'a4']);
    await dialog.getByLabel('Paper').selectOption('a4');
    await dialog.getByRole('radio', { name: /^Another address/ }).check();

    // A bad address is named beside its field, and nothing is sent.
    const address = dialog.getByLabel('E-mail address');
    await address.fill('the copy shop on Mill Lane');
    await dialog.getByRole('button', { name: 'Send', exact: true }).click();
    await dialog.getByText('To must be "client" or an e-mail address like shop@example.com').waitFor(WAIT);
    expect(await address.getAttribute('aria-invalid')).toBe('true');
    expect(await sendsCount(page)).toBe(before);

    await address.fill(shop);
    await dialog.getByLabel('Note').fill('Please keep it flat; I collect it on Friday.');
    await dialog.getByRole('button', { name: 'Send', exact: true }).click();
    await dialog.getByText(`Cutting ticket went to ${shop}.`).waitFor(WAIT);
    const row = dialog.getByTestId('draft-deliveries').getByRole('listitem').filter({ hasText: shop });
    await row.waitFor(WAIT);
    expect(await sendsCount(page)).toBe(before + 1);
    expect(await row.innerText()).toMatch(/Cutting ticket[\s\S]*Ada Quill[\s\S]*Sent/);
    await screenshot(page, 'draft-mail-dialog');
    await row.scrollIntoViewIfNeeded();
    await screenshot(page, 'draft-mail-sent-list');
    expect(await axeSeriousFindings(page)).toEqual([]);

    // Studio → Sent mail: the message, with the ticket as a PDF named without the client.
    await dialog.getByRole('link', { name: 'See it in Sent mail' }).click();
    await page.getByRole('heading', { name: 'Sent mail', level: 1 }).waitFor(WAIT);
    const subject = `${STYLE}, draft ${draftId}: cutting ticket`;
    const link = page.getByRole('row').filter({ hasText: shop }).getByRole('link', { name: subject });
    await link.waitFor(WAIT);
    await link.click();
    await page.getByRole('heading', { name: subject }).waitFor(WAIT);
    const attachment = page.getByRole('link', { name: /\.pdf$/ });
    await attachment.waitFor(WAIT);
    expect(await attachment.innerText()).toBe(`scoop-tank-draft-${draftId}-ticket-a4.pdf`);
    await page.getByText('application/pdf', { exact: false }).waitFor(WAIT);
    // The attachment is a PDF by its bytes (ISO 32000-1 §7.5.2: a file begins "%PDF-").
    const head = await page.evaluate(async (href) => {
      const bytes = new Uint8Array(await (await fetch(href)).arrayBuffer());
      return String.fromCharCode(...bytes.slice(0, 5));
    }, (await attachment.getAttribute('href')) ?? '');
    expect(head).toBe('%PDF-');
    expect(await page.getByTestId('mail-html').count()).toBe(1);
    await screenshot(page, 'draft-mail-sent-message');
  });

  it("lets a cutter send to an address but not to the client's, without the Sent list", async () => {
    const cutter = await signedIn(DEMO.cutter.email, DEMO.cutter.password);
    const dialog = await dialogOpen(cutter.page);
    const toClient = dialog.getByRole('radio', { name: /^The client/ });
    expect(await toClient.isDisabled()).toBe(true);
    await dialog.getByText("Only an owner can send to the client's own address.").waitFor(WAIT);
    expect(await dialog.getByRole('radio', { name: /^Another address/ }).isChecked()).toBe(true);
    expect(await dialog.getByTestId('draft-deliveries').count()).toBe(0);
    expect(await axeSeriousFindings(cutter.page)).toEqual([]);
    await screenshot(cutter.page, 'draft-mail-dialog-cutter');
    await cutter.context.close();
  });
});
