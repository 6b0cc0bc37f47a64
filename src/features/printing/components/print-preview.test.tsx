import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { printArrange } from '@shared/engine/layout/tiling-arrange';
import { tilesPlan } from '@shared/engine/layout/tiling';
import { lShapeItem, rectangleItem } from '@shared/engine/layout/tiling-test-shapes';
import { planSummary, type PrintPlan } from '../lib/print-plan';
import { PrintPreview } from './print-preview';

// An L-shaped piece and a small strip far from it: the tiling leaves out the pages between them.
const canvas = printArrange([lShapeItem('body', 600, 800, 420, 560), rectangleItem('strip', 60, 60)], { gapMm: 400 });
const tiles = tilesPlan(canvas, { paper: 'letter', orientation: 'portrait', titleLineCount: 6 });
const plan: Extract<PrintPlan, { ok: true }> = { ok: true, kind: 'tiles', pageCount: tiles.pageCount, tiles: { pieces: [], canvas, texts: [], plan: tiles } };

describe('the page grid preview', () => {
  const html = renderToStaticMarkup(<PrintPreview plan={plan} summary={planSummary(plan)} />);

  it('draws every cell of the grid with its label', () => {
    expect(tiles.blank.length).toBeGreaterThan(0);
    for (const cell of tiles.cells) expect(html).toContain(`data-cell="${cell.label}"`);
  });

  it('marks exactly the blank pages as left out, and names them in the summary', () => {
    const blankCells = [...html.matchAll(/data-cell="([A-Z]+\d+)" data-blank="true"/g)].map((m) => m[1]);
    expect(blankCells.sort()).toEqual([...tiles.blank].sort());
    expect(html.match(/>left out</g)).toHaveLength(tiles.blank.length);
    const summary = planSummary(plan);
    expect(summary).toContain(`${tiles.blank.length} blank ${tiles.blank.length === 1 ? 'page' : 'pages'} left out (${tiles.blank.join(', ')})`);
    expect(summary).toMatch(new RegExp(`^${tiles.pageCount} pages, portrait: `));
  });

  it('names the picture with the summary for screen readers', () => {
    expect(html).toContain(`role="img" aria-label="${planSummary(plan)}"`);
  });
});
