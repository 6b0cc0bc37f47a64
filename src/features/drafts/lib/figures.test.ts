import { describe, expect, it } from 'vitest';
import { percentText, signedLength } from './figures';

describe('figures in the numbers panel', () => {
  it('states a worn-stretch ease: cut at 0.8 × body is 20 % negative ease (trade notes, arithmetic)', () => {
    const body = 965.2;
    const finished = 0.8 * body;
    expect(percentText(((finished - body) / body) * 100)).toBe('−20 %');
  });

  it('writes 3 in of negative ease on a 38 in bust as −3 in (worked example, common practice)', () => {
    expect(signedLength(35 * 25.4 - 38 * 25.4, 'in')).toBe('−3 in');
    expect(signedLength(12.7, 'in')).toBe('+1/2 in');
    expect(signedLength(0, 'cm')).toBe('0 cm');
  });
});
