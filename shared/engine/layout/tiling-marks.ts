/**
 * The marks on a tile's edges: trim lines, join lines, match marks and the notes naming the
 * neighbour. Pages are trimmed at their left and top edges and laid over the neighbour's
 * overlap strip; the trim and join lines run along the middle of the overlap strip, so both
 * pages print each match mark at the same place of the pattern and its halves meet after
 * trimming (common practice for tiled patterns). Paper frame, mm.
 */
import type { Point } from '../types';
import { PT_PER_MM } from './tiling-paper';
import type { MatchMark, PlacedText, Rect, SheetEdge, TileGuide } from './tiling-types';

/** Largest half-diagonal of a match-mark diamond, mm. */
export const MATCH_MARK_HALF_MM = 4;
/** Room between a diamond's tip and the printable edge, mm. */
const MARK_CLEARANCE_MM = 1;
/** About one match-mark pair per this length of edge, mm. */
const MARK_SPACING_MM = 180;
/** Type size of the notes in the overlap strips, pt. */
export const EDGE_NOTE_SIZE_PT = 7;

/** Average advance of a Helvetica glyph as a fraction of the type size (estimate, generous). */
const GLYPH_ADVANCE_EM = 0.6;
/** Ascent and descent of Helvetica as fractions of the type size (font metrics, rounded up). */
const ASCENT_EM = 0.75;
const DESCENT_EM = 0.22;

/** Height of the ascent of Helvetica at `sizePt`, mm: from the top of a text box to its baseline. */
export function textAscentMm(sizePt: number): number {
  return (ASCENT_EM * sizePt) / PT_PER_MM;
}

/** The room a line of Helvetica text takes, mm, from its baseline-left point and rotation. */
export function textBox(text: string, sizePt: number, at: Point, rotation: 0 | 90): Rect {
  const em = sizePt / PT_PER_MM;
  const length = text.length * GLYPH_ADVANCE_EM * em;
  if (rotation === 0) return { x: at.x, y: at.y - ASCENT_EM * em, width: length, height: (ASCENT_EM + DESCENT_EM) * em };
  // turned counter-clockwise: the text runs upwards from `at`, its ascent lies to the left
  return { x: at.x - ASCENT_EM * em, y: at.y - length, width: (ASCENT_EM + DESCENT_EM) * em, height: length };
}

/** A line of text placed with its box. */
export function textPlace(role: PlacedText['role'], text: string, sizePt: number, at: Point, rotation: 0 | 90 = 0): PlacedText {
  return { role, text, at, sizePt, rotation, box: textBox(text, sizePt, at, rotation) };
}

/** Half-diagonal of the match marks for an overlap, mm: they must fit in half the strip. */
export function matchMarkHalf(overlapMm: number): number {
  return Math.min(MATCH_MARK_HALF_MM, overlapMm / 2 - MARK_CLEARANCE_MM);
}

/**
 * Positions of the match marks along an edge shared by two tiles, as distances from the
 * start of the printable edge, mm. The corners (one overlap deep) are left free because
 * there a third page overlaps. An even number of marks leaves the middle for the note.
 */
export function matchMarkOffsets(edgeLength: number, overlapMm: number): number[] {
  const span = edgeLength - 2 * overlapMm;
  const count = 2 * Math.max(1, Math.round(span / MARK_SPACING_MM / 2));
  const offsets: number[] = [];
  for (let i = 0; i < count; i++) offsets.push(overlapMm + ((i + 0.5) * span) / count);
  return offsets;
}

/** What is printed on each side of a tile whose neighbours are known. */
export interface EdgeMarks {
  guides: TileGuide[];
  marks: MatchMark[];
  texts: PlacedText[];
}

/**
 * Trim and join lines, match marks and notes for a tile with printable area `printable`
 * and the labels of its printed neighbours. Left and top neighbours: this page is trimmed
 * and laid over them. Right and bottom neighbours: they are laid over this page.
 */
export function edgeMarks(printable: Rect, overlapMm: number, neighbours: Partial<Record<SheetEdge, string>>): EdgeMarks {
  const half = overlapMm / 2;
  const markHalf = matchMarkHalf(overlapMm);
  const left = printable.x;
  const top = printable.y;
  const right = printable.x + printable.width;
  const bottom = printable.y + printable.height;
  const result: EdgeMarks = { guides: [], marks: [], texts: [] };
  const noteEm = EDGE_NOTE_SIZE_PT / PT_PER_MM;

  const vertical = (edge: 'left' | 'right', neighbour: string): void => {
    const x = edge === 'left' ? left + half : right - half;
    result.guides.push({ kind: edge === 'left' ? 'trim' : 'join', edge, from: { x, y: top }, to: { x, y: bottom }, neighbour });
    for (const offset of matchMarkOffsets(printable.height, overlapMm)) {
      result.marks.push({ edge, centre: { x, y: top + offset }, halfSize: markHalf, neighbour });
    }
    const text = edge === 'left' ? `trim, lay over ${neighbour}` : `${neighbour} laps here`;
    const length = textBox(text, EDGE_NOTE_SIZE_PT, { x: 0, y: 0 }, 90).height;
    // in the strip that is cut away (left) or covered (right), reading upwards
    const baselineX = edge === 'left' ? left + half / 2 + (ASCENT_EM * noteEm) / 2 : right - half / 2 + (ASCENT_EM * noteEm) / 2;
    const at = { x: baselineX, y: top + printable.height / 2 + length / 2 };
    result.texts.push(textPlace(edge === 'left' ? 'trim-note' : 'join-note', text, EDGE_NOTE_SIZE_PT, at, 90));
  };

  const horizontal = (edge: 'top' | 'bottom', neighbour: string): void => {
    const y = edge === 'top' ? top + half : bottom - half;
    result.guides.push({ kind: edge === 'top' ? 'trim' : 'join', edge, from: { x: left, y }, to: { x: right, y }, neighbour });
    for (const offset of matchMarkOffsets(printable.width, overlapMm)) {
      result.marks.push({ edge, centre: { x: left + offset, y }, halfSize: markHalf, neighbour });
    }
    const text = edge === 'top' ? `trim, lay over ${neighbour}` : `${neighbour} laps here`;
    const length = textBox(text, EDGE_NOTE_SIZE_PT, { x: 0, y: 0 }, 0).width;
    const baselineY = edge === 'top' ? top + half / 2 + (ASCENT_EM * noteEm) / 2 : bottom - half / 2 + (ASCENT_EM * noteEm) / 2;
    const at = { x: left + printable.width / 2 - length / 2, y: baselineY };
    result.texts.push(textPlace(edge === 'top' ? 'trim-note' : 'join-note', text, EDGE_NOTE_SIZE_PT, at, 0));
  };

  if (neighbours.left) vertical('left', neighbours.left);
  if (neighbours.right) vertical('right', neighbours.right);
  if (neighbours.top) horizontal('top', neighbours.top);
  if (neighbours.bottom) horizontal('bottom', neighbours.bottom);
  return result;
}
