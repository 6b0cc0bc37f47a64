/**
 * Printing in chromium on the demo studio: the owner prints tiled A4 and Letter pages, a wide
 * sheet, a cutting ticket and an SVG from the workspace; the cutter prints from the work queue.
 * Every download is read back with pdf-lib (a general-purpose PDF library): its page count is
 * the one the dialog previewed, its page sizes those of the paper (ANSI Letter 612 × 792 pt,
 * ISO 216 A4 595.28 × 841.89 pt, a 36 in roll 2592 pt wide; 72 pt per inch, ISO 32000-1,
 * 8.3.2.3). Pages are rendered with poppler's pdftoppm for a person to look at.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { PDFDocument } from 'pdf-lib';
import type { Browser, BrowserContext, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { QueueItemDto } from '../../shared/schemas/draft-dto.js';
import { DEMO, demoStudioSeed } from '../../server/seed/demo-studio.js';
import { demoRecordsSeed } from '../../server/seed/demo-records.js';
import { demoDraftsSeed } from '../../server/seed/demo-drafts.js';
import { testAppCreate } from '../helpers/test-app.js';
import { axeSeriousFindings } from './axe-check.js';
import { ARTIFACTS, browserLaunch, screenshot, serverStart, type RunningServer } from './harness.js';

const WAIT = { timeout: 20_000 };
/** jsPDF writes sizes to 0.01 pt; a size read back is within half of that. */
const PT_WRITTEN = 0.005;
const PDF_DIR = path.join(ARTIFACTS, 'printing');

interface Downloaded {
  file: string;
  suggested: string;
  doc: PDFDocument;
}

/** The page count the dialog's preview announces: "10 pages: …" or "1 page". */
async function previewedPages(dialog: Locator): Promise<number> {
  const text = await dialog.getByTestId('print-summary').innerText();
  const sheet = /^1 sheet,/.test(text);
  const match = /^(\d+) pages?\b/.exec(text);
  if (!match && !sheet) throw new Error(`no page count in "${text}"`);
  return sheet ? 1 : Number(match![1]);
}

/** The orientation the preview announces for tiles: "10 pages, landscape: …". */
async function previewedOrientation(dialog: Locator): Promise<'portrait' | 'landscape'> {
  const text = await dialog.getByTestId('print-summary').innerText();
  const match = /^\d+ pages?, (portrait|landscape):/.exec(text);
  if (!match) throw new Error(`no orientation in "${text}"`);
  return match[1] as 'portrait' | 'landscape';
}

/** Every page `short` × `long` pt, turned for landscape. */
function expectPages(doc: PDFDocument, short: number, long: number, orientation: 'portrait' | 'landscape' = 'portrait'): void {
  const [width, height] = orientation === 'portrait' ? [short, long] : [long, short];
  for (const page of doc.getPages()) {
    const size = page.getSize();
    expect(Math.abs(size.width - width)).toBeLessThanOrEqual(PT_WRITTEN);
    expect(Math.abs(size.height - height)).toBeLessThanOrEqual(PT_WRITTEN);
  }
}

/** Renders one page at 50 dpi to a PNG beside the PDF and returns its path. */
function pageRender(pdf: string, page: number, name: string): string {
  const out = path.join(PDF_DIR, name);
  execFileSync('pdftoppm', ['-png', '-r', '50', '-f', String(page), '-l', String(page), '-singlefile', pdf, out]);
  return `${out}.png`;
}

describe('printing in chromium', () => {
  let server: RunningServer;
  let browser: Browser;
  let owner: { context: BrowserContext; page: Page };
  let queue: QueueItemDto[] = [];
  const requested: string[] = [];

  async function signedIn(email: string, password: string): Promise<{ context: BrowserContext; page: Page }> {
    // axe-core is injected as a script, which the app's CSP forbids: these contexts bypass it.
    const context = await browser.newContext({ viewport: { width: 1440, height: 960 }, bypassCSP: true, acceptDownloads: true });
    const page = await context.newPage();
    page.on('request', (r) => requested.push(r.url()));
    await page.goto(`${server.url}/sign-in`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password', { exact: true }).fill(password);
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'), WAIT);
    return { context, page };
  }

  /** Clicks "Download PDF" (or another button), saves the download and parses it. */
  async function download(page: Page, button: Locator, name: string): Promise<Downloaded> {
    const [event] = await Promise.all([page.waitForEvent('download', WAIT), button.click()]);
    const file = path.join(PDF_DIR, name);
    await event.saveAs(file);
    const bytes = readFileSync(file);
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    return { file, suggested: event.suggestedFilename(), doc: await PDFDocument.load(bytes, { updateMetadata: false }) };
  }

  function queueItem(client: string, style: string): QueueItemDto {
    const item = queue.find((q) => q.client.name === client && q.style.name === style);
    if (!item) throw new Error(`${client}, ${style} is not in the queue: run the demo seed`);
    return item;
  }

  beforeAll(async () => {
    mkdirSync(PDF_DIR, { recursive: true });
    const seedApp = testAppCreate();
    try {
      const { studioId } = await demoStudioSeed(seedApp.sequelize);
      await demoRecordsSeed(seedApp.sequelize, studioId);
      await demoDraftsSeed(studioId);
    } finally {
      await seedApp.close();
    }
    server = await serverStart();
    browser = await browserLaunch();
    owner = await signedIn(DEMO.owner.email, DEMO.owner.password);
    queue = (await owner.page.evaluate(async () => (await (await fetch('/api/queue?state=approved')).json()) as { items: QueueItemDto[] })).items;
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('opens the print dialog from the workspace without loading jsPDF until printing', async () => {
    const { page } = owner;
    const item = queueItem('Marisol Venn', 'Scoop tank');
    await page.goto(`${server.url}/drafts/${item.id}`);
    await page.getByTestId('finished-bust').waitFor(WAIT);
    expect(requested.filter((u) => /jspdf/i.test(u))).toEqual([]);
    await page.getByRole('toolbar', { name: 'Draft actions' }).getByRole('button', { name: 'Print…' }).click();
    const dialog = page.getByRole('dialog', { name: 'Print Marisol Venn, Scoop tank' });
    await dialog.waitFor(WAIT);
    await dialog.getByTestId('print-preview').waitFor(WAIT);
    expect(await dialog.getByRole('radio', { name: /Tiled pages/ }).isChecked()).toBe(true);
    // The studio's paper (Letter in the demo) comes first.
    expect(await dialog.getByLabel('Paper').inputValue()).toBe('letter');
    expect(await dialog.getByLabel('Overlap').inputValue()).toBe('1/2 in');
    expect(requested.filter((u) => /jspdf/i.test(u))).toEqual([]);
    expect(await axeSeriousFindings(page)).toEqual([]);
    await screenshot(page, 'printing-dialog-tiles-letter');
  });

  it('prints tiled A4 pages, as many as the preview says, each 595.28 × 841.89 pt', async () => {
    const { page } = owner;
    const dialog = page.getByRole('dialog', { name: /^Print / });
    await dialog.getByLabel('Paper').selectOption('a4');
    await expect.poll(() => dialog.getByTestId('print-summary').innerText(), WAIT).toMatch(/^\d+ pages?, (portrait|landscape): /);
    const pages = await previewedPages(dialog);
    const orientation = await previewedOrientation(dialog);
    // Watch for the progress indicator while the PDF is made.
    await page.evaluate(() => {
      const w = window as unknown as { sawProgress: boolean };
      w.sawProgress = false;
      new MutationObserver(() => {
        if (document.querySelector('[data-testid="print-progress"]')) w.sawProgress = true;
      }).observe(document.body, { childList: true, subtree: true });
    });
    const got = await download(page, dialog.getByTestId('print-download'), 'tiles-a4.pdf');
    expect(got.suggested).toBe('scoop-tank-marisol-venn-tiles-a4.pdf');
    expect(got.doc.getPageCount()).toBe(pages);
    expectPages(got.doc, 595.28, 841.89, orientation);
    expect(await page.evaluate(() => (window as unknown as { sawProgress: boolean }).sawProgress)).toBe(true);
    await expect.poll(() => dialog.getByRole('status').filter({ hasText: 'Saved scoop-tank' }).innerText(), WAIT).toContain(`${pages} pages`);
    // jsPDF came only now, by the dynamic import.
    expect(requested.some((u) => /jspdf/i.test(u))).toBe(true);
    pageRender(got.file, 1, 'tiles-a4-page-1');
    pageRender(got.file, Math.min(pages, 3), 'tiles-a4-inner');
  });

  it('prints tiled Letter pages in portrait, 612 × 792 pt, and fewer for one piece', async () => {
    const { page } = owner;
    const dialog = page.getByRole('dialog', { name: /^Print / });
    await dialog.getByLabel('Paper').selectOption('letter');
    await dialog.getByRole('radio', { name: 'Portrait' }).check();
    await dialog.getByLabel('Overlap').fill('3/4');
    await expect.poll(() => dialog.getByTestId('print-summary').innerText(), WAIT).toMatch(/^\d+ pages?, (portrait|landscape): /);
    const pages = await previewedPages(dialog);
    await screenshot(page, 'printing-dialog-tiles-letter-portrait');
    const got = await download(page, dialog.getByTestId('print-download'), 'tiles-letter.pdf');
    expect(got.doc.getPageCount()).toBe(pages);
    expectPages(got.doc, 612, 792);
    pageRender(got.file, 1, 'tiles-letter-page-1');
    pageRender(got.file, Math.ceil(pages / 2), 'tiles-letter-inner');

    await dialog.getByTestId('print-piece-front').uncheck();
    await expect.poll(() => previewedPages(dialog), WAIT).toBeLessThan(pages);
    const back = await previewedPages(dialog);
    const only = await download(page, dialog.getByTestId('print-download'), 'tiles-letter-back.pdf');
    expect(only.doc.getPageCount()).toBe(back);

    // No piece at all: the field says so and nothing can be printed.
    await dialog.getByTestId('print-piece-back').uncheck();
    await dialog.getByText('Choose at least one piece to print').waitFor(WAIT);
    expect(await dialog.getByTestId('print-download').isDisabled()).toBe(true);
    await dialog.getByTestId('print-piece-front').check();
    await dialog.getByTestId('print-piece-back').check();

    // An overlap under 1/4 in is refused, naming the overlap.
    await dialog.getByLabel('Overlap').fill('1/8');
    await dialog.getByText(/Overlap must be at least 1\/4 in/).waitFor(WAIT);
    expect(await dialog.getByTestId('print-download').isDisabled()).toBe(true);
    await dialog.getByLabel('Overlap').fill('1/2');
  });

  it('prints the wide sheet on the 36 in roll: one page 2592 pt wide', async () => {
    const { page } = owner;
    const dialog = page.getByRole('dialog', { name: /^Print / });
    await dialog.getByRole('radio', { name: /Wide sheet/ }).check();
    expect(await dialog.getByLabel('Paper').inputValue()).toBe('roll36');
    await expect.poll(() => dialog.getByTestId('print-summary').innerText(), WAIT).toMatch(/^1 sheet, 914 × \d+ mm/);
    await screenshot(page, 'printing-dialog-sheet');
    const got = await download(page, dialog.getByTestId('print-download'), 'sheet-roll36.pdf');
    expect(got.doc.getPageCount()).toBe(1);
    // 36 in × 72 pt/in = 2592 pt (ISO 32000-1, 8.3.2.3)
    expect(Math.abs(got.doc.getPage(0).getSize().width - 2592)).toBeLessThanOrEqual(PT_WRITTEN);
    pageRender(got.file, 1, 'sheet-roll36');
  });

  it('prints the cutting ticket on one Letter page and the pieces as SVG', async () => {
    const { page } = owner;
    const dialog = page.getByRole('dialog', { name: /^Print / });
    await dialog.getByRole('radio', { name: /Cutting ticket/ }).check();
    expect(await dialog.getByLabel('Paper').inputValue()).toBe('letter');
    await dialog.getByTestId('print-advice').getByText(/rotary cutters, overlocker blades/).waitFor(WAIT);
    await screenshot(page, 'printing-dialog-ticket');
    const got = await download(page, dialog.getByTestId('print-download'), 'ticket-letter.pdf');
    expect(got.doc.getPageCount()).toBe(1);
    expectPages(got.doc, 612, 792);
    pageRender(got.file, 1, 'ticket-letter');

    const [svgEvent] = await Promise.all([page.waitForEvent('download', WAIT), dialog.getByRole('button', { name: 'Download SVG' }).click()]);
    const svgFile = path.join(PDF_DIR, 'pieces.svg');
    await svgEvent.saveAs(svgFile);
    const svg = readFileSync(svgFile, 'utf8');
    expect(svg).toMatch(/^(<\?xml[^>]*>\s*)?<svg/);
    // True size: the width is given in mm and the view box counts 1 unit per mm.
    expect(svg).toMatch(/width="[\d.]+mm"/);
    await dialog.getByRole('button', { name: 'Close' }).click();
    await dialog.waitFor({ state: 'hidden', ...WAIT });
  });

  it('lets the cutter print the ticket and tiled pages from the work queue', async () => {
    const cutter = await signedIn(DEMO.cutter.email, DEMO.cutter.password);
    const { page } = cutter;
    const item = queueItem('Hattie Oyelaran', 'High-neck tank');
    await page.goto(`${server.url}/queue`);
    const row = page.getByTestId(`queue-row-${item.id}`);
    await row.waitFor(WAIT);
    await screenshot(page, 'printing-queue');
    await row.getByRole('button', { name: 'Print Hattie Oyelaran, High-neck tank' }).click();
    const dialog = page.getByRole('dialog', { name: 'Print Hattie Oyelaran, High-neck tank' });
    await dialog.getByTestId('print-preview').waitFor(WAIT);
    await dialog.getByRole('radio', { name: /Cutting ticket/ }).check();
    await dialog.getByLabel('Paper').selectOption('a4');
    expect(await axeSeriousFindings(page)).toEqual([]);
    await screenshot(page, 'printing-queue-dialog-ticket');
    const ticket = await download(page, dialog.getByTestId('print-download'), 'queue-ticket-a4.pdf');
    expect(ticket.suggested).toBe('high-neck-tank-hattie-oyelaran-ticket-a4.pdf');
    expect(ticket.doc.getPageCount()).toBe(1);
    expectPages(ticket.doc, 595.28, 841.89);
    pageRender(ticket.file, 1, 'queue-ticket-a4');

    await dialog.getByRole('radio', { name: /Tiled pages/ }).check();
    await dialog.getByLabel('Paper').selectOption('letter');
    await dialog.getByRole('radio', { name: 'Landscape' }).check();
    await expect.poll(() => dialog.getByTestId('print-summary').innerText(), WAIT).toMatch(/^\d+ pages?, (portrait|landscape): /);
    const pages = await previewedPages(dialog);
    const tiles = await download(page, dialog.getByTestId('print-download'), 'queue-tiles-letter.pdf');
    expect(tiles.doc.getPageCount()).toBe(pages);
    expect(await previewedOrientation(dialog)).toBe('landscape');
    expectPages(tiles.doc, 612, 792, 'landscape');
    await cutter.context.close();
  });
});
