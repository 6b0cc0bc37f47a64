/**
 * The printed documents read back with pdf-lib (a general-purpose PDF library): page sizes,
 * viewer preferences, coordinate precision and the reuse of the pattern's form object.
 */
import { decodePDFRawStream, PDFDocument, PDFName, PDFRawStream, PrintScaling } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import { built, demoDraft } from './print-fixtures';

/** jsPDF writes numbers to 0.01 pt; a size read back is within half of that. */
const PT_WRITTEN = 0.005;

const draft = demoDraft();

async function load(bytes: Uint8Array): Promise<PDFDocument> {
  return PDFDocument.load(bytes, { updateMetadata: false });
}

function streamText(stream: PDFRawStream): string {
  return new TextDecoder('latin1').decode(decodePDFRawStream(stream).decode());
}

/** Every decoded content stream of the document: the pages' and the form XObjects'. */
function streams(doc: PDFDocument): { forms: string[]; pages: string[] } {
  const forms: string[] = [];
  for (const [, object] of doc.context.enumerateIndirectObjects()) {
    if (object instanceof PDFRawStream && object.dict.get(PDFName.of('Subtype')) === PDFName.of('Form')) forms.push(streamText(object));
  }
  const pages = doc.getPages().map((page) => {
    const contents = page.node.Contents();
    const refs = contents && 'asArray' in contents ? contents.asArray() : [contents];
    return refs.map((ref) => streamText(doc.context.lookup(ref) as PDFRawStream)).join('\n');
  });
  return { forms, pages };
}

describe('tiled pages read back', () => {
  const cases: [string, number, number, string][] = [
    // ANSI: Letter 8.5 × 11 in, Legal 8.5 × 14 in, Tabloid 11 × 17 in at 72 pt/in (ISO 32000-1, 8.3.2.3)
    ['letter', 612, 792, 'ANSI'],
    ['legal', 612, 1008, 'ANSI'],
    ['tabloid', 792, 1224, 'ANSI'],
    // ISO 216: A4 210 × 297 mm, A3 297 × 420 mm
    ['a4', 595.28, 841.89, 'ISO 216'],
    ['a3', 841.89, 1190.55, 'ISO 216'],
  ];
  for (const [paper, width, height, source] of cases) {
    it(`makes every ${paper} page ${width} × ${height} pt (${source})`, async () => {
      const result = built(draft, { kind: 'tiles', paper, orientation: 'portrait' });
      const doc = await load(result.bytes);
      expect(doc.getPageCount()).toBe(result.tiles!.pageCount);
      for (const page of doc.getPages()) {
        const size = page.getSize();
        expect(Math.abs(size.width - width)).toBeLessThanOrEqual(PT_WRITTEN);
        expect(Math.abs(size.height - height)).toBeLessThanOrEqual(PT_WRITTEN);
      }
    });
  }

  it('turns the pages for landscape', async () => {
    const doc = await load(built(draft, { kind: 'tiles', paper: 'letter', orientation: 'landscape' }).bytes);
    const size = doc.getPage(0).getSize();
    expect([size.width, size.height]).toEqual([792, 612]);
  });

  it('asks the viewer to print without scaling', async () => {
    // ViewerPreferences /PrintScaling /None (ISO 32000-1, 12.2, table 150)
    const doc = await load(built(draft, { kind: 'tiles', paper: 'a4' }).bytes);
    expect(doc.catalog.getOrCreateViewerPreferences().getPrintScaling()).toBe(PrintScaling.None);
  });

  it('draws the pattern once, as a form object every tile paints', async () => {
    const result = built(draft, { kind: 'tiles', paper: 'letter' });
    const { forms, pages } = streams(await load(result.bytes));
    expect(forms).toHaveLength(1);
    const tilePages = pages.slice(result.tiles!.cover ? 1 : 0);
    for (const page of tilePages) expect(page.match(/\/Xo1 Do/g)).toHaveLength(1);
    // every segment of every cutting and stitching line is in the form; the curves only there
    const segments = draft.pieces.reduce((sum, p) => sum + p.cutting.segments.length + p.stitching.segments.length, 0);
    const curves = draft.pieces.reduce((sum, p) => sum + [...p.cutting.segments, ...p.stitching.segments].filter((s) => s.kind === 'cubic').length, 0);
    expect(forms[0]!.match(/ [lc]\n/g)!.length).toBeGreaterThanOrEqual(segments);
    expect(forms[0]!.match(/ c\n/g)!.length).toBe(curves);
    for (const page of tilePages) expect(page).not.toMatch(/ c\n/);
  });

  it('writes no coordinate finer than 0.01 pt', async () => {
    const { forms, pages } = streams(await load(built(draft, { kind: 'tiles', paper: 'letter' }).bytes));
    for (const text of [...forms, ...pages]) {
      const paths = text.split('\n').filter((line) => / [mlc]$/.test(line));
      expect(paths.length).toBeGreaterThan(0);
      for (const line of paths) for (const n of line.split(' ').slice(0, -1)) expect(n).toMatch(/^-?\d+(\.\d{0,2})?$/);
    }
  });

  it('compresses its streams', async () => {
    const result = built(draft, { kind: 'tiles', paper: 'letter' });
    const doc = await load(result.bytes);
    for (const [, object] of doc.context.enumerateIndirectObjects()) {
      if (object instanceof PDFRawStream) expect(object.dict.get(PDFName.of('Filter'))).toBe(PDFName.of('FlateDecode'));
    }
  });
});

describe('the wide sheet read back', () => {
  it('is one page 36 in wide on the roll', async () => {
    const result = built(draft, { kind: 'sheet', paper: 'roll36' });
    const doc = await load(result.bytes);
    expect(doc.getPageCount()).toBe(1);
    // 36 in × 72 pt/in = 2592 pt (ISO 32000-1, 8.3.2.3)
    const size = doc.getPage(0).getSize();
    expect(Math.abs(size.width - 2592)).toBeLessThanOrEqual(PT_WRITTEN);
    expect(Math.abs(size.height - (result.sheet!.sheet.heightMm * 72) / 25.4)).toBeLessThanOrEqual(PT_WRITTEN);
  });

  it('is one A0 page of 841 × 1189 mm', async () => {
    // ISO 216: A0 841 × 1189 mm = 2383.94 × 3370.39 pt
    const doc = await load(built(draft, { kind: 'sheet', paper: 'a0' }).bytes);
    const size = doc.getPage(0).getSize();
    expect(Math.abs(size.width - 2383.94)).toBeLessThanOrEqual(PT_WRITTEN);
    expect(Math.abs(size.height - 3370.39)).toBeLessThanOrEqual(PT_WRITTEN);
  });
});

describe('the ticket read back', () => {
  it('is one A4 page', async () => {
    const doc = await load(built(draft, { kind: 'ticket', paper: 'a4' }).bytes);
    expect(doc.getPageCount()).toBe(1);
    const size = doc.getPage(0).getSize();
    expect(Math.abs(size.width - 595.28)).toBeLessThanOrEqual(PT_WRITTEN); // ISO 216 A4
  });
});
