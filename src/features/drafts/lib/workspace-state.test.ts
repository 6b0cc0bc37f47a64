import { describe, expect, it } from 'vitest';
import type { DraftInputParts } from '@shared/schemas/draft-input-build';
import { paramsEqual, workspaceInit, workspaceReduce } from './workspace-state';

const IN = 25.4;

/**
 * A body from the worked example (common practice, trade notes): bust 38 in, hip 43 in; armhole
 * depth 8 1/2 in (trade notes: 8–9 in for adult women). Fabric at 40 % stretch, a jersey.
 */
const parts: DraftInputParts = {
  unit: 'in',
  measurements: { bust: 38 * IN, hip: 43 * IN, armholeDepth: 8.5 * IN },
  corrections: [],
  fabric: { stretch: 40, stretchLengthwise: null, recovery: 'good', widthMm: null },
  style: { garment: 'tank', racerBack: false, defaults: {} },
};

function finished(state: ReturnType<typeof workspaceInit>) {
  if (!state.live.result.ok) throw new Error(state.live.result.errors.map((e) => e.message).join('; '));
  return state.live.result.draft.finished;
}

describe('the workspace state', () => {
  it('redraws with 3 in of negative ease to a 35 in finished bust (worked example, common practice)', () => {
    let state = workspaceInit(parts, {}, 1);
    const ease = ((35 - 38) / 38) * 100;
    state = workspaceReduce(state, { type: 'set', key: 'bustEase', value: ease, now: 0 });
    // 35 in = 889 mm (1 in = 25.4 mm, NIST SP 811); within a tenth of a millimetre.
    expect(Math.abs(finished(state).bust - 35 * IN)).toBeLessThan(0.1);
    // Hip 43 in with no ease stays 43 in: a quarter of 10 3/4 in at the hem.
    expect(Math.abs(finished(state).hip - 43 * IN)).toBeLessThan(0.1);
  });

  it('keeps the last clean drawing while a value cannot be drafted, and names the field', () => {
    let state = workspaceInit(parts, {}, 1);
    const good = state.good;
    state = workspaceReduce(state, { type: 'set', key: 'frontNeckDepth', value: 10 * IN, now: 0 });
    expect(state.live.result.ok).toBe(false);
    if (!state.live.result.ok) expect(state.live.result.errors.map((e) => e.path)).toContain('params.frontNeckDepth');
    expect(state.good).toBe(good);
  });

  it('undoes a drag in one step and knows when the present differs from what is saved', () => {
    let state = workspaceInit(parts, { bustEase: -8 }, 3);
    for (let i = 1; i <= 10; i++) state = workspaceReduce(state, { type: 'set', key: 'bustEase', value: -8 - i, now: i * 16 });
    expect(paramsEqual(state.history.present, state.saved)).toBe(false);
    state = workspaceReduce(state, { type: 'undo' });
    expect(state.history.present).toEqual({ bustEase: -8 });
    expect(paramsEqual(state.history.present, state.saved)).toBe(true);
  });

  it('loads the server values over mine but lets undo bring mine back', () => {
    let state = workspaceInit(parts, { bustEase: -8 }, 3);
    state = workspaceReduce(state, { type: 'set', key: 'bustEase', value: -12, now: 0 });
    state = workspaceReduce(state, { type: 'load', parts, params: { bustEase: -6 }, version: 4, keepHistory: true, now: 10 });
    expect(state.history.present).toEqual({ bustEase: -6 });
    expect(state.version).toBe(4);
    state = workspaceReduce(state, { type: 'undo' });
    expect(state.history.present).toEqual({ bustEase: -12 });
  });
});
