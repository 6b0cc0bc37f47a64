import { describe, expect, it } from 'vitest';
import { percentFormat, stretchTestRead } from './stretch-test';

describe('stretchTestRead', () => {
  it('gives 50 % for a 10 cm mark pulled to 15 cm and 25 % for 4 in pulled to 5 in', () => {
    // Worked examples: thesewingdirectory.co.uk "What is stretch?"; blog.fabric.com "How to
    // measure stretch of knit fabric" (trade.md, "Stretch test").
    const cm = stretchTestRead('10', '15', 'cm');
    const inches = stretchTestRead('4', '5', 'in');
    expect(cm.ok && cm.percent).toBeCloseTo(50, 9);
    expect(inches.ok && inches.percent).toBeCloseTo(25, 9);
  });

  it('reads each length in its own unit when one is typed (4 in = 101.6 mm, NIST SP 811)', () => {
    const mixed = stretchTestRead('4 in', '127 mm', 'cm');
    expect(mixed.ok && mixed.percent).toBeCloseTo(25, 9);
    const fraction = stretchTestRead('4', '5 1/2', 'in');
    expect(fraction.ok && fraction.percent).toBeCloseTo(37.5, 9);
  });

  it('names the field that is wrong', () => {
    const shorter = stretchTestRead('10', '9', 'cm');
    expect(shorter).toEqual({ ok: false, errors: { stretched: 'Stretched length cannot be shorter than the relaxed length' } });
    const bad = stretchTestRead('abc', '', 'cm');
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(bad.errors.relaxed).toMatch(/^Relaxed length: /);
      expect(bad.errors.stretched).toMatch(/^Stretched length: enter a length/);
    }
  });

  it('shows percent to 0.1 %', () => {
    expect(percentFormat(33.3333)).toBe('33.3');
    expect(percentFormat(50)).toBe('50');
  });
});
