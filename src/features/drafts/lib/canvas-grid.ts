/**
 * The canvas grid in the studio's unit: 1 in squares with a heavier line every 6 in, or 1 cm
 * squares with a heavier line every 10 cm, anchored at the fold and the shoulder line so a
 * reading off the grid is a distance from them.
 */
import { lengthToMm, type LengthUnit } from '@shared/units';
import { viewVisible, type Size, type View } from './view-transform';

export interface GridSpec {
  /** Minor spacing, mm, and every how many minor lines a major one falls. */
  minorMm: number;
  majorEvery: number;
  /** What one minor square is, for the legend ("1 in"). */
  label: string;
}

export function gridSpec(unit: LengthUnit): GridSpec {
  if (unit === 'in') return { minorMm: lengthToMm(1, 'in'), majorEvery: 6, label: '1 in' };
  return { minorMm: 10, majorEvery: 10, label: '1 cm' };
}

/** Minor lines closer than this on screen are left out (they would only grey the canvas). */
export const GRID_MIN_SPACING_PX = 6;

export interface GridPaths {
  minor: string;
  major: string;
}

/** Path data (screen px) for the grid lines visible in `viewport`. */
export function gridPaths(view: View, viewport: Size, spec: GridSpec): GridPaths {
  const visible = viewVisible(view, viewport);
  const minorPx = spec.minorMm * view.scale;
  const showMinor = minorPx >= GRID_MIN_SPACING_PX;
  const step = showMinor ? spec.minorMm : spec.minorMm * spec.majorEvery;
  const minor: string[] = [];
  const major: string[] = [];
  const crisp = (v: number) => Math.round(v) + 0.5;
  const first = Math.floor(visible.minX / step);
  const last = Math.ceil(visible.maxX / step);
  for (let i = first; i <= last; i++) {
    const x = crisp(i * step * view.scale + view.x);
    const index = showMinor ? i : i * spec.majorEvery;
    (index % spec.majorEvery === 0 ? major : minor).push(`M${x} 0V${viewport.height}`);
  }
  const firstY = Math.floor(visible.minY / step);
  const lastY = Math.ceil(visible.maxY / step);
  for (let j = firstY; j <= lastY; j++) {
    const y = crisp(j * step * view.scale + view.y);
    const index = showMinor ? j : j * spec.majorEvery;
    (index % spec.majorEvery === 0 ? major : minor).push(`M0 ${y}H${viewport.width}`);
  }
  return { minor: minor.join(''), major: major.join('') };
}
