import type { DraftDto } from '@shared/schemas/draft-dto';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';

export interface ConflictDialogProps {
  current: DraftDto | null;
  pending: boolean;
  error?: string | null;
  /** Take their version; mine stays one undo away. */
  onReload: () => void;
  /** Save mine over theirs as a new revision (reopening first when they approved it). */
  onKeepMine: () => void;
  onCancel: () => void;
}

function who(draft: DraftDto): string {
  const by = draft.current.createdBy?.name ?? 'Someone';
  const at = new Date(draft.current.createdAt).toLocaleTimeString(undefined, { hour: '2-digit', minute: '2-digit' });
  return `${by} saved revision ${draft.current.number} at ${at}`;
}

/** A save met a newer save: choose whose values go on, without losing the other's. */
export function ConflictDialog({ current, pending, error, onReload, onKeepMine, onCancel }: ConflictDialogProps) {
  const approvedMeanwhile = current !== null && current.state !== 'drafting';
  const canReopen = current?.allowedMoves.includes('drafting') ?? false;
  return (
    <Dialog
      open={current !== null}
      onClose={() => !pending && onCancel()}
      title="This draft changed while you were working"
      description={
        current &&
        (approvedMeanwhile
          ? `${who(current)}, and the draft is now ${current.state}. Your changes are still here, not saved.`
          : `${who(current)}. Your changes are still here, not saved.`)
      }
      footer={
        current && (
          <>
            <Button onClick={onReload} disabled={pending}>
              Load their version
            </Button>
            {(!approvedMeanwhile || canReopen) && (
              <Button variant="primary" onClick={onKeepMine} pending={pending}>
                {approvedMeanwhile ? 'Reopen and save mine' : 'Keep mine as a new revision'}
              </Button>
            )}
          </>
        )
      }
    >
      <p className="text-sm text-muted">
        Loading theirs keeps your values one undo away (Ctrl+Z). Keeping yours saves them as the next revision; theirs stays in the revision
        history and can be restored.
      </p>
      {error && <Alert tone="error" className="mt-3">{error}</Alert>}
    </Dialog>
  );
}
