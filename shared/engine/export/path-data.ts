/**
 * SVG path data (SVG 1.1, section 8.3) for segments and polylines, in mm with absolute
 * M, L, C and Z commands and coordinates to 0.001 mm.
 */
import type { Point, Segment } from '../types';

/**
 * A coordinate in mm as text, to 0.001 mm, without trailing zeros or "-0". Built from whole
 * micrometres: converting integers to text is far cheaper than converting fractions, and the
 * engine writes thousands of coordinates per draft.
 */
export function coordinateFormat(value: number): string {
  const micrometres = Math.round(value * 1000);
  if (micrometres === 0) return '0';
  const negative = micrometres < 0;
  const magnitude = negative ? -micrometres : micrometres;
  const whole = Math.floor(magnitude / 1000);
  const fraction = magnitude - whole * 1000;
  let text = String(whole);
  if (fraction !== 0) {
    let digits = String(fraction);
    if (fraction < 10) digits = `00${digits}`;
    else if (fraction < 100) digits = `0${digits}`;
    let end = 3;
    while (digits.charCodeAt(end - 1) === 48) end--;
    text += `.${digits.slice(0, end)}`;
  }
  return negative ? `-${text}` : text;
}

function pair(p: Point): string {
  return `${coordinateFormat(p.x)} ${coordinateFormat(p.y)}`;
}

/**
 * Path data for a chain of segments: "M x y" then "L"/"C" commands; `close` appends "Z".
 * Each segment starts where the previous one ended.
 */
export function pathDataFromSegments(segments: readonly Segment[], close = false): string {
  const first = segments[0];
  if (!first) return '';
  const parts = [`M${pair(first.from)}`];
  for (const segment of segments) {
    if (segment.kind === 'line') parts.push(`L${pair(segment.to)}`);
    else parts.push(`C${pair(segment.c1)} ${pair(segment.c2)} ${pair(segment.to)}`);
  }
  if (close) parts.push('Z');
  return parts.join(' ');
}

/** Path data for a polyline; `close` appends "Z". */
export function pathDataFromPolyline(points: readonly Point[], close = false): string {
  const first = points[0];
  if (!first) return '';
  const parts = [`M${pair(first)}`];
  for (let i = 1; i < points.length; i++) parts.push(`L${pair(points[i] as Point)}`);
  if (close) parts.push('Z');
  return parts.join(' ');
}
