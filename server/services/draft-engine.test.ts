import { describe, expect, it } from 'vitest';
import type { DraftInput } from '../../shared/schemas/draft-input.js';
import { computedCompare, draftCompute, DRAWING_MATCH, engineCheck } from './draft-engine.js';

// The engine's worked example body (issue 4, common practice), in inches.
const INPUT: DraftInput = {
  unit: 'in',
  measurements: { bust: 38, hip: 43, armholeDepth: 8.5 },
  fabric: { stretch: 40, recovery: 'good', width: 60 },
  style: 'tank',
  params: { bustEase: -8, frontNeckDepth: 6 },
};

function computed() {
  const result = draftCompute(INPUT);
  if (!result.ok) throw new Error(JSON.stringify(result.fields));
  return result.computed;
}

describe('engine check', () => {
  it('finds nothing between two runs of the same engine', () => {
    expect(computedCompare(computed(), computed())).toEqual([]);
    expect(engineCheck(INPUT, computed(), '0.0.1')).toMatchObject({ storedVersion: '0.0.1', drawsDifferently: false });
  });

  it('ignores moves below the drawing tolerance and wording, flags figures and warning codes', () => {
    const stored = computed();
    stored.finished.bust += DRAWING_MATCH / 2;
    stored.layout.steps = ['Reworded step'];
    expect(computedCompare(stored, computed())).toEqual([]);
    stored.finished.hip += 1;
    stored.warnings.push({ code: 'seam-mismatch', message: 'Front and back side seams differ' });
    const paths = computedCompare(stored, computed()).map((d) => d.path);
    expect(paths).toEqual(expect.arrayContaining(['finished.hip', 'warnings.length', 'warnings.0.code']));
  });

  it('names the fields an input the engine now refuses', () => {
    const result = draftCompute({ ...INPUT, params: { frontNeckDepth: 9.5 } });
    expect(result.ok).toBe(false);
    expect(!result.ok && Object.keys(result.fields)).toContain('params.frontNeckDepth');
  });
});
