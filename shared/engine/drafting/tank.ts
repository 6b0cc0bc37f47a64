/**
 * The tank top: a quarter of the body drafted on the fold, front and back cut together, each
 * neckline cut to its own depth, an optional racer back (trade notes, common practice).
 */
import type { DraftInput } from '../../schemas/draft-input';
import { pointsAreFinite, polygonIsSimple } from '../geometry/polygon';
import { allowancesFor } from '../finishing/allowances';
import { bindingsCompute } from '../finishing/bindings';
import { segmentsLength } from '../finishing/edge-length';
import { finishedCompute } from '../finishing/finished';
import { openingNotches, sideNotches } from '../finishing/notches';
import { warningsCollect } from '../finishing/warnings';
import { foldLayoutPlan } from '../layout/fold-layout';
import type { DraftResult, Piece } from '../types';
import { ENGINE_VERSION } from '../version';
import { pieceBuild, type PieceMeta } from './piece-build';
import { tankEdgesBuild, type BodiceSide } from './tank-edges';
import { tankFrameBuild, type TankFrame } from './tank-frame';
import { parseDraftInput } from './draft-input-parse';
import { tankSpecResolve, type TankSpec } from './tank-params';

/** Name of the style as printed on pieces. */
export const TANK_STYLE_NAME = 'Tank top';

function metaFor(spec: TankSpec, frame: TankFrame, side: BodiceSide): PieceMeta {
  const narrowest = Math.min(frame.quarterBust, frame.quarterHip, frame.quarterWaist ?? Infinity);
  const top = frame.underarm.y + 0.15 * (frame.hemSide.y - frame.underarm.y);
  const bottom = frame.hemSide.y - 0.1 * (frame.hemSide.y - frame.underarm.y);
  const racer = side === 'back' && spec.racerBackInset !== null;
  return {
    id: side,
    name: side === 'front' ? 'Front' : 'Back',
    side,
    cutCount: 1,
    styleName: racer ? `${TANK_STYLE_NAME}, racer back` : TANK_STYLE_NAME,
    grainX: 0.25 * narrowest,
    grainTop: top,
    grainBottom: bottom,
    labelAt: { x: 0.55 * narrowest, y: top + 0.3 * (bottom - top) },
  };
}

function outlinesSound(piece: Piece): boolean {
  return (
    pointsAreFinite(piece.stitching.polyline) &&
    pointsAreFinite(piece.cutting.polyline) &&
    polygonIsSimple(piece.stitching.polyline) &&
    polygonIsSimple(piece.cutting.polyline) &&
    piece.edges.every((e) => Number.isFinite(e.length))
  );
}

/**
 * Drafts a tank top. The input is checked again with the shared schema (types, ranges and
 * consistency), so a caller that skipped parsing still gets field errors, never NaN.
 * Lengths in the result are in mm.
 */
export function draftTank(input: DraftInput): DraftResult {
  const parsed = parseDraftInput(input);
  if (!parsed.ok) return parsed;
  const spec = tankSpecResolve(parsed.input);
  const frame = tankFrameBuild(spec);
  const allowances = allowancesFor(spec);
  const front = pieceBuild(tankEdgesBuild(spec, frame, 'front'), allowances, metaFor(spec, frame, 'front'));
  const back = pieceBuild(tankEdgesBuild(spec, frame, 'back'), allowances, metaFor(spec, frame, 'back'));
  const opening = openingNotches(front, back);
  const upperSide = front.edges.find((e) => e.name === 'side')?.segments[0];
  const waistDistance = frame.waistShaped && upperSide ? segmentsLength([upperSide]) : null;
  front.notches = [...opening.front, ...sideNotches(front, waistDistance)];
  back.notches = [...opening.back, ...sideNotches(back, waistDistance)];
  const pieces = [front, back];
  if (!pieces.every(outlinesSound)) {
    return {
      ok: false,
      errors: [
        {
          path: 'params',
          message: 'These measurements and parameters give a piece whose outline crosses itself: check the neck depths, strap and racer-back inset.',
        },
      ],
    };
  }
  const finished = finishedCompute(spec, frame);
  const layout = foldLayoutPlan(pieces, { fabricWidth: spec.fabricWidth, racerBack: spec.racerBackInset !== null });
  return {
    ok: true,
    draft: {
      engineVersion: ENGINE_VERSION,
      style: 'tank',
      unit: spec.unit,
      input: parsed.input,
      pieces,
      bindings: bindingsCompute(spec, front, back),
      finished,
      layout,
      warnings: warningsCollect(spec, finished, front, back, layout),
    },
  };
}
