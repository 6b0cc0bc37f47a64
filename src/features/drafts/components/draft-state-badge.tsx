import type { DraftState } from '@shared/schemas/draft';
import { Badge } from '@/components/ui/badge';
import { DRAFT_STATE_LABELS } from '../lib/draft-states';

/** A draft's state in words (the tone only repeats what the words say). */
export function DraftStateBadge({ state }: { state: DraftState }) {
  const tone = state === 'drafting' ? 'neutral' : state === 'approved' ? 'accent' : 'warn';
  return (
    <Badge tone={tone} className="num">
      {DRAFT_STATE_LABELS[state]}
    </Badge>
  );
}
