import { describe, expect, it } from 'vitest';
import { viewFit, viewPan, viewToPattern, viewToScreen, viewZoomAt, SCALE_MAX } from './view-transform';

/** Sub-pixel: what the eye cannot tell apart on screen. */
const PIXEL_TOLERANCE = 1e-6;

describe('the canvas view', () => {
  it('fits the pattern inside the viewport, centred, keeping its proportions', () => {
    const view = viewFit({ minX: 0, minY: 0, maxX: 300, maxY: 600 }, { width: 800, height: 648 }, 24);
    // 600 mm tall into 600 px: 1 px per mm; 300 mm wide centred in 800 px.
    expect(view.scale).toBeCloseTo(1, 9);
    expect(viewToScreen(view, { x: 0, y: 0 })).toEqual({ x: 250, y: 24 });
    expect(viewToScreen(view, { x: 300, y: 600 })).toEqual({ x: 550, y: 624 });
  });

  it('keeps the pattern point under the pointer still while zooming', () => {
    const view = { scale: 1.5, x: 40, y: -20 };
    const at = { x: 321, y: 123 };
    const before = viewToPattern(view, at);
    const zoomed = viewZoomAt(view, 1.8, at);
    const after = viewToPattern(zoomed, at);
    expect(Math.abs(after.x - before.x)).toBeLessThan(PIXEL_TOLERANCE);
    expect(Math.abs(after.y - before.y)).toBeLessThan(PIXEL_TOLERANCE);
    expect(zoomed.scale).toBeCloseTo(2.7, 9);
  });

  it('stops zooming in at the closest zoom', () => {
    const zoomed = viewZoomAt({ scale: 30, x: 0, y: 0 }, 10, { x: 0, y: 0 });
    expect(zoomed.scale).toBe(SCALE_MAX);
  });

  it('pans by screen pixels whatever the zoom', () => {
    expect(viewPan({ scale: 3, x: 10, y: 10 }, 5, -7)).toEqual({ scale: 3, x: 15, y: 3 });
  });
});
