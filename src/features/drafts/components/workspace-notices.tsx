import type { DraftDto } from '@shared/schemas/draft-dto';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import type { RevisionView } from '../hooks/use-revision-view';
import { EngineCheckNote } from './engine-check-note';

export interface WorkspaceNoticesProps {
  draft: DraftDto;
  viewing: number | null;
  revisionView: RevisionView;
  onBack: () => void;
  restoreError: string | null;
}

function stamp(at: string, by: { name: string } | null): string {
  const when = new Date(at).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
  return by ? `${when} by ${by.name}` : when;
}

/** Why the workspace is read-only, which revision is on screen, and the engine check. */
export function WorkspaceNotices({ draft, viewing, revisionView, onBack, restoreError }: WorkspaceNoticesProps) {
  const notices = [];
  if (viewing !== null) {
    notices.push(
      <Alert key="viewing" tone="info" announce>
        <span className="flex flex-wrap items-center gap-3">
          <span>
            Viewing revision {viewing}
            {revisionView.revision && `, saved ${stamp(revisionView.revision.createdAt, revisionView.revision.createdBy)}`}
            {revisionView.loading && ' (loading…)'}. Read-only; the current values are unchanged.
          </span>
          <Button compact onClick={onBack}>
            Back to the current revision
          </Button>
        </span>
        {revisionView.error && <span className="mt-1 block text-danger">{revisionView.error}</span>}
      </Alert>,
    );
  } else if (!draft.editable) {
    const approved = draft.approved;
    const text =
      draft.state === 'drafting'
        ? 'Read-only: cutters see drafts as they are and cannot change parameters.'
        : draft.state === 'approved'
          ? `Approved ${approved ? stamp(approved.at, approved.by) : ''}, revision ${approved?.revision ?? draft.revision}. Read-only${draft.allowedMoves.includes('drafting') ? ': reopen it to make changes.' : '.'}`
          : `${draft.state[0]?.toUpperCase()}${draft.state.slice(1)}: read-only.`;
    notices.push(
      <Alert key="readonly" tone="info" announce={false}>
        {text}
        {approved?.note && <span className="block text-muted">Note: {approved.note}</span>}
      </Alert>,
    );
  }
  if (restoreError) notices.push(<Alert key="error" tone="error">{restoreError}</Alert>);
  if (draft.state !== 'drafting') notices.push(<EngineCheckNote key="engine" draft={draft} />);
  if (notices.length === 0) return null;
  return <div className="space-y-2">{notices}</div>;
}
