import { jsPDF } from 'jspdf';
import { describe, expect, it } from 'vitest';
import { draft } from '@shared/engine';
import { pdfDocumentBuild } from '@shared/engine/export/pdf-document';
import type { DraftInput } from '@shared/schemas/draft-input';
import { planSummary, printPlan } from './print-plan';
import { printOptions, settingsDefault, type PrintSettings } from './print-settings';
import { EXAMPLE_INPUT } from '@shared/engine/test-support/inputs';

/**
 * A tank top for a body of bust 36 in, hip 40 in, armhole depth 8 1/2 in (the armhole within the
 * 8–9 in of a fitted tank top: common practice) in a 40 % stretch jersey.
 */
const INPUT: DraftInput = EXAMPLE_INPUT;
const result = draft(INPUT);
if (!result.ok) throw new Error('the example does not draft');
const drafted = result.draft;
const meta = { client: 'Marisol Venn', style: 'Scoop tank', date: '2 December 2026', studio: 'Loop & Lark' };

function settings(over: Partial<PrintSettings>): PrintSettings {
  return { ...settingsDefault('tiles', 'letter', 'in', drafted.pieces.map((p) => p.id)), ...over };
}

describe('the previewed plan', () => {
  const cases: Partial<PrintSettings>[] = [
    { paper: 'letter' },
    { paper: 'a4' },
    { paper: 'a4', orientation: 'landscape' },
    { paper: 'legal', overlap: '3/4' },
    { paper: 'a3' },
    { paper: 'tabloid', orientation: 'portrait' },
    { paper: 'letter', pieceIds: ['back'] },
    { kind: 'sheet', paper: 'roll36' },
    { kind: 'sheet', paper: 'a0' },
    { kind: 'ticket', paper: 'a4' },
  ];
  for (const over of cases) {
    it(`counts the pages the PDF writer makes: ${JSON.stringify(over)}`, () => {
      const checked = printOptions(settings(over), 'in', meta);
      if (!checked.ok) throw new Error(JSON.stringify(checked.fields));
      const plan = printPlan(drafted, checked.options);
      if (!plan.ok) throw new Error(JSON.stringify(plan.fields));
      const built = pdfDocumentBuild(jsPDF, drafted, checked.options);
      if (!built.ok) throw new Error(JSON.stringify(built.errors));
      expect(plan.pageCount).toBe(built.pageCount);
      if (plan.kind === 'tiles') {
        expect(plan.tiles.plan.blank).toEqual(built.tiles!.blank);
        expect(plan.tiles.plan.rows * plan.tiles.plan.cols).toBe(built.tiles!.cells.length);
      }
    });
  }

  it('says how many pages, in how many rows, and which are left out', () => {
    const checked = printOptions(settings({ paper: 'letter', orientation: 'portrait' }), 'in', meta);
    if (!checked.ok) throw new Error('bad settings');
    const plan = printPlan(drafted, checked.options);
    if (!plan.ok || plan.kind !== 'tiles') throw new Error('no tiles');
    const p = plan.tiles.plan;
    const text = planSummary(plan);
    expect(text).toMatch(new RegExp(`^${p.pageCount} pages, portrait: `));
    expect(text).toContain(`in ${p.rows} rows of ${p.cols}`);
    if (p.blank.length === 0) expect(text).toContain('none left out');
    else for (const label of p.blank) expect(text).toContain(label);
  });

  it('names the pieces field when a piece id is not in the draft', () => {
    const checked = printOptions(settings({ pieceIds: ['sleeve'] }), 'in', meta);
    if (!checked.ok) throw new Error('bad settings');
    const plan = printPlan(drafted, checked.options);
    expect(plan.ok).toBe(false);
    if (!plan.ok) expect(plan.fields.pieceIds).toContain('sleeve');
  });
});
