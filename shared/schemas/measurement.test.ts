import { describe, expect, it } from 'vitest';
import { lengthToMm } from '../units';
import {
  MEASUREMENT_FIELDS,
  MEASUREMENT_KEYS,
  TANK_REQUIRED_KEYS,
  measurementSetCreateSchema,
  measurementWarnings,
  type MeasurementValuesPartialMm,
} from './measurement';

const cm = (v: number) => lengthToMm(v, 'cm');
const inch = (v: number) => lengthToMm(v, 'in');
const codes = (values: MeasurementValuesPartialMm) => measurementWarnings(values).map((w) => `${w.field}:${w.code}`);

describe('MEASUREMENT_FIELDS', () => {
  it('lists every key once, in fitting order, with a label and a definition', () => {
    expect(MEASUREMENT_FIELDS.map((f) => f.key)).toEqual([...MEASUREMENT_KEYS]);
    for (const f of MEASUREMENT_FIELDS) {
      expect(f.label.length, f.key).toBeGreaterThan(3);
      expect(f.definition.length, f.key).toBeGreaterThan(20);
      expect(f.plausibleMm.min, f.key).toBeGreaterThan(f.limitMm.min);
      expect(f.plausibleMm.max, f.key).toBeLessThan(f.limitMm.max);
    }
  });

  it('requires exactly bust, hip and armhole depth for a tank top', () => {
    expect(MEASUREMENT_FIELDS.filter((f) => f.requiredForTank).map((f) => f.key)).toEqual([...TANK_REQUIRED_KEYS]);
  });

  it('defines bust girth as EN 13402-1 does: maximum horizontal girth, under the armpits, over the bust prominence', () => {
    const bust = MEASUREMENT_FIELDS.find((f) => f.key === 'bust');
    expect(bust?.definition).toMatch(/maximum horizontal girth/i);
    expect(bust?.definition).toMatch(/under the armpits/);
    expect(bust?.definition).toMatch(/bust prominence/);
    expect(bust?.source).toMatch(/EN 13402-1/);
  });

  it('finds every EN 13402-3 bust girth step (74–102 cm by 4, 107–131 cm by 6) plausible', () => {
    const steps = [74, 78, 82, 86, 90, 94, 98, 102, 107, 113, 119, 125, 131];
    for (const bust of steps) expect(codes({ bust: cm(bust) }), `${bust} cm`).toEqual([]);
  });
});

describe('measurementWarnings', () => {
  it('finds nothing wrong with the EN 13402-3 example body 88-72-96 cm and a 20 cm armhole', () => {
    // 88-72-96 cm: EN 13402-3 example; 20–23 cm armhole depth for a fitted tank top (common practice).
    expect(codes({ bust: cm(88), waist: cm(72), hip: cm(96), armholeDepth: cm(20) })).toEqual([]);
    expect(codes({ bust: cm(88), waist: cm(72), hip: cm(96), armholeDepth: cm(23) })).toEqual([]);
  });

  it('finds nothing wrong with the US misses sizes 10, 12 and 14 and an 8 in armhole', () => {
    // sewingscholar.blogspot.com, "Women's and men's pattern sizing": bust/waist/hip in inches.
    for (const [bust, waist, hip] of [
      [32.5, 25, 34.5],
      [34, 26.5, 36],
      [36, 28, 38],
    ] as const) {
      expect(codes({ bust: inch(bust), waist: inch(waist), hip: inch(hip), armholeDepth: inch(8) })).toEqual([]);
    }
  });

  it('warns when the hip is far smaller than the waist, not when they are equal', () => {
    expect(codes({ waist: cm(90), hip: cm(75) })).toContain('hip:hip-below-waist');
    expect(codes({ waist: cm(90), hip: cm(90) })).toEqual([]);
  });

  it('warns when the armhole depth does not suit the bust', () => {
    expect(codes({ bust: cm(88), armholeDepth: cm(13) })).toContain('armholeDepth:armhole-depth-for-bust');
    // A 20 cm armhole suits an 88 cm bust but not a 150 cm one (about 25.5 cm by the rule of thumb).
    expect(codes({ bust: cm(150), armholeDepth: cm(19) })).toEqual(['armholeDepth:armhole-depth-for-bust']);
    const high = measurementWarnings({ bust: cm(88), armholeDepth: cm(30) }, 'in');
    expect(high.map((w) => w.code)).toContain('armhole-depth-for-bust');
    expect(high.find((w) => w.code === 'armhole-depth-for-bust')?.message).toMatch(/11 3\/4 in is unusual for a bust girth of 34 5\/8 in/);
  });

  it('warns about an underbust not under the bust and a high bust far from it', () => {
    expect(codes({ bust: cm(88), underbust: cm(90) })).toEqual(['underbust:underbust-above-bust']);
    expect(codes({ bust: cm(88), highBust: cm(100) })).toEqual(['highBust:high-bust-far-from-bust']);
  });

  it('warns about a value outside the usual adult range, quoting it in the unit asked for', () => {
    const [warning] = measurementWarnings({ wrist: cm(25) }, 'cm');
    expect(warning).toEqual({ field: 'wrist', code: 'outside-usual-range', message: expect.stringMatching(/^Wrist girth 25 cm is outside the usual adult range \(13 cm to 20 cm\)/) });
  });
});

describe('measurementSetCreateSchema', () => {
  const base = { takenAt: '2026-03-14', unit: 'in' as const };

  it('reads every typed form of a length into mm', () => {
    // 1 in = 25.4 mm exactly (NIST SP 811).
    const parsed = measurementSetCreateSchema.parse({
      ...base,
      values: { bust: '35 1/2', hip: '35½', armholeDepth: 8.25, waist: '90 cm', underbust: '900 mm' },
    });
    expect(parsed.valuesMm).toEqual({ bust: 901.7, hip: 901.7, armholeDepth: 209.55, waist: 900, underbust: 900 });
  });

  it('refuses bad forms with the reason, naming the field', () => {
    const result = measurementSetCreateSchema.safeParse({ ...base, values: { bust: '35 1/0', hip: 'abc', armholeDepth: '-3' } });
    expect(result.success).toBe(false);
    const messages = Object.fromEntries(result.error?.issues.map((i) => [i.path.join('.'), i.message]) ?? []);
    expect(messages).toEqual({
      'values.bust': 'Bust girth: the fraction 1/0 divides by zero',
      'values.hip': expect.stringMatching(/^Hip girth: "abc" is not a length/),
      'values.armholeDepth': 'Armhole depth: a length cannot be negative',
    });
  });
});
