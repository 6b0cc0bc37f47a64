/**
 * The fold layout drawn to scale on the ticket: the folded fabric with its fold edge, the
 * pieces where the layout puts them (front and back stacked when cut together), and the
 * folded width and the length needed written beside it. Paper frame, mm, advanced API.
 */
import type { jsPDF } from 'jspdf';
import { lengthFormat, type LengthUnit } from '../../units';
import { textBox, textPlace } from '../layout/tiling-marks';
import type { Rect } from '../layout/tiling-types';
import type { Draft } from '../types';
import { INK, PENS, penSet, polylineAdd, rectAdd, textDraw } from './pdf-draw';

/** Scales a drawing may use, as 1 : N (common drafting scales). */
const NICE_SCALES = [2, 2.5, 4, 5, 8, 10, 12.5, 15, 20, 25, 40, 50, 100];
/** Fill of the folded fabric. */
const FABRIC_FILL = '#efefef';
/** Type size of the drawing's notes, pt. */
const NOTE_SIZE_PT = 7.5;
/** Room kept beside the drawing (fold note, length note) and under it (width, scale), mm. */
const NOTE_ROOM_MM = 6;
const NOTES_BELOW_MM = 9.5;

/** The largest common scale 1 : N at which a `width` × `height` mm drawing fits `box`. */
export function scaleChoose(width: number, height: number, box: { width: number; height: number }): number {
  const needed = Math.max(width / box.width, height / box.height);
  return NICE_SCALES.find((n) => n >= needed) ?? Math.ceil(needed);
}

/** Folded width of the fabric as laid for cutting, mm. */
export function foldedWidth(draft: Draft): number {
  const { layout } = draft;
  const layers = Math.max(1, layout.layers);
  const placed = Math.max(0, ...layout.placements.map((p) => p.x + p.width));
  return Math.max(placed, (layout.fabricWidth ?? layout.widthUsed) / layers);
}

function drawingScale(draft: Draft, box: Rect): number {
  return scaleChoose(foldedWidth(draft), Math.max(1, draft.layout.lengthNeeded), { width: box.width - 2 * NOTE_ROOM_MM, height: box.height - NOTES_BELOW_MM });
}

/** Height the fold layout drawing takes inside `box`, notes included, mm. */
export function foldLayoutHeight(draft: Draft, box: Rect): number {
  return Math.max(1, draft.layout.lengthNeeded) / drawingScale(draft, box) + NOTES_BELOW_MM;
}

/** Draws the fold layout inside `box`; returns the height used, mm. */
export function foldLayoutDraw(doc: jsPDF, draft: Draft, box: Rect, unit: LengthUnit): number {
  const { layout } = draft;
  const width = foldedWidth(draft);
  const length = Math.max(1, layout.lengthNeeded);
  const n = drawingScale(draft, box);
  const k = 1 / n;
  const origin = { x: box.x + NOTE_ROOM_MM, y: box.y };
  const fabric: Rect = { x: origin.x, y: origin.y, width: width * k, height: length * k };
  rectAdd(doc, fabric);
  doc.setFillColor(FABRIC_FILL);
  doc.fill();
  penSet(doc, PENS.hairline);
  rectAdd(doc, fabric);
  doc.stroke();
  // the fold edge: a heavier dashed line along x = 0
  penSet(doc, { widthMm: 0.6, color: INK, dashMm: [2, 1] });
  polylineAdd(doc, [{ x: fabric.x, y: fabric.y }, { x: fabric.x, y: fabric.y + fabric.height }], false);
  doc.stroke();
  const foldNote = textPlace('fold-note', 'fold', NOTE_SIZE_PT, { x: 0, y: 0 }, 90);
  textDraw(doc, { ...foldNote, at: { x: fabric.x - 1.2, y: fabric.y + fabric.height / 2 + foldNote.box.height / 2 } });

  for (const placement of layout.placements) {
    placement.pieceIds.forEach((id, index) => {
      const piece = draft.pieces.find((p) => p.id === id);
      if (!piece) return;
      const shift = { x: placement.x - piece.bounds.minX, y: placement.y - piece.bounds.minY };
      penSet(doc, index === 0 ? PENS.hairline : { widthMm: 0.2, color: INK, dashMm: [1.2, 0.8] });
      polylineAdd(doc, piece.cutting.polyline.map((p) => ({ x: origin.x + (p.x + shift.x) * k, y: origin.y + (p.y + shift.y) * k })), true);
      doc.stroke();
    });
    const names = placement.pieceIds.map((id) => draft.pieces.find((p) => p.id === id)?.name ?? id).join(' + ');
    const at = { x: origin.x + (placement.x + placement.width * 0.08) * k, y: origin.y + (placement.y + placement.height * 0.72) * k };
    textDraw(doc, textPlace('piece-line', names, NOTE_SIZE_PT, at));
    textDraw(doc, textPlace('piece-line', `${placement.layers} layers`, NOTE_SIZE_PT, { x: at.x, y: at.y + 3.2 }));
  }
  const widthNote = `folded width ${lengthFormat(width, unit)} (${lengthFormat(width * Math.max(1, layout.layers), unit)} open)`;
  const below = fabric.y + fabric.height + 3.5;
  textDraw(doc, textPlace('piece-line', widthNote, NOTE_SIZE_PT, { x: fabric.x, y: below }));
  const lengthNote = `length needed ${lengthFormat(layout.lengthNeeded, unit)}`;
  const lengthBox = textBox(lengthNote, NOTE_SIZE_PT, { x: 0, y: 0 }, 90);
  const beside = Math.min(box.x + box.width - 0.5, fabric.x + fabric.width + 3.5);
  textDraw(doc, textPlace('piece-line', lengthNote, NOTE_SIZE_PT, { x: beside, y: fabric.y + fabric.height / 2 + lengthBox.height / 2 }, 90));
  textDraw(doc, textPlace('piece-line', `scale 1:${n}`, NOTE_SIZE_PT, { x: fabric.x, y: below + 3.5 }));
  return foldLayoutHeight(draft, box);
}
