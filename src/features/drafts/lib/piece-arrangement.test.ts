import { describe, expect, it } from 'vitest';
import { draft } from '@shared/engine';
import { piecesArrange, PIECE_SPACING_MM } from './piece-arrangement';

/** The worked example of the trade notes (common practice): bust 38 in, hip 43 in, 3 in negative ease. */
const result = draft({
  unit: 'in',
  measurements: { bust: 38, hip: 43, armholeDepth: 8.5 },
  fabric: { stretch: 40, recovery: 'good' },
  style: 'tank',
  params: { bustEase: (-3 / 38) * 100, frontNeckDepth: 6 },
});
if (!result.ok) throw new Error(result.errors.map((e) => e.message).join('; '));
const pieces = result.draft.pieces;

describe('arranging front and back on the canvas', () => {
  it('puts the back to the right of the front, a set space apart, both hanging from the shoulder line', () => {
    const { placed, bounds } = piecesArrange(pieces, 'side-by-side');
    const [front, back] = placed;
    expect(front?.piece.side).toBe('front');
    expect(back?.piece.side).toBe('back');
    const frontRight = front!.piece.bounds.maxX + front!.dx;
    const backLeft = back!.piece.bounds.minX + back!.dx;
    expect(backLeft - frontRight).toBeCloseTo(PIECE_SPACING_MM, 9);
    expect(back!.dy).toBe(0);
    expect(bounds.maxX).toBeCloseTo(back!.piece.bounds.maxX + back!.dx, 9);
  });

  it('overlays both at the shoulder with the back underneath, so the deeper front neckline is drawn last', () => {
    const { placed } = piecesArrange(pieces, 'overlaid');
    expect(placed.map((p) => p.piece.side)).toEqual(['back', 'front']);
    expect(placed.every((p) => p.dx === 0 && p.dy === 0)).toBe(true);
  });
});
