import { describe, expect, it } from 'vitest';
import { gridPaths, gridSpec } from './canvas-grid';

describe('the canvas grid', () => {
  it('spaces inch squares 25.4 mm apart (1 in = 25.4 mm, NIST SP 811)', () => {
    expect(gridSpec('in').minorMm).toBe(25.4);
    expect(gridSpec('cm').minorMm).toBe(10);
  });

  it('draws a line through the fold and the shoulder line, and a major line every 10 cm', () => {
    // 2 px per mm, origin at (100, 50): the fold is x = 100, the shoulder line y = 50.
    const paths = gridPaths({ scale: 2, x: 100, y: 50 }, { width: 400, height: 300 }, gridSpec('cm'));
    expect(paths.major).toContain('M100.5 0V300');
    expect(paths.major).toContain('M0 50.5H400');
    // 10 cm to the right of the fold: 100 mm × 2 px = 200 px.
    expect(paths.major).toContain('M300.5 0V300');
    // 1 cm to the right: a minor line.
    expect(paths.minor).toContain('M120.5 0V300');
  });

  it('leaves out minor lines when zoomed too far out to tell them apart', () => {
    const paths = gridPaths({ scale: 0.2, x: 0, y: 0 }, { width: 400, height: 300 }, gridSpec('cm'));
    expect(paths.minor).toBe('');
    expect(paths.major).not.toBe('');
  });
});
