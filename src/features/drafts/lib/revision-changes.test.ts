import { describe, expect, it } from 'vitest';
import { changeText } from './revision-changes';

describe('revision changes in words', () => {
  it('writes a neckline change in inches to 1/8 in (1 in = 25.4 mm, NIST SP 811)', () => {
    expect(changeText({ field: 'params.frontNeckDepth', from: 152.4, to: 177.8 }, 'in')).toBe('Front neck depth 6 in → 7 in');
  });

  it('writes an ease change as percents and a value back to its default as "default"', () => {
    expect(changeText({ field: 'params.bustEase', from: -8, to: -10.5 }, 'cm')).toBe('Bust ease −8 % → −10.5 %');
    expect(changeText({ field: 'params.hipEase', from: 2, to: null }, 'cm')).toBe('Hip ease 2 % → default');
  });

  it('names a changed record without its id', () => {
    expect(changeText({ field: 'fabricId', from: 3, to: 4 }, 'in')).toBe('Fabric changed');
  });
});
