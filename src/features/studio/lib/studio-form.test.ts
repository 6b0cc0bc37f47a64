import { describe, expect, it } from 'vitest';
import type { StudioView } from '@shared/schemas/auth';
import { allowanceConvert, StudioFormSchema, studioFormValues, type StudioFormValues } from './studio-form';

const studio: StudioView = {
  id: 1,
  name: 'Fernhill Knit Studio',
  defaultUnit: 'in',
  defaultPaper: 'letter',
  seamAllowanceMm: 6.35,
  hemAllowanceMm: 12.7,
  bindingRatio: 0.85,
};

const base = (changes: Partial<StudioFormValues> = {}): StudioFormValues => ({ ...studioFormValues(studio), ...changes });

function issues(values: StudioFormValues): Record<string, string> {
  const result = StudioFormSchema.safeParse(values);
  if (result.success) return {};
  return Object.fromEntries(result.error.issues.map((i) => [i.path.join('.'), i.message]));
}

describe('the studio defaults form', () => {
  // 1 in = 25.4 mm exactly (NIST SP 811, appendix B); overlocked knit seams 1/4 in and hems
  // 1/2 in (trade.md, "Allowances": fashion-incubator.com; hems common practice).
  it('shows the stored allowances in the studio unit', () => {
    expect(base()).toMatchObject({ seamAllowance: '1/4', hemAllowance: '1/2', bindingRatio: '0.85' });
    const metric = studioFormValues({ ...studio, defaultUnit: 'cm', seamAllowanceMm: 10, hemAllowanceMm: 20 });
    expect(metric).toMatchObject({ seamAllowance: '1', hemAllowance: '2' });
  });

  it('reads typed lengths in the chosen unit and sends millimetres', () => {
    const out = StudioFormSchema.parse(base({ seamAllowance: '3/8', hemAllowance: '1' }));
    expect(out.seamAllowanceMm).toBeCloseTo(9.525, 9);
    expect(out.hemAllowanceMm).toBeCloseTo(25.4, 9);
    const metric = StudioFormSchema.parse(base({ defaultUnit: 'cm', seamAllowance: '1', hemAllowance: '25 mm' }));
    expect(metric.seamAllowanceMm).toBe(10);
    expect(metric.hemAllowanceMm).toBe(25);
  });

  it('names the field and states the limit in the studio unit', () => {
    expect(issues(base({ seamAllowance: '2' }))).toEqual({ seamAllowance: 'Seam allowance must be between 0 in and 1 in' });
    expect(issues(base({ defaultUnit: 'cm', hemAllowance: '6' }))).toEqual({ hemAllowance: 'Hem allowance must be between 0 cm and 5.1 cm' });
    expect(issues(base({ hemAllowance: 'half' }))).toHaveProperty('hemAllowance');
    expect(issues(base({ bindingRatio: '1.2' }))).toEqual({ bindingRatio: 'Binding ratio must be between 0.5 and 1' });
    expect(issues(base({ bindingRatio: '' }))).toEqual({ bindingRatio: 'Binding ratio must be a number such as 0.85' });
  });

  it('refuses an empty studio name with the route schema message', () => {
    expect(issues(base({ name: '   ' }))).toEqual({ name: 'Studio name is required' });
  });

  it('re-writes a length when the unit changes', () => {
    expect(allowanceConvert('1/4', 'in', 'cm')).toBe('0.6');
    expect(allowanceConvert('1', 'cm', 'in')).toBe('3/8');
    expect(allowanceConvert('not a length', 'in', 'cm')).toBe('not a length');
  });
});
