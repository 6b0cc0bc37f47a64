/**
 * Paper for printing patterns: sheet sizes in mm and PDF points, margins and overlaps.
 * ANSI sizes (Letter 8.5 × 11 in, Legal 8.5 × 14 in, Tabloid 11 × 17 in) and ISO 216 sizes
 * (A4 210 × 297 mm, A3 297 × 420 mm, A0 841 × 1189 mm); 1 in = 25.4 mm (NIST SP 811) and
 * one PDF unit is 1/72 in (ISO 32000-1, 8.3.2.3).
 */
import { MM_PER_INCH } from '../../units/units';

/** PDF points in one millimetre: 72 / 25.4 (ISO 32000-1, 8.3.2.3). */
export const PT_PER_MM = 72 / MM_PER_INCH;

/** Converts a length in mm to PDF points. */
export function mmToPt(mm: number): number {
  return mm * PT_PER_MM;
}

/** Converts PDF points to mm. */
export function ptToMm(pt: number): number {
  return pt / PT_PER_MM;
}

/** Papers a home printer takes for tiled pages. */
export type TilePaperId = 'letter' | 'a4' | 'legal' | 'a3' | 'tabloid';
/** Wide media a copy shop prints the whole pattern on. */
export type SheetPaperId = 'roll36' | 'a0';
/** Any paper Knitwright prints on. */
export type PaperId = TilePaperId | SheetPaperId;

/** Every tiled paper, in menu order. */
export const TILE_PAPER_IDS: readonly TilePaperId[] = ['letter', 'a4', 'legal', 'a3', 'tabloid'];
/** Every wide medium, in menu order. */
export const SHEET_PAPER_IDS: readonly SheetPaperId[] = ['roll36', 'a0'];

/** A sheet of paper in portrait (width ≤ height), mm. A roll has no fixed height (null). */
export interface PaperSize {
  id: PaperId;
  name: string;
  standard: 'ANSI' | 'ISO 216' | 'roll';
  widthMm: number;
  heightMm: number | null;
}

const inch = (value: number): number => value * MM_PER_INCH;

/** Paper sizes in mm, portrait. ANSI in inches, ISO 216 in mm, the roll 36 in wide. */
export const PAPER_SIZES: Readonly<Record<PaperId, PaperSize>> = {
  letter: { id: 'letter', name: 'Letter', standard: 'ANSI', widthMm: inch(8.5), heightMm: inch(11) },
  legal: { id: 'legal', name: 'Legal', standard: 'ANSI', widthMm: inch(8.5), heightMm: inch(14) },
  tabloid: { id: 'tabloid', name: 'Tabloid', standard: 'ANSI', widthMm: inch(11), heightMm: inch(17) },
  a4: { id: 'a4', name: 'A4', standard: 'ISO 216', widthMm: 210, heightMm: 297 },
  a3: { id: 'a3', name: 'A3', standard: 'ISO 216', widthMm: 297, heightMm: 420 },
  a0: { id: 'a0', name: 'A0', standard: 'ISO 216', widthMm: 841, heightMm: 1189 },
  roll36: { id: 'roll36', name: '36 in roll', standard: 'roll', widthMm: inch(36), heightMm: null },
};

/**
 * The smallest margin Knitwright plans with: home printers cannot print closer than about
 * 1/4 in to the sheet's edge (common practice).
 */
export const MIN_MARGIN_MM = inch(0.25);
/** The default margin, mm: 3/8 in, a little inside the unprintable band (common practice). */
export const DEFAULT_MARGIN_MM = inch(0.375);
/** The smallest overlap between neighbouring tiles, mm (room for the match marks and tape). */
export const MIN_OVERLAP_MM = inch(0.25);
/** The largest overlap, mm. */
export const MAX_OVERLAP_MM = 50;
/** The default overlap between neighbouring tiles, mm (1/2 in; common practice). */
export const DEFAULT_OVERLAP_MM = inch(0.5);
/**
 * The longest sheet Knitwright lays out, mm: 200 in, the page size limit of common PDF
 * readers (ISO 32000-1, annex C, 14 400 units of 1/72 in).
 */
export const MAX_SHEET_LENGTH_MM = inch(200);

/** Orientation of a sheet. `auto` lets the tiling pick the one that needs fewer pages. */
export type Orientation = 'portrait' | 'landscape';
export type OrientationChoice = Orientation | 'auto';

/** Width and height of a fixed-size paper in the given orientation, mm. */
export function paperOriented(paper: PaperId, orientation: Orientation): { widthMm: number; heightMm: number } {
  const size = PAPER_SIZES[paper];
  if (size.heightMm === null) throw new Error(`paper: ${size.name} has no fixed height`);
  const short = Math.min(size.widthMm, size.heightMm);
  const long = Math.max(size.widthMm, size.heightMm);
  return orientation === 'portrait' ? { widthMm: short, heightMm: long } : { widthMm: long, heightMm: short };
}
