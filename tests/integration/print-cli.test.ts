/** The PDF part of the draft command line, on the demo tank top. */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PDFDocument } from 'pdf-lib';
import { afterAll, describe, expect, it } from 'vitest';
import { draftPdfArgsPick, draftPdfWrite } from '../../scripts/draft-pdf';
import { demoDraft } from './print-fixtures';

const dir = mkdtempSync(join(tmpdir(), 'kw-print-cli-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const draft = demoDraft();

describe('draftPdfWrite', () => {
  it('writes tiled A4 pages that a PDF library reads back', async () => {
    const file = join(dir, 'tiles.pdf');
    const result = await draftPdfWrite(draft, { pdf: file, paper: 'a4' });
    expect(result.ok).toBe(true);
    const doc = await PDFDocument.load(readFileSync(file));
    expect(result.ok && doc.getPageCount()).toBe(result.ok ? result.pageCount : -1);
    // ISO 216: A4 is 595.28 pt wide (portrait) or high (landscape)
    const { width, height } = doc.getPage(0).getSize();
    expect(Math.min(width, height)).toBeCloseTo(595.28, 2);
  });

  it('reads the overlap in the draft unit or with its own unit', async () => {
    const inches = await draftPdfWrite(draft, { pdf: join(dir, 'a.pdf'), overlap: '3/4' });
    const mm = await draftPdfWrite(draft, { pdf: join(dir, 'b.pdf'), overlap: '19 mm' });
    expect(inches.ok && mm.ok).toBe(true);
  });

  it('names the flag of a bad value and writes nothing', async () => {
    const file = join(dir, 'bad.pdf');
    expect(await draftPdfWrite(draft, { pdf: file, paper: 'roll36', kind: 'tiles' })).toEqual({
      ok: false,
      errors: [{ path: 'paper', message: 'Paper for tiles must be one of letter, a4, legal, a3, tabloid' }],
    });
    const overlap = await draftPdfWrite(draft, { pdf: file, overlap: 'wide' });
    expect(overlap.ok ? null : overlap.errors[0]!.path).toBe('overlap');
    const tooWide = await draftPdfWrite(draft, { pdf: file, overlap: '3 in' });
    expect(tooWide.ok ? null : tooWide.errors[0]).toEqual({ path: 'overlap', message: 'Overlap must be at most 50 mm' });
    expect(() => readFileSync(file)).toThrow();
  });

  it('picks only the PDF flags from the parsed command line', () => {
    expect(draftPdfArgsPick({ in: 'x.json', pdf: 'o.pdf', kind: 'ticket', help: false })).toEqual({ pdf: 'o.pdf', kind: 'ticket' });
  });
});
