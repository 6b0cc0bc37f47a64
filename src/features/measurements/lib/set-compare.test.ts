import { describe, expect, it } from 'vitest';
import { changedCount, fieldsTaken, deltaFormat, deltaSpoken, deltaVisible, setDifferences, valueFormat } from './set-compare';

// 1 in = 25.4 mm exactly (NIST SP 811, appendix B).
const IN = 25.4;

describe('deltaFormat', () => {
  it('writes half an inch more as "+1/2 in" and 13 mm less as "−1.3 cm"', () => {
    expect(deltaFormat(IN / 2, 'in')).toBe('+1/2 in');
    expect(deltaFormat(-13, 'cm')).toBe('−1.3 cm');
    expect(deltaFormat(IN * 1.25, 'in')).toBe('+1 1/4 in');
  });

  it('shows a difference below half of 1/8 in as no change in inches but as 0.1 cm in centimetres', () => {
    // 1/8 in = 3.175 mm; 1.5 mm rounds to 0 eighths but to 2 mm.
    expect(deltaVisible(1.5, 'in')).toBe(false);
    expect(deltaFormat(1.5, 'in')).toBe('0 in');
    expect(deltaVisible(1.5, 'cm')).toBe(true);
    expect(deltaFormat(1.5, 'cm')).toBe('+0.2 cm');
  });

  it('says the direction in words for screen readers', () => {
    expect(deltaSpoken(IN / 4, 'in')).toBe('up 1/4 in');
    expect(deltaSpoken(-20, 'cm')).toBe('down 2 cm');
    expect(deltaSpoken(0.2, 'cm')).toBe('no change');
  });
});

describe('setDifferences', () => {
  // EN 13402-3 example body 88-72-96 cm, re-measured at a later fitting.
  const before = { bust: 880, waist: 720, hip: 960, armholeDepth: 195 };
  const after = { bust: 901.7, waist: 720.4, hip: 960, armholeDepth: 195, wrist: 155 };

  it('marks only the differences that show once rounded to the unit', () => {
    const rows = setDifferences(after, before, 'cm');
    const bust = rows.find((r) => r.field.key === 'bust');
    const waist = rows.find((r) => r.field.key === 'waist');
    const wrist = rows.find((r) => r.field.key === 'wrist');
    expect(bust?.deltaMm).toBeCloseTo(21.7, 9);
    expect(bust?.changed).toBe(true);
    expect(waist?.changed).toBe(false); // 0.4 mm rounds to 0 mm
    expect(wrist?.deltaMm).toBeUndefined(); // not taken before
    expect(changedCount(rows)).toBe(1);
  });

  it('lists every measurement in fitting order, with nothing changed when there is no previous set', () => {
    const rows = setDifferences(after, undefined, 'in');
    expect(rows).toHaveLength(16);
    expect(rows[0]?.field.key).toBe('bust');
    expect(changedCount(rows)).toBe(0);
  });

  it('shows a value not taken as a dash', () => {
    expect(valueFormat(undefined, 'in')).toBe('—');
    expect(valueFormat(901.7, 'in')).toBe('35 1/2 in');
  });
});

describe('fieldsTaken', () => {
  it('keeps the required measurements and those taken in any set, in fitting order', () => {
    const keys = fieldsTaken([{ wrist: 150 }, { waist: 700, bust: 900 }]).map((f) => f.key);
    expect(keys).toEqual(['bust', 'waist', 'hip', 'armholeDepth', 'wrist']);
  });
});
