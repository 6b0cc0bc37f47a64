/**
 * The workspace's speed in chromium (run by `npm run bench` after the client is built):
 *  - a slider drag: the bust-ease slider on the demo draft is dragged with the mouse through 100
 *    values; the app marks each input event and measures to the moment the redrawn pieces are in
 *    the DOM (performance marks `kw:param-input` → measure `kw:redraw`); the bench also measures
 *    from the input event to the next animation frame. Target: p95 under one frame (16 ms).
 *  - the initial JavaScript: the entry script and every module it imports statically, gzipped as
 *    a server would send them. Target: under 170 KB; the workspace must not be in it.
 * Figures are printed, never asserted: speed targets are for people to read.
 */
import { readFileSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import type { Page } from 'playwright-core';
import { browserLaunch, serverStart } from '../tests/e2e/harness.js';

const OWNER = { email: 'ada@loopandlark.example', password: 'knit-demo-owner' };
const VALUES = 100;
const INITIAL_JS_TARGET_KB = 170;
const FRAME_MS = 16;
const WARM_UP_MOVES = 10;

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return NaN;
  const index = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[index]!;
}

function ms(value: number): string {
  return `${value.toFixed(2)} ms`;
}

/** The entry script and the closure of its static imports, from the built index.html. */
function initialScripts(dist: string): string[] {
  const html = readFileSync(path.join(dist, 'index.html'), 'utf8');
  const queue = [...html.matchAll(/<script[^>]+type="module"[^>]+src="([^"]+)"/g), ...html.matchAll(/<link[^>]+rel="modulepreload"[^>]+href="([^"]+)"/g)].map(
    (m) => m[1]!,
  );
  const seen = new Set<string>();
  while (queue.length > 0) {
    const url = queue.shift()!;
    if (seen.has(url)) continue;
    seen.add(url);
    const code = readFileSync(path.join(dist, url), 'utf8');
    // Static imports only ("import{a}from"./x.js"", "import"./x.js""); import("...") loads later.
    for (const m of code.matchAll(/(?:^|[;\s}])import\s*(?:[\w*{}\s,$]+?\s*from\s*)?["'](\.\.?\/[^"']+)["']/g)) {
      queue.push(path.posix.join(path.posix.dirname(url), m[1]!));
    }
    for (const m of code.matchAll(/(?:^|[;\s}])export\s*[\w*{}\s,$]*?\s*from\s*["'](\.\.?\/[^"']+)["']/g)) {
      queue.push(path.posix.join(path.posix.dirname(url), m[1]!));
    }
  }
  return [...seen];
}

function initialJsReport(): void {
  const dist = path.resolve('dist');
  const files = initialScripts(dist);
  let raw = 0;
  let gz = 0;
  let workspaceInside = false;
  for (const file of files) {
    const bytes = readFileSync(path.join(dist, file));
    raw += bytes.length;
    gz += gzipSync(bytes).length;
    // The workspace's canvas draws this; finding it in the first load would mean it is not lazy.
    if (bytes.includes('PLACE ON FOLD')) workspaceInside = true;
  }
  console.log(`initial JS: ${files.length} files, ${(raw / 1024).toFixed(1)} KB raw, ${(gz / 1024).toFixed(1)} KB gzipped (target under ${INITIAL_JS_TARGET_KB} KB)`);
  console.log(`  workspace in the initial bundle: ${workspaceInside ? 'YES (should be lazy)' : 'no (lazy-loaded)'}`);
}

async function signIn(page: Page, base: string): Promise<void> {
  await page.goto(`${base}/sign-in`);
  await page.getByLabel('E-mail').fill(OWNER.email);
  await page.getByLabel('Password', { exact: true }).fill(OWNER.password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'), { timeout: 20_000 });
}

/** The demo draft to drag on: a draft the owner can still change. */
async function demoDraftId(page: Page): Promise<number> {
  const list = (await page.evaluate(async () => (await fetch('/api/drafts?state=drafting&sort=created')).json())) as { items?: { id: number }[] };
  const id = list.items?.[0]?.id;
  if (!id) throw new Error('No draft in the drafting state: run `npm run seed` to add the demo drafts.');
  return id;
}

async function dragReport(page: Page, base: string): Promise<void> {
  const id = await demoDraftId(page);
  await page.goto(`${base}/drafts/${id}`);
  const slider = page.getByRole('slider', { name: 'Bust ease' });
  await slider.waitFor({ timeout: 20_000 });
  const box = await slider.boundingBox();
  if (!box) throw new Error('The bust-ease slider is not visible.');
  await page.evaluate(() => {
    performance.clearMeasures('kw:redraw');
    const w = window as unknown as { __frames: number[] };
    w.__frames = [];
    // Input event → the next animation frame, for every input on a range.
    document.addEventListener(
      'input',
      (e) => {
        if ((e.target as HTMLInputElement).type !== 'range') return;
        const start = e.timeStamp;
        requestAnimationFrame(() => w.__frames.push(performance.now() - start));
      },
      true,
    );
  });
  const y = box.y + box.height / 2;
  const left = box.x + 8;
  const right = box.x + box.width - 8;
  const step = (right - left) / 60;
  await page.mouse.move(left, y);
  await page.mouse.down();
  let x = left;
  let direction = 1;
  // A short warm-up drag first (the browser compiles the drafting code on first use), then the 100.
  for (let moves = 0; moves < WARM_UP_MOVES; moves++) {
    x += step;
    await page.mouse.move(x, y);
    await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
  }
  await page.evaluate(() => {
    performance.clearMeasures('kw:redraw');
    (window as unknown as { __frames: number[] }).__frames = [];
  });
  for (let moves = 0; moves < 1000; moves++) {
    const count = await page.evaluate(() => performance.getEntriesByName('kw:redraw', 'measure').length);
    if (count >= VALUES) break;
    x += direction * step;
    if (x >= right || x <= left) direction = -direction;
    await page.mouse.move(x, y);
    // One move per frame, as a hand on a tablet gives them.
    await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
  }
  await page.mouse.up();
  const { redraw, frames } = await page.evaluate(() => ({
    redraw: performance.getEntriesByName('kw:redraw', 'measure').map((e) => e.duration),
    frames: (window as unknown as { __frames: number[] }).__frames,
  }));
  if (process.env.BENCH_VERBOSE) console.log(redraw.map((v) => v.toFixed(1)).join(" "));
  const r = redraw.slice(0, VALUES).sort((a, b) => a - b);
  const f = frames.slice(0, VALUES).sort((a, b) => a - b);
  console.log(`slider drag on draft ${id}: ${r.length} values after a ${WARM_UP_MOVES}-move warm-up; load average ${loadavg().map((l) => l.toFixed(1)).join(' ')} on ${cpus().length} cores`);
  console.log(`  input event → SVG updated: p50 ${ms(percentile(r, 50))}, p95 ${ms(percentile(r, 95))}, max ${ms(r[r.length - 1] ?? NaN)} (target p95 under ${FRAME_MS} ms)`);
  console.log(`  input event → next frame:  p50 ${ms(percentile(f, 50))}, p95 ${ms(percentile(f, 95))}`);
}

initialJsReport();
const server = await serverStart();
const browser = await browserLaunch();
try {
  const page = await (await browser.newContext({ viewport: { width: 1440, height: 900 } })).newPage();
  await signIn(page, server.url);
  await dragReport(page, server.url);
} finally {
  await browser.close();
  await server.stop();
}
