import type { RevisionSummaryDto } from '@shared/schemas/draft-dto';
import type { LengthUnit } from '@shared/units';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { LoadingState } from '@/components/ui/loading-state';
import { cx } from '@/components/ui/cx';
import { useRevisions } from '../api/get-revisions';
import { changeText } from '../lib/revision-changes';

export interface RevisionsPanelProps {
  draftId: number;
  current: number;
  unit: LengthUnit;
  viewing: number | null;
  canRestore: boolean;
  restoring: number | null;
  onView: (rev: number | null) => void;
  onRestore: (rev: number) => void;
}

const KIND_LABELS = { created: 'Created', saved: 'Saved', restored: 'Restored', reopened: 'Reopened' } as const;

function when(iso: string): string {
  return new Date(iso).toLocaleString(undefined, { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });
}

/** Every revision, newest first: what changed, who and when; view one on the canvas or restore it. */
export function RevisionsPanel({ draftId, current, unit, viewing, canRestore, restoring, onView, onRestore }: RevisionsPanelProps) {
  const revisions = useRevisions(draftId);
  if (revisions.isPending) return <LoadingState>Loading revisions…</LoadingState>;
  if (revisions.isError) return <Alert tone="error" className="m-3">The revisions could not be loaded: {revisions.error.message}</Alert>;
  return (
    <ol className="divide-y divide-line/70" aria-label="Revisions, newest first">
      {revisions.data.map((r) => {
        const isCurrent = r.number === current;
        const isViewed = r.number === viewing;
        return (
          <li key={r.number} className={cx('px-3 py-3 text-sm', isViewed && 'bg-accent-soft')}>
            <p className="flex items-baseline justify-between gap-2">
              <span className="font-semibold text-ink">
                Revision {r.number}
                {isCurrent && <span className="ml-1 font-normal text-muted">(current)</span>}
              </span>
              <span className="num text-xs text-muted">{when(r.createdAt)}</span>
            </p>
            <p className="text-xs text-muted">
              {KIND_LABELS[r.kind]}
              {r.restoredFrom !== null && ` from revision ${r.restoredFrom}`} by {r.createdBy?.name ?? 'someone'} · engine {r.engineVersion}
            </p>
            <Changes revision={r} unit={unit} />
            <div className="mt-2 flex gap-2">
              {!isCurrent && (
                <Button compact variant={isViewed ? 'primary' : 'secondary'} aria-pressed={isViewed} onClick={() => onView(isViewed ? null : r.number)}>
                  {isViewed ? 'Viewing' : 'View'}
                </Button>
              )}
              {!isCurrent && canRestore && (
                <Button compact pending={restoring === r.number} pendingLabel="Restoring…" onClick={() => onRestore(r.number)}>
                  Restore
                </Button>
              )}
            </div>
          </li>
        );
      })}
    </ol>
  );
}

function Changes({ revision, unit }: { revision: RevisionSummaryDto; unit: LengthUnit }) {
  if (revision.changes.length === 0) return null;
  return (
    <ul className="num mt-1 space-y-0.5 text-xs text-ink">
      {revision.changes.map((c) => (
        <li key={c.field}>{changeText(c, unit)}</li>
      ))}
    </ul>
  );
}
