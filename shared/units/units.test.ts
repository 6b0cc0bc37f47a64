import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { centimetresFormat, inchesFormat, lengthFormat } from './format';
import { lengthMmSchema } from './length-schema';
import { lengthParse } from './parse';
import { lengthFromMm, lengthToMm, MM_PER_INCH } from './units';

/** Conversions are exact up to floating-point rounding of one multiply. */
const FLOAT_MM = 1e-9;

describe('conversions', () => {
  it('takes 1 in as exactly 25.4 mm (NIST SP 811, appendix B: international inch)', () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(lengthToMm(1, 'in')).toBe(25.4);
  });

  it('converts a yard of 36 in to 914.4 mm (international yard of 1959 = 0.9144 m; NIST SP 811)', () => {
    expect(lengthToMm(36, 'in')).toBeCloseTo(914.4, 9);
  });

  it('converts centimetres and millimetres (SI)', () => {
    expect(lengthToMm(90.2, 'cm')).toBeCloseTo(902, 9);
    expect(lengthToMm(900, 'mm')).toBe(900);
  });

  it('round-trips mm → unit → mm', () => {
    for (const unit of ['in', 'cm', 'mm'] as const) {
      expect(Math.abs(lengthToMm(lengthFromMm(883.7, unit), unit) - 883.7)).toBeLessThan(FLOAT_MM);
    }
  });
});

describe('formatting', () => {
  it('shows inches as a mixed fraction to 1/8 in', () => {
    expect(lengthFormat(lengthToMm(35.5, 'in'), 'in')).toBe('35 1/2 in');
    expect(inchesFormat(lengthToMm(8.75, 'in'))).toBe('8 3/4');
    expect(inchesFormat(lengthToMm(0.375, 'in'))).toBe('3/8');
    expect(inchesFormat(lengthToMm(12, 'in'))).toBe('12');
  });

  it('rounds inches to the nearest 1/8 in', () => {
    // 35.06 in is nearer 35 than 35 1/8; 35.07 in is nearer 35 1/8 (35.0625 is half way).
    expect(inchesFormat(lengthToMm(35.06, 'in'))).toBe('35');
    expect(inchesFormat(lengthToMm(35.07, 'in'))).toBe('35 1/8');
    expect(inchesFormat(lengthToMm(35.99, 'in'))).toBe('36');
    expect(inchesFormat(lengthToMm(0.04, 'in'))).toBe('0');
  });

  it('shows centimetres to 1 mm', () => {
    expect(lengthFormat(902, 'cm')).toBe('90.2 cm');
    expect(lengthFormat(900, 'cm')).toBe('90 cm');
    expect(centimetresFormat(902.46)).toBe('90.2');
    expect(centimetresFormat(902.5)).toBe('90.3');
  });

  it('shows millimetres whole and can leave the unit off', () => {
    expect(lengthFormat(901.7, 'mm')).toBe('902 mm');
    expect(lengthFormat(901.7, 'in', { withUnit: false })).toBe('35 1/2');
  });

  it('shows negative lengths with their sign', () => {
    expect(lengthFormat(lengthToMm(-1.25, 'in'), 'in')).toBe('-1 1/4 in');
  });
});

describe('parsing', () => {
  const inches = (text: string) => lengthParse(text, 'in');

  it.each([
    ['35 1/2', 35.5, 'in'],
    ['35.5', 35.5, 'in'],
    ['35½', 35.5, 'in'],
    ['35 ½', 35.5, 'in'],
    ['35 1/2 in', 35.5, 'in'],
    ['35 1/2"', 35.5, 'in'],
    ['3/8', 0.375, 'in'],
    ['  36  ', 36, 'in'],
    ['90 cm', 90, 'cm'],
    ['90,5 cm', 90.5, 'cm'],
    ['900 mm', 900, 'mm'],
    ['900mm', 900, 'mm'],
  ])('reads %s with inches as the default unit', (text, value, unit) => {
    const result = inches(text);
    expect(result.ok).toBe(true);
    if (result.ok) {
      expect(result.value).toBeCloseTo(value, 12);
      expect(result.unit).toBe(unit);
    }
  });

  it('converts what it reads to mm (1 in = 25.4 mm, NIST SP 811)', () => {
    const result = inches('35 1/2');
    expect(result.ok && result.mm).toBeCloseTo(901.7, 9);
    const metric = lengthParse('90.2', 'cm');
    expect(metric.ok && metric.mm).toBeCloseTo(902, 9);
  });

  it.each([
    ['35 1/0', 'divides by zero'],
    ['abc', 'not a length'],
    ['-3', 'negative'],
    ['', 'enter a length'],
    ['   ', 'enter a length'],
    ['35 3/2', 'less than 1'],
    ['0', 'greater than zero'],
    ['cm', 'number before the unit'],
    ['35.5.5', 'not a length'],
  ])('refuses %j with a reason', (text, reason) => {
    const result = inches(text);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.reason).toContain(reason);
  });

  it('accepts zero when asked to', () => {
    expect(lengthParse('0', 'in', { allowZero: true })).toMatchObject({ ok: true, mm: 0 });
  });
});

describe('length schema', () => {
  const schema = z.object({ bust: lengthMmSchema('in') });

  it('turns a typed length or a number into mm', () => {
    expect(schema.parse({ bust: '35 1/2' }).bust).toBeCloseTo(901.7, 9);
    expect(schema.parse({ bust: '90 cm' }).bust).toBeCloseTo(900, 9);
    expect(schema.parse({ bust: 36 }).bust).toBeCloseTo(914.4, 9);
  });

  it('reports a bad value on its field with the reason', () => {
    const result = schema.safeParse({ bust: '35 1/0' });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path).toEqual(['bust']);
    expect(result.error?.issues[0]?.message).toContain('divides by zero');
    const negative = schema.safeParse({ bust: -3 });
    expect(negative.error?.issues[0]?.message).toContain('negative');
  });
});
