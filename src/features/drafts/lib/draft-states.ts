import type { DraftState } from '@shared/schemas/draft';

/** Each state in the studio's words, and what the move into it is called. */
export const DRAFT_STATE_LABELS: Record<DraftState, string> = {
  drafting: 'Drafting',
  approved: 'Approved',
  cut: 'Cut',
  sewn: 'Sewn',
  delivered: 'Delivered',
};

export const MOVE_LABELS: Record<DraftState, string> = {
  drafting: 'Reopen for changes',
  approved: 'Approve for cutting',
  cut: 'Mark cut',
  sewn: 'Mark sewn',
  delivered: 'Mark delivered',
};

export const MOVE_DESCRIPTIONS: Record<DraftState, string> = {
  drafting: 'The draft becomes editable again and a new revision records the reopening. It leaves the work queue until it is approved again.',
  approved: 'The draft becomes read-only and goes into the cutters’ work queue, keeping the engine version it was approved with.',
  cut: 'Record which fabric was cut. The draft moves on to sewing.',
  sewn: 'The garment is sewn and finished.',
  delivered: 'The garment has gone to the client.',
};
