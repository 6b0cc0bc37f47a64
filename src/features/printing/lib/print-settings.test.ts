import { describe, expect, it } from 'vitest';
import { paperDefault, paperLabel, printOptions, settingsDefault, settingsForKind } from './print-settings';

const pieces = ['front', 'back'];

describe('paper names', () => {
  it('writes ANSI sizes in inches and ISO 216 sizes in mm', () => {
    // ANSI: Letter 8.5 × 11 in, Legal 8.5 × 14 in, Tabloid 11 × 17 in; ISO 216: A4 210 × 297 mm, A3 297 × 420 mm, A0 841 × 1189 mm
    expect(paperLabel('letter')).toBe('Letter, 8 1/2 × 11 in');
    expect(paperLabel('legal')).toBe('Legal, 8 1/2 × 14 in');
    expect(paperLabel('tabloid')).toBe('Tabloid, 11 × 17 in');
    expect(paperLabel('a4')).toBe('A4, 210 × 297 mm');
    expect(paperLabel('a3')).toBe('A3, 297 × 420 mm');
    expect(paperLabel('a0')).toBe('A0, 841 × 1189 mm');
    expect(paperLabel('roll36')).toBe('36 in roll, as long as needed');
  });

  it("starts from the studio's paper, and moves to one the kind takes", () => {
    expect(paperDefault('tiles', 'a3')).toBe('a3');
    expect(paperDefault('sheet', 'a3')).toBe('roll36');
    expect(paperDefault('ticket', 'a4')).toBe('a4');
    expect(paperDefault('ticket', 'tabloid')).toBe('letter');
    const tiles = settingsDefault('tiles', 'legal', 'in', pieces);
    expect(settingsForKind(tiles, 'ticket', 'legal').paper).toBe('letter');
    expect(settingsForKind({ ...tiles, paper: 'a4' }, 'ticket', 'legal').paper).toBe('a4');
  });
});

describe('print settings to PDF options', () => {
  it('reads the overlap in the display unit: 1/2 in is 12.7 mm (1 in = 25.4 mm, NIST SP 811)', () => {
    const result = printOptions({ ...settingsDefault('tiles', 'letter', 'in', pieces), overlap: '1/2' }, 'in', {});
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.options.overlapMm).toBeCloseTo(12.7, 9);
    const cm = printOptions({ ...settingsDefault('tiles', 'a4', 'cm', pieces), overlap: '2' }, 'cm', {});
    if (!cm.ok) throw new Error('2 cm refused');
    expect(cm.options.overlapMm).toBeCloseTo(20, 9);
  });

  it('starts with an overlap of 1/2 in, written in the unit shown', () => {
    expect(settingsDefault('tiles', 'letter', 'in', pieces).overlap).toBe('1/2 in');
    expect(settingsDefault('tiles', 'a4', 'cm', pieces).overlap).toBe('1.3 cm');
  });

  it('refuses an overlap under 1/4 in, naming the overlap', () => {
    const result = printOptions({ ...settingsDefault('tiles', 'letter', 'in', pieces), overlap: '1/8' }, 'in', {});
    expect(result).toEqual({ ok: false, fields: { overlap: expect.stringContaining('at least 1/4 in') } });
  });

  it('refuses an overlap that is not a length, naming the overlap', () => {
    const result = printOptions({ ...settingsDefault('tiles', 'letter', 'in', pieces), overlap: 'wide' }, 'in', {});
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.fields)).toEqual(['overlap']);
  });

  it('ignores the overlap for a sheet and a ticket', () => {
    const sheet = printOptions({ ...settingsDefault('sheet', 'letter', 'in', pieces), overlap: 'wide' }, 'in', {});
    expect(sheet.ok).toBe(true);
  });

  it('asks for at least one piece', () => {
    const result = printOptions({ ...settingsDefault('tiles', 'letter', 'in', pieces), pieceIds: [] }, 'in', {});
    expect(result).toEqual({ ok: false, fields: { pieceIds: 'Choose at least one piece to print' } });
  });

  it('refuses a paper the kind does not take, naming the paper', () => {
    const result = printOptions({ ...settingsDefault('ticket', 'letter', 'in', pieces), paper: 'a0' }, 'in', {});
    expect(result).toEqual({ ok: false, fields: { paper: expect.stringContaining('letter, a4') } });
  });
});
