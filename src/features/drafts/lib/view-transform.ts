/**
 * The pattern canvas's view: a uniform scale (screen px per mm) and an offset (px). A point of
 * the pattern in mm lands on screen at `p × scale + offset`.
 */

export interface View {
  scale: number;
  x: number;
  y: number;
}

export interface Rect {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export interface Size {
  width: number;
  height: number;
}

/** Closest and farthest zoom, px per mm: a whole dress on a phone to a notch filling the screen. */
export const SCALE_MIN = 0.1;
export const SCALE_MAX = 40;

function clampScale(scale: number): number {
  return Math.min(SCALE_MAX, Math.max(SCALE_MIN, scale));
}

/** The view that shows all of `content` (mm) centred in `viewport` (px) with `padding` px around it. */
export function viewFit(content: Rect, viewport: Size, padding = 24): View {
  const w = Math.max(1, content.maxX - content.minX);
  const h = Math.max(1, content.maxY - content.minY);
  const availableW = Math.max(1, viewport.width - 2 * padding);
  const availableH = Math.max(1, viewport.height - 2 * padding);
  const scale = clampScale(Math.min(availableW / w, availableH / h));
  return {
    scale,
    x: (viewport.width - w * scale) / 2 - content.minX * scale,
    y: (viewport.height - h * scale) / 2 - content.minY * scale,
  };
}

/** Zooms by `factor` about the screen point `at` (px), which keeps showing the same pattern point. */
export function viewZoomAt(view: View, factor: number, at: { x: number; y: number }): View {
  const scale = clampScale(view.scale * factor);
  const applied = scale / view.scale;
  return { scale, x: at.x - (at.x - view.x) * applied, y: at.y - (at.y - view.y) * applied };
}

/** Moves the view by (dx, dy) screen px. */
export function viewPan(view: View, dx: number, dy: number): View {
  return { scale: view.scale, x: view.x + dx, y: view.y + dy };
}

/** A pattern point (mm) on screen (px). */
export function viewToScreen(view: View, p: { x: number; y: number }): { x: number; y: number } {
  return { x: p.x * view.scale + view.x, y: p.y * view.scale + view.y };
}

/** A screen point (px) on the pattern (mm). */
export function viewToPattern(view: View, p: { x: number; y: number }): { x: number; y: number } {
  return { x: (p.x - view.x) / view.scale, y: (p.y - view.y) / view.scale };
}

/** The pattern rectangle (mm) visible in `viewport`. */
export function viewVisible(view: View, viewport: Size): Rect {
  const a = viewToPattern(view, { x: 0, y: 0 });
  const b = viewToPattern(view, { x: viewport.width, y: viewport.height });
  return { minX: a.x, minY: a.y, maxX: b.x, maxY: b.y };
}
