import path from 'node:path';
import type { Page } from 'playwright-core';

/** One finding of axe-core, reduced to what a failing test should print. */
export interface AxeFinding {
  id: string;
  impact: string | null;
  help: string;
  targets: string[];
}

interface AxeResult {
  violations: { id: string; impact: string | null; help: string; nodes: { target: unknown[] }[] }[];
}

/**
 * Runs axe-core (installed from npm, injected from node_modules) on the page as it is now and
 * returns the findings of impact "serious" or "critical" (WCAG 2.x A and AA rules).
 */
export async function axeSeriousFindings(page: Page): Promise<AxeFinding[]> {
  // The app's Content-Security-Policy forbids injected scripts: open the page in a context with
  // `bypassCSP: true` to check it.
  const already = await page.evaluate(() => 'axe' in window);
  if (!already) await page.addScriptTag({ path: path.resolve('node_modules/axe-core/axe.min.js') });
  const result = (await page.evaluate(() =>
    (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<unknown> } }).axe.run(document, {
      runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa', 'best-practice'] },
    }),
  )) as AxeResult;
  return result.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => ({ id: v.id, impact: v.impact, help: v.help, targets: v.nodes.map((n) => String(n.target.join(' '))) }));
}
