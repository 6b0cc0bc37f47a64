import { describe, expect, it } from 'vitest';
import { lengthParse } from '@shared/units';
import { fractionApply } from './fraction-keys';

describe('fractionApply', () => {
  it('adds the fraction to the whole inches typed', () => {
    expect(fractionApply('35', '½')).toBe('35½');
    expect(fractionApply(' 35 ', '⅛')).toBe('35⅛');
  });

  it('replaces a fraction or decimal already typed', () => {
    expect(fractionApply('35¼', '½')).toBe('35½');
    expect(fractionApply('35 1/4', '¾')).toBe('35¾');
    expect(fractionApply('35.2', '⅜')).toBe('35⅜');
  });

  it('keeps a tap on an empty or odd field', () => {
    expect(fractionApply('', '½')).toBe('½');
    expect(fractionApply('abc', '½')).toBe('abc½');
  });

  it('gives text the shared parser reads as the intended length (1 in = 25.4 mm, NIST SP 811)', () => {
    const parsed = lengthParse(fractionApply('35', '½'), 'in');
    expect(parsed.ok && parsed.mm).toBeCloseTo(901.7, 6);
  });
});
