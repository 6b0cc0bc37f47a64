import { describe, expect, it } from 'vitest';
import { MEASUREMENT_FIELDS } from '@shared/schemas/measurement';
import { FIGURE_MARKS, FIGURE_VIEWBOX, figureOutline, markEnds, markPaths } from './body-figure';
import { smoothPathData } from './smooth-path';

describe('the body figure', () => {
  it('has a mark for every measurement the fitting asks for, and no stray marks', () => {
    const keys = MEASUREMENT_FIELDS.map((f) => f.key).sort();
    expect(Object.keys(FIGURE_MARKS).sort()).toEqual(keys);
  });

  it('draws a girth as a round-the-body ellipse and a length as a line along it', () => {
    for (const field of MEASUREMENT_FIELDS) {
      expect(FIGURE_MARKS[field.key]?.kind).toBe(field.kind);
    }
  });

  it('keeps every mark inside the drawing', () => {
    for (const mark of Object.values(FIGURE_MARKS)) {
      const points = mark.kind === 'girth' ? [[mark.cx - mark.rx, mark.cy], [mark.cx + mark.rx, mark.cy]] : mark.points;
      for (const [x, y] of points as [number, number][]) {
        expect(x).toBeGreaterThanOrEqual(0);
        expect(x).toBeLessThanOrEqual(FIGURE_VIEWBOX.width);
        expect(y).toBeGreaterThanOrEqual(0);
        expect(y).toBeLessThanOrEqual(FIGURE_VIEWBOX.height);
      }
    }
  });

  it('is symmetric about the centre front', () => {
    const outline = figureOutline();
    const mirrored = outline.map(([x, y]) => `${200 - x},${y}`).sort();
    expect(mirrored).toEqual(outline.map(([x, y]) => `${x},${y}`).sort());
  });

  it('draws a girth in two halves, one in front and one behind, and a length with two ends', () => {
    const bust = FIGURE_MARKS.bust;
    const shoulder = FIGURE_MARKS.shoulderLength;
    if (!bust || !shoulder) throw new Error('marks missing');
    expect(markPaths(bust).hidden).toBeDefined();
    expect(markEnds(bust)).toEqual([]);
    expect(markPaths(shoulder).hidden).toBeUndefined();
    expect(markEnds(shoulder)).toHaveLength(2);
  });
});

describe('smoothPathData', () => {
  it('passes through every point and closes when asked', () => {
    const d = smoothPathData(
      [
        [0, 0],
        [10, 0],
        [10, 10],
      ],
      true,
    );
    expect(d.startsWith('M0 0')).toBe(true);
    expect(d).toContain(' 10 0 C');
    expect(d).toContain(' 10 10 C');
    expect(d.endsWith('0 0 Z')).toBe(true);
  });

  it('draws a straight segment for two points', () => {
    expect(
      smoothPathData([
        [0, 0],
        [6, 0],
      ]),
    ).toBe('M0 0 C1 0 5 0 6 0');
  });
});
