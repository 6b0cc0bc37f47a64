import { describe, expect, it } from 'vitest';
import { lengthToMm } from '../../units';
import { EXAMPLE_INPUT, METRIC_INPUT, draftOrThrow } from '../test-support/inputs';
import { PIECE_GAP_MM } from './fold-layout';

describe('fold layout', () => {
  it('folds in four when the fabric is four pieces wide, front and back cut together (common practice)', () => {
    const draft = draftOrThrow({ ...EXAMPLE_INPUT, fabric: { ...EXAMPLE_INPUT.fabric, width: 60 } });
    const widest = Math.max(...draft.pieces.map((p) => p.bounds.maxX));
    expect(draft.layout.fold).toBe('four-layers');
    expect(draft.layout.layers).toBe(4);
    expect(draft.layout.fabricWidth).toBeCloseTo(lengthToMm(60, 'in'), 9);
    expect(draft.layout.widthUsed).toBeCloseTo(4 * widest, 9);
    expect(draft.layout.lengthNeeded).toBeCloseTo(Math.max(...draft.pieces.map((p) => p.bounds.height)), 9);
    expect(draft.layout.placements).toEqual([expect.objectContaining({ pieceIds: ['front', 'back'], layers: 4 })]);
    expect(draft.layout.steps.join(' ')).toContain('front neckline');
  });

  it('falls back to one lengthwise fold with the pieces one after the other', () => {
    const draft = draftOrThrow({ ...EXAMPLE_INPUT, fabric: { ...EXAMPLE_INPUT.fabric, width: 36 } });
    const [front, back] = draft.pieces;
    expect(draft.layout.fold).toBe('two-layers');
    expect(draft.layout.fits).toBe(true);
    expect(draft.layout.lengthNeeded).toBeCloseTo(front!.bounds.height + PIECE_GAP_MM + back!.bounds.height, 9);
    expect(draft.layout.placements.map((p) => p.y)).toEqual([0, front!.bounds.height + PIECE_GAP_MM]);
  });

  it('plans four layers and states the width needed when the fabric width is unknown', () => {
    const draft = draftOrThrow(EXAMPLE_INPUT);
    expect(draft.layout.fabricWidth).toBeNull();
    expect(draft.layout.fold).toBe('four-layers');
  });

  it('tells the cutter to cut the racer back in after cutting together', () => {
    const draft = draftOrThrow(METRIC_INPUT);
    expect(draft.layout.fold).toBe('four-layers');
    expect(draft.layout.steps.at(-1)).toContain('racer-back');
  });
});
