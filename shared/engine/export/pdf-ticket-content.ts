/**
 * The words and figures of the cutter's ticket, in the studio's unit: fabric and stretch,
 * pieces and cut counts, fold and cut steps, binding strips, finished measurements,
 * allowances, finishing steps in order, and the safety cautions of trade.md (rotary cutter,
 * overlocker, steam iron, sealing synthetic tape with a flame), deferring to local rules.
 */
import { lengthFormat, type LengthUnit } from '../../units';
import { styleFind } from '../drafting/styles';
import type { Binding, Draft, EdgeName, Piece } from '../types';
import type { PdfMeta } from './pdf-options';

/** A block of the ticket: label–value rows, or numbered or plain lines. */
export interface TicketSection {
  heading: string;
  rows?: [string, string][];
  lines?: string[];
  numbered?: boolean;
}

/** Everything the ticket says. */
export interface TicketContent {
  title: string;
  subtitle: string;
  left: TicketSection[];
  right: TicketSection[];
  bottom: TicketSection[];
  /** Caption of the fold-layout drawing. */
  layoutCaption: string;
}

const FOLD_WORDS: Record<Draft['layout']['fold'], string> = {
  'four-layers': 'in four layers',
  'two-layers': 'in two layers',
  'does-not-fit': 'does not fit the fabric: see the warnings',
};

const UNIT_WORDS: Record<LengthUnit, string> = { in: 'inches', cm: 'centimetres', mm: 'millimetres' };

/** A percentage to 0.1 %, e.g. "8.7 %". */
export function percentFormat(value: number): string {
  const rounded = Math.round(value * 10) / 10;
  return `${rounded === 0 ? 0 : rounded} %`;
}

/** The safety cautions (trade.md, "Cautions to show"); the last defers to local rules. */
export const TICKET_CAUTIONS: readonly string[] = [
  'Rotary cutter: close the guard after every cut, cut away from your body, replace dull blades.',
  'Overlocker: switch it off before threading or clearing a jam; keep fingers clear of the knife; pins damage the knife.',
  'Steam iron: unplug it before refilling and rest it on its heel; high heat damages elastane.',
  'Sealing tape ends with a flame: synthetics only, never rayon, cotton or silk; hold the end beside, not in, the flame; ventilate, the fumes are toxic.',
  'Follow your local safety rules and professional practice; these notes do not replace them.',
];

function allowanceRows(pieces: readonly Piece[], unit: LengthUnit, edgeFinish: 'tape' | 'band'): [string, string][] {
  const first = pieces[0];
  if (!first) return [];
  const value = (edge: EdgeName): number => Math.max(...pieces.map((p) => p.allowances[edge]));
  const opening = value('neck');
  return [
    ['Side and shoulder seams', lengthFormat(Math.max(value('side'), value('shoulder')), unit)],
    ['Hem', lengthFormat(value('hem'), unit)],
    ['Neckline and armholes', opening === 0 ? `none (${edgeFinish === 'tape' ? 'bound with tape' : 'finished'})` : lengthFormat(opening, unit)],
    ['Centre fold', 'none'],
  ];
}

function bindingRow(binding: Binding, unit: LengthUnit): [string, string] {
  const size = `${lengthFormat(binding.cutLength, unit)} × ${lengthFormat(binding.cutWidth, unit)}`;
  const kind = binding.finish === 'tape' ? 'knit tape' : 'self-fabric band';
  return [`${binding.name}, cut ${binding.count}`, `${size} ${kind}; join at ${binding.joinAt}`];
}

function finishingSteps(draft: Draft, unit: LengthUnit): string[] {
  const pieces = draft.pieces;
  const seam = Math.max(0, ...pieces.map((p) => p.allowances.side));
  const hem = Math.max(0, ...pieces.map((p) => p.allowances.hem));
  const join = draft.bindings[0]?.joinAllowance ?? 0;
  const band = draft.bindings.some((b) => b.finish === 'band');
  const neck = draft.bindings.find((b) => b.opening === 'neck');
  return [
    `Overlock the shoulder seams, then the side seams, right sides together, ${lengthFormat(seam, unit)} from the edge; match the notches.`,
    band
      ? `Bind the edges: join each band into a loop (${lengthFormat(join, unit)} at each end), fold it in half lengthwise, mark halves and quarters on band and opening, and overlock it on, easing the band to fit.`
      : `Bind the edges: overlock the neckline and armholes, join each tape into a loop (${lengthFormat(join, unit)} at each end), mark halves and quarters on tape and opening, and stitch it on without stretching.`,
    `Joins: neckline at ${neck?.joinAt ?? 'centre back'}; armholes about 1 cm behind the underarm seam.`,
    `Hem: turn up ${lengthFormat(hem, unit)} and stitch with a zigzag or a twin needle.`,
    'Press seams, bindings and hem with a warm, not hot, iron and a press cloth.',
  ];
}

/** The ticket's content for a draft, lengths in `unit`. */
export function ticketContent(draft: Draft, unit: LengthUnit, meta: PdfMeta, pieces: readonly Piece[] = draft.pieces): TicketContent {
  const style = meta.style ?? styleFind(draft.style).name;
  const fabric = draft.input.fabric;
  const f = draft.finished;
  const edgeFinish = draft.bindings[0]?.finish ?? 'tape';
  const fabricRows: [string, string][] = [];
  if (meta.fabric) fabricRows.push(['Fabric', meta.fabric]);
  fabricRows.push(['Crosswise stretch', `${percentFormat(fabric.stretch)}, recovery ${fabric.recovery}`]);
  if (fabric.stretchLengthwise !== undefined) fabricRows.push(['Lengthwise stretch', percentFormat(fabric.stretchLengthwise)]);
  fabricRows.push(['Stretch needed at bust', percentFormat(f.stretchNeeded)]);
  const layout = draft.layout;
  const layoutRows: [string, string][] = [
    ['Fold', FOLD_WORDS[layout.fold]],
    ['Fabric width used', lengthFormat(layout.widthUsed, unit)],
    ['Fabric length needed', lengthFormat(layout.lengthNeeded, unit)],
  ];
  if (layout.fabricWidth !== null) layoutRows.splice(1, 0, ['Fabric width', lengthFormat(layout.fabricWidth, unit)]);
  const finishedRows: [string, string][] = [
    ['Bust', `${lengthFormat(f.bust, unit)} (ease ${lengthFormat(f.bustEase.mm, unit)}, ${percentFormat(f.bustEase.percent)})`],
  ];
  if (f.waist !== null && f.waistEase) {
    finishedRows.push(['Waist', `${lengthFormat(f.waist, unit)} (ease ${lengthFormat(f.waistEase.mm, unit)}, ${percentFormat(f.waistEase.percent)})`]);
  }
  finishedRows.push(['Hip', `${lengthFormat(f.hip, unit)} (ease ${lengthFormat(f.hipEase.mm, unit)}, ${percentFormat(f.hipEase.percent)})`]);
  finishedRows.push(['Length, shoulder to hem', lengthFormat(f.length, unit)]);

  const left: TicketSection[] = [
    { heading: 'Fabric', rows: fabricRows },
    { heading: 'Pieces', rows: pieces.map((p) => [p.name, p.cutNote]) },
    { heading: 'Binding strips to cut', rows: draft.bindings.map((b) => bindingRow(b, unit)) },
    { heading: 'Finished measurements', rows: finishedRows },
    { heading: 'Allowances', rows: allowanceRows(pieces, unit, edgeFinish) },
  ];
  const right: TicketSection[] = [
    { heading: 'Fold and cut', rows: layoutRows },
    { heading: 'Steps', lines: layout.steps, numbered: true },
  ];
  const bottom: TicketSection[] = [{ heading: 'Finishing, in this order', lines: finishingSteps(draft, unit), numbered: true }];
  if (draft.warnings.length > 0) bottom.push({ heading: 'Check before cutting', lines: draft.warnings.map((w) => w.message) });
  bottom.push({ heading: 'Safety', lines: [...TICKET_CAUTIONS] });
  const subtitle = [meta.date, meta.studio, `lengths in ${UNIT_WORDS[unit]}`].filter(Boolean).join(' · ');
  return {
    title: meta.client ? `Cutting ticket: ${style} for ${meta.client}` : `Cutting ticket: ${style}`,
    subtitle,
    left,
    right,
    bottom,
    layoutCaption: layout.fits ? 'Fold layout, to scale' : 'Fold layout, to scale: the pieces do not fit the fabric width',
  };
}
