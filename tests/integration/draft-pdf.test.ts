/**
 * GET /api/drafts/:id/pdf: who may print a draft, how bad settings are answered, and what the
 * PDF holds, read back with pdf-lib (a general-purpose PDF library). Page sizes: ANSI Letter
 * 8.5 × 11 in = 612 × 792 pt, ISO 216 A4 210 × 297 mm = 595.28 × 841.89 pt, ISO 216 A0
 * 841 × 1189 mm = 2383.94 × 3370.39 pt, at 72 pt per inch (ISO 32000-1, 8.3.2.3).
 */
import { decodePDFRawStream, PDFDocument, PDFRawStream, PrintScaling } from 'pdf-lib';
import request, { type Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { draft as engineDraft, type Draft } from '../../shared/engine/index.js';
import { draftSheetPlan, draftTilesPlan } from '../../shared/engine/layout/tiling-draft.js';
import type { DraftDto } from '../../shared/schemas/draft-dto.js';
import { csrfHeaders, memberAdd, studioSignUp, type Agent } from '../helpers/auth.js';
import { testAppCreate } from '../helpers/test-app.js';
import { draftMake, draftWorld } from './drafts-fixtures.js';

/** jsPDF writes sizes to 0.01 pt; one read back is within half of that. */
const PT_WRITTEN = 0.005;

const { app, close } = testAppCreate();
afterAll(close);

let owner: Agent;
let cutter: Agent;
let otherOwner: Agent;
let draftId: number;
let drafted: Draft;
let pieceIds: string[];

/** Collects a binary answer into a Buffer (supertest parses only text types by itself). */
function binary(res: NodeJS.ReadableStream & { setEncoding?: unknown }, done: (err: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => done(null, Buffer.concat(chunks)));
}

function pdfGet(agent: Agent, query: string, id = draftId) {
  return agent.get(`/api/drafts/${id}/pdf${query}`).buffer(true).parse(binary as never);
}

async function pdfOf(res: Response): Promise<PDFDocument> {
  expect(res.status).toBe(200);
  expect(res.headers['content-type']).toBe('application/pdf');
  const bytes = res.body as Buffer;
  expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  return PDFDocument.load(bytes, { updateMetadata: false });
}

function sizesOf(doc: PDFDocument): { width: number; height: number }[] {
  return doc.getPages().map((p) => p.getSize());
}

function expectSize(size: { width: number; height: number } | undefined, width: number, height: number): void {
  expect(size).toBeDefined();
  expect(Math.abs(size!.width - width)).toBeLessThanOrEqual(PT_WRITTEN);
  expect(Math.abs(size!.height - height)).toBeLessThanOrEqual(PT_WRITTEN);
}

/** Every decoded content stream, as latin1 text (jsPDF writes standard-font text as literal strings). */
function contentText(doc: PDFDocument): string {
  const out: string[] = [];
  for (const [, object] of doc.context.enumerateIndirectObjects()) {
    if (object instanceof PDFRawStream) {
      try {
        out.push(new TextDecoder('latin1').decode(decodePDFRawStream(object).decode()));
      } catch {
        // Streams pdf-lib cannot decode (none expected) hold no page text.
      }
    }
  }
  return out.join('\n');
}

beforeAll(async () => {
  const a = await studioSignUp(app, { studioName: 'Print Route Studio' });
  owner = a.agent;
  cutter = (await memberAdd(app, a.studio.id, 'cutter')).agent;
  otherOwner = (await studioSignUp(app, { studioName: 'Print Route Other Studio' })).agent;
  const world = await draftWorld(owner, a.studio.id, { name: 'Scoop tank for print' });
  const made = await draftMake(owner, world);
  draftId = made.id;
  const approved = await owner.post(`/api/drafts/${draftId}/state`).set(csrfHeaders).send({ to: 'approved', version: made.version });
  expect(approved.status).toBe(200);
  const dto = (await owner.get(`/api/drafts/${draftId}`)).body as DraftDto;
  const result = engineDraft(dto.current.input);
  if (!result.ok) throw new Error(`the stored input does not draft: ${JSON.stringify(result.errors)}`);
  drafted = result.draft;
  pieceIds = drafted.pieces.map((p) => p.id);
});

describe('who may print', () => {
  it('lets the cutter print an approved draft, as the work queue does', async () => {
    const doc = await pdfOf(await pdfGet(cutter, '?kind=ticket'));
    expect(doc.getPageCount()).toBe(1);
  });

  it('asks a signed-out visitor to sign in', async () => {
    const res = await request(app).get(`/api/drafts/${draftId}/pdf?kind=ticket`);
    expect(res.status).toBe(401);
  });

  it("answers another studio's owner 404, so the draft's existence does not leak", async () => {
    const res = await otherOwner.get(`/api/drafts/${draftId}/pdf?kind=tiles`);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('answers 404 for a draft that does not exist and 400 for an id that is not one', async () => {
    expect((await owner.get('/api/drafts/999999999/pdf')).status).toBe(404);
    const bad = await owner.get('/api/drafts/abc/pdf');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['id']);
  });
});

describe('bad settings', () => {
  const cases: [string, string, string][] = [
    ['an unknown kind', '?kind=poster', 'kind'],
    ['a paper the kind does not take', '?kind=tiles&paper=a0', 'paper'],
    ['a paper nobody sells', '?kind=tiles&paper=b5', 'paper'],
    ['a ticket on a wide sheet', '?kind=ticket&paper=roll36', 'paper'],
    ['an orientation that is not one', '?orientation=diagonal', 'orientation'],
    ['an overlap that is not a number', '?overlap=half', 'overlap'],
    ['an overlap under 1/4 in', '?overlap=2', 'overlap'],
    ['an overlap over 50 mm', '?overlap=80', 'overlap'],
    ['a piece the draft does not have', '?pieces=sleeve', 'pieces'],
    ['an empty list of pieces', '?pieces=', 'pieces'],
    ['a setting given twice', '?kind=tiles&kind=sheet', 'kind'],
    ['a setting nobody asked for', '?scale=0.9', 'scale'],
  ];
  for (const [what, query, field] of cases) {
    it(`answers ${what} with 400 naming "${field}"`, async () => {
      const res = await owner.get(`/api/drafts/${draftId}/pdf${query}`);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('invalid');
      expect(Object.keys(res.body.error.fields)).toContain(field);
      expect(res.body.error.fields[field]).toEqual(expect.any(String));
    });
  }
});

describe('the documents', () => {
  it('tiles Letter pages of 612 × 792 pt (ANSI), as many as the tiling plans', async () => {
    const res = await pdfGet(owner, '?kind=tiles&paper=letter&orientation=portrait');
    const doc = await pdfOf(res);
    const plan = draftTilesPlan(drafted, { paper: 'letter', orientation: 'portrait', titleLineCount: 6 }).plan;
    expect(plan.pageCount).toBeGreaterThan(1);
    expect(doc.getPageCount()).toBe(plan.pageCount);
    for (const size of sizesOf(doc)) expectSize(size, 612, 792);
    expect(res.headers['x-page-count']).toBe(String(plan.pageCount));
  });

  it('tiles A4 pages of 595.28 × 841.89 pt (ISO 216) and asks the viewer not to scale them', async () => {
    const doc = await pdfOf(await pdfGet(owner, '?kind=tiles&paper=a4&orientation=portrait'));
    const plan = draftTilesPlan(drafted, { paper: 'a4', orientation: 'portrait', titleLineCount: 6 }).plan;
    expect(doc.getPageCount()).toBe(plan.pageCount);
    for (const size of sizesOf(doc)) expectSize(size, 595.28, 841.89);
    // ViewerPreferences /PrintScaling /None (ISO 32000-1, 12.2, table 150)
    expect(doc.catalog.getOrCreateViewerPreferences().getPrintScaling()).toBe(PrintScaling.None);
  });

  it('picks the orientation that needs fewer pages when left to itself', async () => {
    const portrait = draftTilesPlan(drafted, { paper: 'letter', orientation: 'portrait', titleLineCount: 6 }).plan.pageCount;
    const landscape = draftTilesPlan(drafted, { paper: 'letter', orientation: 'landscape', titleLineCount: 6 }).plan.pageCount;
    const doc = await pdfOf(await pdfGet(owner, '?kind=tiles&paper=letter'));
    expect(doc.getPageCount()).toBe(Math.min(portrait, landscape));
  });

  it('prints only the pieces asked for, with the overlap asked for', async () => {
    const one = pieceIds[0]!;
    const plan = draftTilesPlan(drafted, { paper: 'a4', orientation: 'portrait', overlapMm: 20, pieceIds: [one], titleLineCount: 6 }).plan;
    const all = draftTilesPlan(drafted, { paper: 'a4', orientation: 'portrait', overlapMm: 20, titleLineCount: 6 }).plan;
    expect(plan.pageCount).toBeLessThan(all.pageCount);
    const doc = await pdfOf(await pdfGet(owner, `?kind=tiles&paper=A4&orientation=portrait&overlap=20&pieces=${one}`));
    expect(doc.getPageCount()).toBe(plan.pageCount);
  });

  it('puts every piece on one A0 sheet of 841 × 1189 mm (ISO 216)', async () => {
    const doc = await pdfOf(await pdfGet(owner, '?kind=sheet&paper=a0'));
    expect(doc.getPageCount()).toBe(1);
    expectSize(sizesOf(doc)[0], 2383.94, 3370.39);
  });

  it('makes the wide sheet 36 in (2592 pt) across on the roll, as long as the layout needs', async () => {
    const doc = await pdfOf(await pdfGet(owner, '?kind=sheet'));
    expect(doc.getPageCount()).toBe(1);
    const plan = draftSheetPlan(drafted, { paper: 'roll36', titleLineCount: 4 }).layout.plan;
    // 36 in × 72 pt/in = 2592 pt (ISO 32000-1, 8.3.2.3); the page is that wide, the length in mm × 72 / 25.4
    expect(Math.abs(plan.sheet.widthMm - 36 * 25.4)).toBeLessThanOrEqual(PT_WRITTEN);
    expectSize(sizesOf(doc)[0], 2592, (plan.sheet.heightMm * 72) / 25.4);
  });

  it('fits the ticket on one Letter page, lengths in the studio unit', async () => {
    const doc = await pdfOf(await pdfGet(owner, '?kind=ticket&paper=letter'));
    expect(doc.getPageCount()).toBe(1);
    expectSize(sizesOf(doc)[0], 612, 792);
    expect(contentText(doc)).toContain('lengths in inches');
  });

  it('follows the studio when it changes its unit to centimetres', async () => {
    const changed = await owner.patch('/api/studio').set(csrfHeaders).send({ defaultUnit: 'cm' });
    expect(changed.status).toBe(200);
    try {
      const doc = await pdfOf(await pdfGet(owner, '?kind=ticket&paper=a4'));
      expectSize(sizesOf(doc)[0], 595.28, 841.89);
      expect(contentText(doc)).toContain('lengths in centimetres');
    } finally {
      await owner.patch('/api/studio').set(csrfHeaders).send({ defaultUnit: 'in' });
    }
  });

  it('is sent as an attachment with a plain file name', async () => {
    const res = await pdfGet(owner, '?kind=tiles&paper=a4');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="scoop-tank-for-print-[a-z0-9-]+-tiles-a4\.pdf"$/);
    expect(res.headers['cache-control']).toContain('no-store');
    expect(Number(res.headers['content-length'])).toBe((res.body as Buffer).length);
  });
});
