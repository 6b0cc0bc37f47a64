/**
 * The drafting workspace and the work queue in chromium, on the demo studio: the owner starts a
 * draft from a demo client's block, drags the bust ease and the front neckline and sees the
 * figures and the drawing follow, saves and approves; the cutter finds it in the queue and
 * marks it cut; a new style for the same client starts from the same block with its
 * corrections; two saves that cross end in a choice, with nothing lost.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Locator, Page } from 'playwright-core';
import type { DraftDto } from '../../shared/schemas/draft-dto.js';
import { lengthFormat, lengthToMm } from '../../shared/units/index.js';
import { DEMO, demoStudioSeed } from '../../server/seed/demo-studio.js';
import { demoRecordsSeed } from '../../server/seed/demo-records.js';
import { demoDraftsSeed } from '../../server/seed/demo-drafts.js';
import { testAppCreate } from '../helpers/test-app.js';
import { axeSeriousFindings } from './axe-check.js';
import { browserLaunch, screenshot, serverStart, type RunningServer } from './harness.js';

const WAIT = { timeout: 15_000 };
const CLIENT = 'Marisol Venn';
const FABRIC = 'Heather grey cotton-spandex jersey';

/** Reads "32 5/8 in" or "82.8 cm" back to mm. */
function mmOf(text: string): number {
  const match = /^(-|−)?(\d+)(?: (\d+)\/(\d+))?(?:\.(\d+))? (in|cm)$/.exec(text.trim());
  if (!match) throw new Error(`not a length: "${text}"`);
  const whole = Number(match[2]) + (match[3] ? Number(match[3]) / Number(match[4]) : 0) + (match[5] ? Number(`0.${match[5]}`) : 0);
  return lengthToMm(match[1] ? -whole : whole, match[6] as 'in' | 'cm');
}

/** Presses the slider's thumb and drags it sideways by `dx` px, through many values. */
async function sliderDrag(page: Page, slider: Locator, dx: number): Promise<void> {
  await slider.scrollIntoViewIfNeeded();
  const box = await slider.boundingBox();
  if (!box) throw new Error('slider not visible');
  const [value, min, max] = await slider.evaluate((el: HTMLInputElement) => [Number(el.value), Number(el.min), Number(el.max)]);
  const x = box.x + 8 + ((value - min) / (max - min)) * (box.width - 16);
  const y = box.y + box.height / 2;
  await page.mouse.move(x, y);
  await page.mouse.down();
  await page.mouse.move(x + dx, y, { steps: 12 });
  await page.mouse.up();
}

describe('drafting workspace and work queue in chromium', () => {
  let server: RunningServer;
  let browser: Browser;
  let owner: BrowserContext;
  let page: Page;
  let draftId = 0;
  let blockId = 0;

  async function signedIn(
    email: string,
    password: string,
    viewport = { width: 1440, height: 900 },
  ): Promise<{ context: BrowserContext; page: Page }> {
    // axe-core is injected as a script, which the app's CSP forbids: these contexts bypass it.
    const context = await browser.newContext({ viewport, bypassCSP: true });
    const p = await context.newPage();
    await p.goto(`${server.url}/sign-in`);
    await p.getByLabel('E-mail').fill(email);
    await p.getByLabel('Password', { exact: true }).fill(password);
    await p.getByRole('button', { name: 'Sign in', exact: true }).click();
    await p.waitForURL((u) => !u.pathname.startsWith('/sign-in'), WAIT);
    return { context, page: p };
  }

  async function draftRead(p: Page, id: number): Promise<DraftDto> {
    return p.evaluate(
      async (draft) =>
        (
          await fetch(`/api/drafts/${draft}`, {
            headers: { Accept: 'application/json' },
          })
        ).json(),
      id,
    );
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
    server = await serverStart();
    browser = await browserLaunch();
    ({ context: owner, page } = await signedIn(DEMO.owner.email, DEMO.owner.password));
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop();
  });

  it('starts a draft from the demo client’s block with a fabric, from the client’s page', async () => {
    await page.goto(`${server.url}/clients`);
    await page.getByRole('link', { name: CLIENT }).first().click();
    await page.getByRole('heading', { name: CLIENT, level: 1 }).waitFor(WAIT);
    await page.getByTestId('client-new-draft').click();
    await page.getByRole('heading', { name: 'New draft' }).waitFor(WAIT);
    const block = page.getByLabel('Block', { exact: true });
    await block.waitFor(WAIT);
    // The block used last is chosen, its fit corrections listed (hip +1 cm in the demo block).
    blockId = Number(await block.inputValue());
    expect(blockId).toBeGreaterThan(0);
    await expect.poll(() => page.getByTestId('block-corrections').innerText(), WAIT).toMatch(/Hip girth \+/);
    await page.getByLabel('Style').selectOption({ label: 'Scoop tank' });
    await page.getByLabel('Fabric').selectOption({ label: `${FABRIC} — 60 % stretch` });
    expect(await axeSeriousFindings(page)).toEqual([]);
    await page.getByRole('button', { name: 'Start drafting' }).click();
    await page.waitForURL(/\/drafts\/\d+$/, WAIT);
    draftId = Number(new URL(page.url()).pathname.split('/').pop());
    await page.getByTestId('finished-bust').waitFor(WAIT);
    const draft = await draftRead(page, draftId);
    expect(draft.blockId).toBe(blockId);
    expect(draft.state).toBe('drafting');
  });

  it('redraws the figures and the pieces while the bust ease and front neckline are dragged', async () => {
    const bust = page.getByTestId('finished-bust');
    const frontCut = page.locator('[data-piece="front"] > path').first();
    const backCut = page.locator('[data-piece="back"] > path').first();
    const bustBefore = await bust.innerText();
    const frontBefore = await frontCut.getAttribute('d');
    const backBefore = await backCut.getAttribute('d');

    await sliderDrag(page, page.getByRole('slider', { name: 'Bust ease' }), -60);
    await expect.poll(() => bust.innerText(), WAIT).not.toBe(bustBefore);
    expect(mmOf(await bust.innerText())).toBeLessThan(mmOf(bustBefore));
    expect(await frontCut.getAttribute('d')).not.toBe(frontBefore);
    expect(await page.getByTestId('save-status').innerText()).toBe('Unsaved changes');

    // Ease is finished girth minus body girth (product vocabulary): a typed −10 % gives
    // (1 − 0.10) × body, with any bust-ease correction of the block added to the −10.
    const ease = page.getByRole('textbox', { name: 'Bust ease' });
    await ease.fill('-10');
    await ease.press('Enter');
    const draft = await draftRead(page, draftId);
    const body = lengthToMm(draft.current.input.measurements.bust, draft.current.input.unit);
    const correction = draft.inputParts.corrections.filter((c) => c.target === 'bustEase').reduce((sum, c) => sum + c.amount, 0);
    await expect.poll(() => bust.innerText(), WAIT).toBe(lengthFormat((1 + (-10 + correction) / 100) * body, 'in'));

    const neckOpening = page.getByTestId('bindings').locator('li').first();
    const neckBefore = await neckOpening.innerText();
    const backAfterEase = await backCut.getAttribute('d');
    // A short drag: a few centimetres deeper stays within what the demo body's armhole allows.
    await sliderDrag(page, page.getByRole('slider', { name: 'Front neck depth' }), 15);
    await expect.poll(() => neckOpening.innerText(), WAIT).not.toBe(neckBefore);
    // Front and back are cut together; only the front is cut down to its own neckline.
    expect(await backCut.getAttribute('d')).toBe(backAfterEase);
    expect(backAfterEase).not.toBe(backBefore);

    // A typed value outside the range is shown beside the field and not used.
    const neck = page.getByRole('textbox', { name: 'Front neck depth' });
    const drawn = await frontCut.getAttribute('d');
    await neck.fill('30');
    await neck.press('Enter');
    await page.getByText(/Front neck depth must be between/).waitFor(WAIT);
    expect(await frontCut.getAttribute('d')).toBe(drawn);
    await neck.press('Escape');

    // Undo takes the whole neckline drag back in one step; redo brings it again.
    const neckValue = await page.getByRole('slider', { name: 'Front neck depth' }).inputValue();
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => page.getByRole('slider', { name: 'Front neck depth' }).inputValue(), WAIT).not.toBe(neckValue);
    await page.keyboard.press('Control+Shift+Z');
    await expect.poll(() => page.getByRole('slider', { name: 'Front neck depth' }).inputValue(), WAIT).toBe(neckValue);
  });

  it('shows an edge’s length on hover, and the workspace at 1440×900 and 1024×768 passes axe', { timeout: 180_000 }, async () => {
    // The middle of the front armhole on screen, from the path itself (the edge is a curve).
    const mid = await page.locator('[data-piece-id="front"][data-edge="armhole"]').evaluate((el: SVGPathElement) => {
      const p = el.getPointAtLength(el.getTotalLength() / 2);
      const m = el.getScreenCTM()!;
      return { x: p.x * m.a + p.y * m.c + m.e, y: p.x * m.b + p.y * m.d + m.f };
    });
    await page.mouse.move(mid.x, mid.y);
    await expect.poll(() => page.getByTestId('edge-tip').innerText(), WAIT).toMatch(/^Front · armhole \d+( \d\/\d)? in$/);
    await page.mouse.move(5, 5);
    await screenshot(page, 'workspace-1440');
    expect(await axeSeriousFindings(page)).toEqual([]);
    await page.setViewportSize({ width: 1024, height: 768 });
    await page.getByRole('button', { name: 'Fit' }).click();
    await screenshot(page, 'workspace-1024');
    expect(await axeSeriousFindings(page)).toEqual([]);
    await page.setViewportSize({ width: 1440, height: 900 });
  });

  it('saves with Ctrl+S and approves, after which the workspace is read-only', async () => {
    await page.keyboard.press('Control+s');
    await expect.poll(() => page.getByTestId('save-status').innerText(), WAIT).toBe('Saved · revision 2');
    const saved = await draftRead(page, draftId);
    expect(saved.params.bustEase).toBe(-10);
    expect(saved.current.changes.map((c) => c.field)).toEqual(expect.arrayContaining(['params.bustEase', 'params.frontNeckDepth']));

    await page.getByRole('button', { name: 'Approve for cutting…' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Note').fill('Grey first, as agreed at the fitting.');
    await dialog.getByRole('button', { name: 'Approve for cutting' }).click();
    await page.getByText(/^Approved .*Read-only: reopen it to make changes\./).waitFor(WAIT);
    expect(await page.getByRole('slider', { name: 'Bust ease' }).isDisabled()).toBe(true);
    expect((await draftRead(page, draftId)).state).toBe('approved');
  });

  it('lets the cutter find it in the queue, open it read-only and mark it cut with the fabric used', async () => {
    const cutter = await signedIn(DEMO.cutter.email, DEMO.cutter.password);
    const p = cutter.page;
    await p.goto(`${server.url}/queue`);
    const row = p.getByTestId(`queue-row-${draftId}`);
    await row.waitFor(WAIT);
    expect(await row.innerText()).toContain(CLIENT);
    await screenshot(p, 'queue-1440');
    expect(await axeSeriousFindings(p)).toEqual([]);

    await row.getByRole('link', { name: /^Open/ }).click();
    await p.getByTestId('finished-bust').waitFor(WAIT);
    expect(await p.getByRole('slider', { name: 'Bust ease' }).isDisabled()).toBe(true);
    expect(await p.getByRole('button', { name: 'Save' }).count()).toBe(0);
    expect(await p.getByRole('button', { name: /Approve/ }).count()).toBe(0);
    await p.goBack();

    await p
      .getByTestId(`queue-row-${draftId}`)
      .getByRole('button', { name: /^Mark cut/ })
      .click();
    const dialog = p.getByRole('dialog');
    expect(await dialog.getByLabel('Fabric used').locator('option:checked').innerText()).toBe(FABRIC);
    await dialog.getByLabel('Note').fill('Cut from the second roll; 70 cm used.');
    await dialog.getByRole('button', { name: 'Mark cut' }).click();
    await p.getByText(/marked cut/).waitFor(WAIT);
    expect(await p.getByTestId(`queue-row-${draftId}`).count()).toBe(0);
    const cut = await draftRead(p, draftId);
    expect(cut.state).toBe('cut');
    expect(cut.cut?.note).toBe('Cut from the second roll; 70 cm used.');
    await p.getByRole('tab', { name: 'To sew' }).click();
    await p.getByTestId(`queue-row-${draftId}`).waitFor(WAIT);
    await cutter.context.close();
  });

  it('starts a new style for the same client from the same block, corrections included', async () => {
    const first = await draftRead(page, draftId);
    await page.goto(`${server.url}/drafts`);
    await page.getByRole('heading', { name: 'Drafts', level: 1 }).waitFor(WAIT);
    await page.getByRole('link', { name: CLIENT }).first().waitFor(WAIT);
    expect(await axeSeriousFindings(page)).toEqual([]);
    await page.goto(`${server.url}/clients`);
    await page.getByRole('link', { name: CLIENT }).first().click();
    await page.getByTestId('client-new-draft').click();
    const block = page.getByLabel('Block', { exact: true });
    await block.waitFor(WAIT);
    expect(Number(await block.inputValue())).toBe(blockId);
    await page.getByLabel('Style').selectOption({ label: 'Racer tank (racer back)' });
    await page.getByLabel('Fabric').selectOption({ label: 'Ink bamboo jersey — 50 % stretch' });
    await page.getByRole('button', { name: 'Start drafting' }).click();
    await page.waitForURL(/\/drafts\/\d+$/, WAIT);
    const id = Number(new URL(page.url()).pathname.split('/').pop());
    expect(id).not.toBe(draftId);
    await page.getByRole('slider', { name: 'Racer back inset' }).waitFor(WAIT);
    const second = await draftRead(page, id);
    expect(second.blockId).toBe(blockId);
    // The same corrected body: hip and armhole depth with the block's corrections, as drafted before.
    expect(second.current.input.measurements).toEqual(first.current.input.measurements);
    expect(second.inputParts.corrections.length).toBeGreaterThan(0);
  });

  it('offers to reload or keep mine when a save meets a newer save, and keeps both in the history', async () => {
    const other = await owner.newPage();
    await other.goto(page.url());
    await other.getByTestId('finished-bust').waitFor(WAIT);
    const id = Number(new URL(page.url()).pathname.split('/').pop());
    const before = await draftRead(page, id);

    const theirs = other.getByRole('textbox', { name: 'Strap width' });
    await theirs.fill('1 1/4');
    await theirs.press('Enter');
    await other.keyboard.press('Control+s');
    await expect.poll(() => other.getByTestId('save-status').innerText(), WAIT).toBe(`Saved · revision ${before.revision + 1}`);

    const mine = page.getByRole('textbox', { name: 'Bust ease' });
    await mine.fill('-12');
    await mine.press('Enter');
    await page.keyboard.press('Control+s');
    const dialog = page.getByRole('dialog', {
      name: 'This draft changed while you were working',
    });
    await dialog.waitFor(WAIT);
    await dialog.getByRole('button', { name: 'Keep mine as a new revision' }).click();
    await expect.poll(() => page.getByTestId('save-status').innerText(), WAIT).toBe(`Saved · revision ${before.revision + 2}`);
    const after = await draftRead(page, id);
    expect(after.params.bustEase).toBe(-12);
    await page.getByRole('tab', { name: 'Revisions' }).click();
    await page
      .getByRole('tabpanel')
      .getByText(`Revision ${before.revision + 1}`, { exact: true })
      .waitFor(WAIT);
    expect(await page.getByText(/Strap width .* → 1 1\/4 in/).count()).toBe(1);
    await other.close();

    // Theirs is one restore away: it comes back as a new revision.
    const theirsRow = page.getByRole('listitem').filter({ has: page.getByText(`Revision ${before.revision + 1}`, { exact: true }) });
    await theirsRow.getByRole('button', { name: 'Restore' }).click();
    await expect.poll(() => page.getByTestId('save-status').innerText(), WAIT).toBe(`Saved · revision ${before.revision + 3}`);
    await expect.poll(() => page.getByRole('textbox', { name: 'Strap width' }).inputValue(), WAIT).toBe('1 1/4');
    const restored = await draftRead(page, id);
    expect(restored.current.kind).toBe('restored');
    expect(restored.current.restoredFrom).toBe(before.revision + 1);
  });
  it('works by touch at tablet size: a tap reads an edge, two fingers zoom', async () => {
    const context = await browser.newContext({ viewport: { width: 1024, height: 768 }, hasTouch: true, isMobile: false });
    const p = await context.newPage();
    await p.goto(`${server.url}/sign-in`);
    await p.getByLabel('E-mail').fill(DEMO.owner.email);
    await p.getByLabel('Password', { exact: true }).fill(DEMO.owner.password);
    await p.getByRole('button', { name: 'Sign in', exact: true }).click();
    await p.waitForURL((u) => !u.pathname.startsWith('/sign-in'), WAIT);
    await p.goto(`${server.url}/drafts/${draftId}`);
    await p.getByTestId('finished-bust').waitFor(WAIT);
    const neck = await p.locator('[data-piece-id="back"][data-edge="neck"]').evaluate((el: SVGPathElement) => {
      const q = el.getPointAtLength(el.getTotalLength() / 2);
      const m = el.getScreenCTM()!;
      return { x: q.x * m.a + q.y * m.c + m.e, y: q.x * m.b + q.y * m.d + m.f };
    });
    await p.touchscreen.tap(neck.x, neck.y);
    await expect.poll(() => p.getByTestId('edge-tip').innerText(), WAIT).toMatch(/^Back · neckline \d/);

    const pieces = p.getByTestId('pattern-pieces');
    const scaleOf = async () => Number(/matrix\(([\d.]+)/.exec((await pieces.getAttribute('transform')) ?? '')?.[1]);
    const before = await scaleOf();
    const box = (await p.locator('svg[role="img"]').first().boundingBox())!;
    const cx = box.x + box.width / 2;
    const cy = box.y + box.height / 2;
    const cdp = await context.newCDPSession(p);
    const fingers = (spread: number) => [
      { x: cx - spread, y: cy, id: 1 },
      { x: cx + spread, y: cy, id: 2 },
    ];
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: fingers(30) });
    for (let spread = 40; spread <= 120; spread += 10) await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: fingers(spread) });
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] });
    // Fingers spread from 60 px to 240 px apart: about four times closer.
    await expect.poll(scaleOf, WAIT).toBeGreaterThan(before * 2);
    await context.close();
  });
});
