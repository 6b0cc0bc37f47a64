import { jsPDF } from 'jspdf';
import { describe, expect, it } from 'vitest';
import { draft as draftMake } from '../index';
import type { Draft, DraftInput } from '../types';
import { pdfBytes, pdfDocumentBuild } from './pdf-document';

const input: DraftInput = {
  unit: 'cm',
  measurements: { bust: 92, hip: 100, waist: 76, armholeDepth: 21 },
  fabric: { stretch: 50, recovery: 'good', width: 150 },
  style: 'tank',
  params: { racerBackInset: 6, edgeFinish: 'band' },
};

function drafted(): Draft {
  const result = draftMake(input);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result.draft;
}

const draft = drafted();

function errorsOf(options: unknown) {
  const result = pdfDocumentBuild(jsPDF, draft, options);
  if (result.ok) throw new Error('expected field errors');
  return result.errors;
}

describe('pdfDocumentBuild', () => {
  it('builds tiles by default on the first tile paper', () => {
    const result = pdfDocumentBuild(jsPDF, draft, {});
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.kind).toBe('tiles');
    expect(result.tiles!.paper).toBe('letter');
    expect(result.pageCount).toBe(result.tiles!.pageCount);
  });

  it('builds one page for a sheet and for a ticket', () => {
    for (const kind of ['sheet', 'ticket']) {
      const result = pdfDocumentBuild(jsPDF, draft, { kind });
      expect(result.ok && result.pageCount).toBe(1);
    }
  });

  it('prints only the chosen pieces', () => {
    const result = pdfDocumentBuild(jsPDF, draft, { kind: 'tiles', paper: 'a4', pieceIds: ['back'] });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const both = pdfDocumentBuild(jsPDF, draft, { kind: 'tiles', paper: 'a4' });
    expect(both.ok && result.pageCount < both.pageCount).toBe(true);
  });

  it('names the field of every bad option', () => {
    expect(errorsOf({ kind: 'poster' })[0]!.path).toBe('kind');
    expect(errorsOf({ kind: 'tiles', paper: 'roll36' })).toEqual([{ path: 'paper', message: 'Paper for tiles must be one of letter, a4, legal, a3, tabloid' }]);
    expect(errorsOf({ kind: 'ticket', paper: 'a3' })[0]!.path).toBe('paper');
    expect(errorsOf({ overlapMm: 2 })[0]).toEqual({ path: 'overlapMm', message: 'Overlap must be at least 1/4 in (6.35 mm)' });
    expect(errorsOf({ marginMm: 3 })[0]!.path).toBe('marginMm');
    expect(errorsOf({ pieceIds: ['sleeve'] })).toEqual([{ path: 'pieceIds', message: 'no such piece in this draft: sleeve' }]);
    expect(errorsOf({ meta: { client: 7 } })[0]!.path).toBe('meta.client');
    expect(errorsOf({ scale: 0.9 })[0]!.message).toBe('Unknown option: scale');
  });

  it('refuses pieces too big for an A0 sheet, naming the paper', () => {
    const long = draftMake({ ...input, params: { ...input.params, length: 150 } });
    if (!long.ok) throw new Error(JSON.stringify(long.errors));
    // a piece over 150 cm long is longer than A0's 1189 mm side (ISO 216) in either orientation
    expect(long.draft.pieces[0]!.bounds.height).toBeGreaterThan(1189);
    const result = pdfDocumentBuild(jsPDF, long.draft, { kind: 'sheet', paper: 'a0' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors[0]).toEqual({ path: 'paper', message: 'the pieces do not fit on one A0 sheet; choose the 36 in roll or tiles' });
    // the roll takes it
    expect(pdfDocumentBuild(jsPDF, long.draft, { kind: 'sheet', paper: 'roll36' }).ok).toBe(true);
  });

  it('sets the viewer to print at actual size and titles the document', () => {
    const result = pdfDocumentBuild(jsPDF, draft, { kind: 'ticket', meta: { client: 'Ines Varga' } });
    if (!result.ok) throw new Error('not built');
    const text = new TextDecoder('latin1').decode(pdfBytes(result.doc));
    expect(text).toContain('/PrintScaling /None'); // ISO 32000-1, 12.2
    expect(text).toContain('/Title (Tank top for Ines Varga \\(ticket\\))');
  });
});
