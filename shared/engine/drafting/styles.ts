/**
 * The style registry: each garment style the engine drafts, by id. A new style (camisole,
 * tee, knit dress) adds its params schema in shared/schemas, a drafting function here, and
 * its id to the DraftInput's `style`. A racer back is an option of the tank (racerBackInset).
 */
import type { DraftInput } from '../../schemas/draft-input';
import type { DraftResult, StyleId } from '../types';
import { draftTank, TANK_STYLE_NAME } from './tank';

/** One draftable style. */
export interface StyleDefinition {
  id: StyleId;
  name: string;
  /** Pieces the style produces, by id. */
  pieceIds: readonly string[];
  draft: (input: DraftInput) => DraftResult;
}

/** Every style the engine drafts, by id. */
export const STYLES: Readonly<Record<StyleId, StyleDefinition>> = {
  tank: { id: 'tank', name: TANK_STYLE_NAME, pieceIds: ['front', 'back'], draft: draftTank },
};

/** The definition of a style. */
export function styleFind(id: StyleId): StyleDefinition {
  return STYLES[id];
}
