/**
 * A true-size SVG drawing of a draft's pieces (SVG 1.1): width and height in mm, viewBox in
 * mm, so 1 user unit = 1 mm when printed at 100 %. Trade conventions (common practice): solid
 * cutting line, dashed stitching line, fold bracket with "place on fold", grainline arrow,
 * notches as short ticks, piece name and "cut N" on the piece; front and back told apart by
 * their label and a light tint.
 */
import { lengthFormat } from '../../units';
import type { Draft, MarkLine, Piece, Point } from '../types';
import { coordinateFormat as n, pathDataFromPolyline } from './path-data';

/** Options for {@link draftToSvg}. */
export interface SvgOptions {
  /** Ids of the pieces to draw, in order (default: every piece). */
  pieceIds?: string[];
  /** Margin around the drawing, mm (default 10). */
  margin?: number;
  /** Space between pieces drawn side by side, mm (default 20). */
  gap?: number;
  /** Draw a scale check square (2 in or 5 cm, in the draft's unit system; default true). */
  scaleSquare?: boolean;
  /** A title line above the pieces, e.g. the client and draft name. */
  title?: string;
}

const TINT: Record<Piece['side'], string> = { front: '#eef2f7', back: '#f5f0e6', other: '#f4f4f4' };
const INK = '#1f2328';
const FONT = "font-family=\"Inter, 'Helvetica Neue', Arial, sans-serif\"";

function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

function arrowHead(tip: Point, towards: Point, size: number): string {
  const dx = tip.x - towards.x;
  const dy = tip.y - towards.y;
  const length = Math.hypot(dx, dy) || 1;
  const ux = dx / length;
  const uy = dy / length;
  const left = { x: tip.x - ux * size - uy * size * 0.45, y: tip.y - uy * size + ux * size * 0.45 };
  const right = { x: tip.x - ux * size + uy * size * 0.45, y: tip.y - uy * size - ux * size * 0.45 };
  return `<path d="${pathDataFromPolyline([left, tip, right], true)}" fill="${INK}" stroke="none"/>`;
}

function grainlineSvg(grain: MarkLine): string {
  return [
    `<line x1="${n(grain.from.x)}" y1="${n(grain.from.y)}" x2="${n(grain.to.x)}" y2="${n(grain.to.y)}" stroke="${INK}" stroke-width="0.5"/>`,
    arrowHead(grain.from, grain.to, 5),
    arrowHead(grain.to, grain.from, 5),
  ].join('');
}

/** The fold bracket: a line inside the fold with its ends turned to the fold, arrows on it. */
function foldSvg(fold: MarkLine): string {
  const length = fold.to.y - fold.from.y;
  const top = fold.from.y + 0.2 * length;
  const bottom = fold.to.y - 0.2 * length;
  const reach = 12;
  const bracket = pathDataFromPolyline([
    { x: 0.6, y: top },
    { x: reach, y: top },
    { x: reach, y: bottom },
    { x: 0.6, y: bottom },
  ]);
  const middle = (top + bottom) / 2;
  return [
    `<path d="${bracket}" fill="none" stroke="${INK}" stroke-width="0.5"/>`,
    arrowHead({ x: 0.3, y: top }, { x: reach, y: top }, 4),
    arrowHead({ x: 0.3, y: bottom }, { x: reach, y: bottom }, 4),
    `<text x="${n(reach + 5)}" y="${n(middle)}" transform="rotate(-90 ${n(reach + 5)} ${n(middle)})" text-anchor="middle" font-size="5" ${FONT} fill="${INK}">place on fold</text>`,
  ].join('');
}

function pieceSvg(piece: Piece, offset: Point): string {
  const parts: string[] = [`<g id="piece-${escapeXml(piece.id)}" transform="translate(${n(offset.x)} ${n(offset.y)})">`];
  parts.push(`<path d="${piece.cutting.d}" fill="${TINT[piece.side]}" stroke="${INK}" stroke-width="0.6" stroke-linejoin="round"/>`);
  parts.push(`<path d="${piece.stitching.d}" fill="none" stroke="${INK}" stroke-width="0.3" stroke-dasharray="3 2"/>`);
  for (const notch of piece.notches) {
    const end = { x: notch.at.x + notch.inward.x * notch.depth, y: notch.at.y + notch.inward.y * notch.depth };
    parts.push(`<line x1="${n(notch.at.x)}" y1="${n(notch.at.y)}" x2="${n(end.x)}" y2="${n(end.y)}" stroke="${INK}" stroke-width="0.6"/>`);
  }
  if (piece.fold) parts.push(foldSvg(piece.fold));
  parts.push(grainlineSvg(piece.grainline));
  const { at, title, lines } = piece.label;
  parts.push(`<text x="${n(at.x)}" y="${n(at.y)}" font-size="10" font-weight="600" ${FONT} fill="${INK}">${escapeXml(title.toUpperCase())}</text>`);
  lines.forEach((line, i) => {
    parts.push(`<text x="${n(at.x)}" y="${n(at.y + 8 + i * 7)}" font-size="5.5" ${FONT} fill="${INK}">${escapeXml(line)}</text>`);
  });
  parts.push('</g>');
  return parts.join('');
}

function scaleSquareSvg(draft: Draft, at: Point): { svg: string; size: number } {
  const size = draft.unit === 'in' ? 50.8 : 50;
  const label = `${lengthFormat(size, draft.unit === 'in' ? 'in' : 'cm')} square: check the scale`;
  return {
    size,
    svg: `<g id="scale-square"><rect x="${n(at.x)}" y="${n(at.y)}" width="${n(size)}" height="${n(size)}" fill="none" stroke="${INK}" stroke-width="0.4"/><text x="${n(at.x + size + 4)}" y="${n(at.y + size / 2)}" font-size="4.5" ${FONT} fill="${INK}">${escapeXml(label)}</text></g>`,
  };
}

/** A true-size SVG document of a draft's pieces, laid side by side; lengths in mm. */
export function draftToSvg(draft: Draft, options: SvgOptions = {}): string {
  const margin = options.margin ?? 10;
  const gap = options.gap ?? 20;
  const wanted = options.pieceIds;
  const pieces = wanted ? draft.pieces.filter((p) => wanted.includes(p.id)) : draft.pieces;
  const body: string[] = [];
  let top = margin;
  if (options.title) {
    body.push(`<text x="${n(margin)}" y="${n(margin + 7)}" font-size="7" font-weight="600" ${FONT} fill="${INK}">${escapeXml(options.title)}</text>`);
    top += 14;
  }
  let x = margin;
  let tallest = 0;
  for (const piece of pieces) {
    body.push(pieceSvg(piece, { x: x - piece.bounds.minX, y: top - piece.bounds.minY }));
    x += piece.bounds.width + gap;
    tallest = Math.max(tallest, piece.bounds.height);
  }
  let width = Math.max(x - gap + margin, 2 * margin);
  let height = top + tallest + margin;
  if (options.scaleSquare ?? true) {
    const square = scaleSquareSvg(draft, { x: margin, y: height });
    body.push(square.svg);
    height += square.size + margin;
    width = Math.max(width, margin + square.size + 80);
  }
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${n(width)}mm" height="${n(height)}mm" viewBox="0 0 ${n(width)} ${n(height)}">`,
    `<rect width="100%" height="100%" fill="#ffffff"/>`,
    ...body,
    '</svg>',
  ].join('\n');
}
