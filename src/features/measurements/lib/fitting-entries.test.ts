import { describe, expect, it } from 'vitest';
import { entriesConvert, entriesFromMm, entriesRead, fittingPayload, requiredMissing, swipeDirection, SWIPE_MIN_PX, todayIso } from './fitting-entries';

// 1 in = 25.4 mm exactly (NIST SP 811, appendix B): 35 1/2 in = 901.7 mm.
const BUST_MM = 901.7;

describe('entriesRead', () => {
  it('reads every accepted form of 35 1/2 in (or 90 cm) into mm', () => {
    const read = (text: string) => entriesRead({ bust: text }, 'in').valuesMm.bust;
    expect(read('35 1/2')).toBeCloseTo(BUST_MM, 2);
    expect(read('35.5')).toBeCloseTo(BUST_MM, 2);
    expect(read('35½')).toBeCloseTo(BUST_MM, 2);
    expect(read('90 cm')).toBeCloseTo(900, 2);
    expect(read('900 mm')).toBeCloseTo(900, 2);
  });

  it('names the field for text that is not a length', () => {
    const { errors, valuesMm } = entriesRead({ bust: '35 1/0', hip: 'abc', waist: '-3' }, 'in');
    expect(errors.bust).toMatch(/^Bust girth: .*divides by zero/);
    expect(errors.hip).toMatch(/^Hip girth: /);
    expect(errors.waist).toMatch(/^Waist girth: .*negative/);
    expect(valuesMm).toEqual({});
  });

  it('refuses a bust of 5 in as a typing slip, quoting the range in inches', () => {
    expect(entriesRead({ bust: '5' }, 'in').errors.bust).toMatch(/^Bust girth must be between .* in and .* in$/);
  });

  it('leaves blank fields out', () => {
    expect(entriesRead({ bust: '  ', hip: '' }, 'cm')).toEqual({ valuesMm: {}, errors: {} });
  });
});

describe('switching unit mid-fitting', () => {
  it('re-writes 36 1/2 in as 92.7 cm and back, keeping text that is not a length', () => {
    const cm = entriesConvert({ bust: '36 1/2', hip: '40 in?' }, 'in', 'cm');
    expect(cm.bust).toBe('92.7');
    expect(cm.hip).toBe('40 in?');
    expect(entriesConvert({ bust: '92.7' }, 'cm', 'in').bust).toBe('36 1/2');
  });

  it('writes stored values in the unit on screen', () => {
    expect(entriesFromMm({ bust: BUST_MM, hip: 1000 }, 'in')).toEqual({ bust: '35 1/2', hip: '39 3/8' });
    expect(entriesFromMm({ bust: BUST_MM }, 'cm')).toEqual({ bust: '90.2' });
  });
});

describe('fittingPayload', () => {
  it('sends the texts as typed with the unit on screen, leaving blanks and empty notes out', () => {
    expect(fittingPayload({ bust: ' 36 1/2 ', hip: '', armholeDepth: '8' }, 'in', '2026-03-14', '  ')).toEqual({
      takenAt: '2026-03-14',
      unit: 'in',
      values: { bust: '36 1/2', armholeDepth: '8' },
      notes: null,
    });
  });

  it('sends a corrected set’s untouched values back exactly, in mm', () => {
    const original = { bust: 922.02, hip: 1016 };
    // 922.02 mm shows as 36 1/4 in; only the hip is re-typed.
    const payload = fittingPayload({ bust: '36 1/4', hip: '40 1/2' }, 'in', '2026-03-14', 'pinned', original);
    expect(payload.values).toEqual({ bust: '922.02 mm', hip: '40 1/2' });
    expect(payload.notes).toBe('pinned');
  });
});

describe('fitting helpers', () => {
  it('lists the tank top’s required measurements still missing', () => {
    expect(requiredMissing({ bust: '36' })).toEqual(['hip', 'armholeDepth']);
    expect(requiredMissing({ bust: '36', hip: '40', armholeDepth: '8' })).toEqual([]);
  });

  it('takes a clear sideways swipe to the left as next and to the right as previous', () => {
    expect(swipeDirection(-SWIPE_MIN_PX - 1, 5)).toBe('next');
    expect(swipeDirection(SWIPE_MIN_PX + 1, -5)).toBe('previous');
    expect(swipeDirection(-(SWIPE_MIN_PX - 1), 0)).toBeNull(); // too short
    expect(swipeDirection(-100, 90)).toBeNull(); // mostly vertical: a scroll
  });

  it('dates the fitting in the device’s own day', () => {
    expect(todayIso(new Date(2026, 2, 4, 23, 30))).toBe('2026-03-04');
  });
});
