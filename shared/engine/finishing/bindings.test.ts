import { describe, expect, it } from 'vitest';
import { lengthToMm } from '../../units';
import { EXAMPLE_INPUT, METRIC_INPUT, draftOrThrow } from '../test-support/inputs';
import type { Draft, EdgeName } from '../types';

function edgeLength(draft: Draft, pieceId: string, name: EdgeName): number {
  return draft.pieces.find((p) => p.id === pieceId)!.edges.find((e) => e.name === name)!.length;
}

describe('binding strips', () => {
  it('measures the neckline along the stitching line, front and back, doubled from the half on the fold (common practice)', () => {
    const draft = draftOrThrow(EXAMPLE_INPUT);
    const neck = draft.bindings.find((b) => b.opening === 'neck')!;
    expect(neck.openingLength).toBeCloseTo(2 * (edgeLength(draft, 'front', 'neck') + edgeLength(draft, 'back', 'neck')), 9);
    expect(neck.count).toBe(1);
    expect(neck.joinAt).toBe('centre back');
  });

  it('measures one armhole as front plus back and cuts two strips', () => {
    const draft = draftOrThrow(EXAMPLE_INPUT);
    const armhole = draft.bindings.find((b) => b.opening === 'armhole')!;
    expect(armhole.openingLength).toBeCloseTo(edgeLength(draft, 'front', 'armhole') + edgeLength(draft, 'back', 'armhole'), 9);
    expect(armhole.count).toBe(2);
  });

  it('cuts tape applied unstretched to the opening plus a join allowance at each end (common practice)', () => {
    const draft = draftOrThrow(EXAMPLE_INPUT);
    for (const b of draft.bindings) {
      expect(b.finish).toBe('tape');
      expect(b.ratio).toBe(1);
      expect(b.cutLength).toBeCloseTo(b.openingLength + 2 * lengthToMm(3 / 8, 'in'), 9);
      // Knit tape about 1/4 in wide (common practice).
      expect(b.width).toBeCloseTo(lengthToMm(1 / 4, 'in'), 9);
    }
  });

  it('cuts a self-fabric neckband at 0.85 of the opening (common practice) and folds it double', () => {
    const draft = draftOrThrow(METRIC_INPUT);
    const neck = draft.bindings.find((b) => b.opening === 'neck')!;
    expect(neck.finish).toBe('band');
    expect(neck.ratio).toBe(0.85);
    expect(neck.cutLength).toBeCloseTo(neck.openingLength * 0.85 + 2 * 10, 9);
    expect(neck.cutWidth).toBe(2 * 15 + 2 * 10);
  });

  it('uses the ratio the user sets', () => {
    const draft = draftOrThrow({ ...EXAMPLE_INPUT, params: { ...EXAMPLE_INPUT.params, bindingRatio: 0.9, bindingJoinAllowance: 0.5 } });
    for (const b of draft.bindings) expect(b.cutLength).toBeCloseTo(b.openingLength * 0.9 + 2 * 12.7, 9);
  });
});
