import { describe, expect, it } from 'vitest';
import { EXAMPLE_INPUT, draftOrThrow } from '../test-support/inputs';
import { draftToSvg } from './svg';

describe('true-size SVG', () => {
  const draft = draftOrThrow(EXAMPLE_INPUT);
  const svg = draftToSvg(draft, { title: 'Juniper Knit Studio — Ada M.' });

  it('sizes the document in millimetres with a viewBox in millimetres (SVG 1.1, 7.10: 1 user unit = 1 mm)', () => {
    const match = /<svg [^>]*width="([\d.]+)mm" height="([\d.]+)mm" viewBox="0 0 ([\d.]+) ([\d.]+)"/.exec(svg);
    expect(match).not.toBeNull();
    expect(match![1]).toBe(match![3]);
    expect(match![2]).toBe(match![4]);
    const width = Number(match![1]);
    // Two pieces side by side, 20 mm apart, 10 mm margins.
    const expected = draft.pieces.reduce((sum, p) => sum + p.bounds.width, 0) + 20 + 2 * 10;
    expect(width).toBeCloseTo(expected, 2);
  });

  it('draws the cutting line solid and the stitching line dashed for each piece', () => {
    for (const piece of draft.pieces) {
      expect(svg).toContain(`<path d="${piece.cutting.d}" fill="`);
      expect(svg).toContain(`<path d="${piece.stitching.d}" fill="none" stroke="#1f2328" stroke-width="0.3" stroke-dasharray="3 2"/>`);
    }
  });

  it('labels the pieces, their cut and the fold, and tints front and back differently', () => {
    expect(svg).toContain('>FRONT<');
    expect(svg).toContain('>BACK<');
    expect(svg.match(/>cut 1 on fold</g)).toHaveLength(2);
    expect(svg.match(/>place on fold</g)).toHaveLength(2);
    expect(svg).toContain('#eef2f7');
    expect(svg).toContain('#f5f0e6');
  });

  it('draws a tick for every notch and a scale square', () => {
    const notches = draft.pieces.reduce((sum, p) => sum + p.notches.length, 0);
    expect(notches).toBeGreaterThan(0);
    expect(svg.match(/<line [^>]*stroke-width="0.6"\/>/g)).toHaveLength(notches);
    expect(svg).toContain('2 in square');
  });

  it('escapes text', () => {
    expect(draftToSvg(draft, { title: 'A & B <studio>' })).toContain('A &amp; B &lt;studio&gt;');
  });

  it('draws only the pieces asked for', () => {
    const back = draftToSvg(draft, { pieceIds: ['back'], scaleSquare: false });
    expect(back).toContain('>BACK<');
    expect(back).not.toContain('>FRONT<');
  });
});
